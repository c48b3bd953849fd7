/**
 * Rolling-window least squares over a time-ordered series: the fit of rows [s, s + window) for
 * s = 0, step, 2 step, ... while s + window <= n, returning the coefficient path with classical standard
 * errors (sigma^2 = RSS / (window - p), t-quantiles not needed), the residual standard error and R^2
 * (centred with an intercept, uncentred without) of every window.
 *
 * Method: updating cross-product sums (rolling-moments.ts), so moving the window costs O(step k^2) and
 * the whole path O(n k^2 + windows k^3), not O(windows * window * k^2). Each window solves its centred
 * normal equations C_xx b = C_xy by Cholesky (k x k):
 *   slopes b = C_xx^-1 C_xy,  intercept b_0 = mean y - mean x' b,
 *   RSS = C_yy - b' C_xy,  Var b = sigma^2 C_xx^-1,  Var b_0 = sigma^2 (1/window + mean x' C_xx^-1 mean x).
 * Accuracy: about machine epsilon times cond(window's centred predictors)^2 for the coefficients (normal
 * equations), and RSS loses relative accuracy as R^2 approaches 1 (about epsilon / (1 - R^2)). When a
 * variable's centred sum of squares is small against its anchored raw sum (the series drifted away from
 * the anchor, so the subtraction would cancel), the window is recomputed from scratch with a new anchor.
 *
 * Errors: AnalysisError `invalid-window` (window or step not a positive integer, window <= number of
 * coefficients; field `window` or `step`), `window-too-long` (window > n, field `window`); EngineError
 * `constant-column`, `collinear-columns`, `constant-response` for a window where the fit is not defined
 * (row = first row of that window, field `window`), plus the input errors of the columns.
 */

import { EngineError } from './errors';
import { ColumnValues, validateForm } from './fit-input';
import { FunctionalForm, predictorTransformation, responseTransformation, transformColumn } from './functional-forms';
import { INTERCEPT_NAME, solveLeastSquares } from './least-squares';
import { totalSumOfSquares } from './anova';
import { finiteColumn } from './batch-fit';
import { AnalysisError } from './diagnostics/analysis-error';
import { WindowMoments } from './rolling-moments';

export interface RollingFitInput {
  columns: Record<string, ColumnValues>;
  response: string;
  predictors: string[];
  intercept?: boolean;
  form?: FunctionalForm;
  /** Rows per window. */
  window: number;
  /** Rows the window moves each time (default 1). */
  step?: number;
}

export interface CoefficientPath {
  term: string;
  estimates: number[];
  standardErrors: number[];
}

export interface RollingFitResult {
  form: FunctionalForm;
  windowLength: number;
  step: number;
  windowCount: number;
  /** First row (0-based) of each window; the window covers [windowStart, windowStart + windowLength). */
  windowStart: number[];
  coefficientPath: CoefficientPath[];
  residualStandardError: number[];
  rSquared: number[];
  method: 'updating-cross-products';
  /** Windows solved again by the single-fit path because they were ill-conditioned or nearly exact. */
  exactWindowCount: number;
}

/**
 * The updating normal equations are trusted only while the window's predictors are well conditioned and
 * its fit is not nearly exact: their error is about epsilon cond^2 for the coefficients and
 * epsilon / (1 - R^2) for the residual sum of squares. A window whose smallest Cholesky pivot ratio is
 * below PIVOT_RATIO_FOR_EXACT (cond above about 1e3: epsilon cond^2 near 1e-10) or whose 1 - R^2 is below
 * NEAR_EXACT_FIT is solved again by the single-fit path (Householder QR with double-double refinement),
 * which also applies the single fit's rank rule; the answer keeps the single fit's accuracy either way.
 */
const PIVOT_RATIO_FOR_EXACT = 1e-3;
const NEAR_EXACT_FIT = 1e-6;
/** Recompute from scratch when a centred sum of squares is below this fraction of its anchored raw sum. */
const CANCELLATION_LIMIT = 1e-6;

export function fitRolling(input: RollingFitInput): RollingFitResult {
  const form = validateForm(input.form);
  const intercept = input.intercept ?? true;
  if (!Array.isArray(input.predictors) || input.predictors.length === 0) {
    throw new EngineError('invalid-argument', '"predictors" must list at least one column name.', { field: 'predictors' });
  }
  const names = input.predictors;
  const response = transformColumn(input.response, finiteColumn(input.columns, input.response), responseTransformation(form));
  const n = response.length;
  const predictors = names.map((name) => {
    const column = finiteColumn(input.columns, name);
    if (column.length !== n) {
      throw new EngineError('length-mismatch', `Column "${name}" has ${column.length} values, the response ${n}.`, { column: name });
    }
    return transformColumn(name, column, predictorTransformation(form));
  });
  const k = names.length;
  const p = k + (intercept ? 1 : 0);
  const { window, step } = validateWindow(input.window, input.step, n, p);
  const windowCount = Math.floor((n - window) / step) + 1;
  const moments = new WindowMoments([...predictors, response], intercept);
  const recomputeInterval = Math.max(1, Math.ceil(window / step));
  const estimates = Array.from({ length: p }, () => new Float64Array(windowCount));
  const errors = Array.from({ length: p }, () => new Float64Array(windowCount));
  const residualStandardError = new Float64Array(windowCount);
  const rSquared = new Float64Array(windowCount);
  const windowStart: number[] = new Array<number>(windowCount);
  const solver = new WindowSolver(k, intercept);
  const exact = new ExactWindowSolver(predictors, response, names, input.response, intercept, window);
  let exactWindows = 0;
  for (let w = 0; w < windowCount; w++) {
    const start = w * step;
    if (w % recomputeInterval === 0) {
      moments.recompute(start, start + window);
    } else {
      for (let i = start - step; i < start; i++) moments.remove(i);
      for (let i = start - step + window; i < start + window; i++) moments.add(i);
    }
    if (solver.cancels(moments)) moments.recompute(start, start + window);
    const fast = solver.solve(moments, window, start, names, input.response);
    const source = fast ? solver : exact.solve(start);
    if (!fast) exactWindows++;
    const offset = intercept ? 1 : 0;
    if (intercept) {
      estimates[0]![w] = source.intercept;
      errors[0]![w] = source.interceptError;
    }
    for (let j = 0; j < k; j++) {
      estimates[j + offset]![w] = source.slopes[j]!;
      errors[j + offset]![w] = source.slopeErrors[j]!;
    }
    residualStandardError[w] = source.residualStandardError;
    rSquared[w] = source.rSquared;
    windowStart[w] = start;
  }
  const terms = intercept ? [INTERCEPT_NAME, ...names] : [...names];
  return {
    form,
    windowLength: window,
    step,
    windowCount,
    windowStart,
    coefficientPath: terms.map((term, j) => ({
      term,
      estimates: Array.from(estimates[j]!),
      standardErrors: Array.from(errors[j]!),
    })),
    residualStandardError: Array.from(residualStandardError),
    rSquared: Array.from(rSquared),
    method: 'updating-cross-products',
    exactWindowCount: exactWindows,
  };
}

function validateWindow(window: unknown, step: unknown, n: number, p: number): { window: number; step: number } {
  if (typeof window !== 'number' || !Number.isInteger(window) || window <= p) {
    throw new AnalysisError(
      'invalid-window',
      `The window must be an integer number of rows greater than the ${p} coefficients; got ${JSON.stringify(window)}.`,
      { field: 'window' },
    );
  }
  if (window > n) {
    throw new AnalysisError('window-too-long', `A window of ${window} rows is longer than the series (${n} rows).`, { field: 'window' });
  }
  const resolvedStep = step === undefined ? 1 : step;
  if (typeof resolvedStep !== 'number' || !Number.isInteger(resolvedStep) || resolvedStep < 1) {
    throw new AnalysisError('invalid-window', `The step must be a positive integer number of rows; got ${JSON.stringify(step)}.`, {
      field: 'step',
    });
  }
  return { window, step: resolvedStep };
}

/** Per-window Cholesky solve on flat scratch arrays (no allocation per window). */
class WindowSolver {
  readonly slopes: Float64Array;
  readonly slopeErrors: Float64Array;
  intercept = 0;
  interceptError = 0;
  residualStandardError = 0;
  rSquared = 0;
  private readonly lower: Float64Array;
  private readonly work: Float64Array;
  private readonly unit: Float64Array;

  constructor(
    private readonly k: number,
    private readonly hasIntercept: boolean,
  ) {
    this.slopes = new Float64Array(k);
    this.slopeErrors = new Float64Array(k);
    this.lower = new Float64Array(k * k);
    this.work = new Float64Array(k);
    this.unit = new Float64Array(k);
  }

  /** True when a centred sum of squares has cancelled badly against its anchored raw sum. */
  cancels(moments: WindowMoments): boolean {
    if (!this.hasIntercept) return false;
    for (let j = 0; j <= this.k; j++) {
      const raw = moments.second[j * moments.size + j]!;
      if (raw > 0 && moments.moment(j, j) < CANCELLATION_LIMIT * raw) return true;
    }
    return false;
  }

  /** Solves the window from its moments; false when it must be solved by the single-fit path instead. */
  solve(moments: WindowMoments, window: number, start: number, names: string[], responseName: string): boolean {
    const { k, lower, work, slopes } = this;
    for (let j = 0; j < k; j++) {
      const diagonal = moments.moment(j, j);
      let pivot = diagonal;
      for (let m = 0; m < j; m++) pivot -= lower[j * k + m]! * lower[j * k + m]!;
      if (!(diagonal > 0) || !(pivot > PIVOT_RATIO_FOR_EXACT * diagonal)) return false;
      const root = Math.sqrt(pivot);
      lower[j * k + j] = root;
      for (let i = j + 1; i < k; i++) {
        let sum = moments.moment(i, j);
        for (let m = 0; m < j; m++) sum -= lower[i * k + m]! * lower[j * k + m]!;
        lower[i * k + j] = sum / root;
      }
    }
    for (let j = 0; j < k; j++) work[j] = moments.moment(j, k);
    this.choleskySolve(work, slopes);
    const responseSquares = moments.moment(k, k);
    if (!(responseSquares > 0)) {
      throw new EngineError('constant-response', `"${responseName}" does not vary in the window starting at row ${start} (0-based).`, {
        column: responseName,
        row: start,
        field: 'window',
      });
    }
    let explained = 0;
    for (let j = 0; j < k; j++) explained += slopes[j]! * work[j]!;
    const residualSumOfSquares = Math.max(0, responseSquares - explained);
    if (residualSumOfSquares < NEAR_EXACT_FIT * responseSquares) return false;
    const degreesOfFreedom = window - k - (this.hasIntercept ? 1 : 0);
    const variance = residualSumOfSquares / degreesOfFreedom;
    this.residualStandardError = Math.sqrt(variance);
    this.rSquared = 1 - residualSumOfSquares / responseSquares;
    const { unit } = this;
    for (let j = 0; j < k; j++) {
      unit.fill(0);
      unit[j] = 1;
      this.choleskySolve(unit, work);
      this.slopeErrors[j] = Math.sqrt(Math.max(0, variance * work[j]!));
    }
    if (this.hasIntercept) {
      let intercept = moments.mean(k);
      for (let j = 0; j < k; j++) {
        unit[j] = moments.mean(j);
        intercept -= unit[j]! * slopes[j]!;
      }
      this.choleskySolve(unit, work);
      let quadratic = 0;
      for (let j = 0; j < k; j++) quadratic += moments.mean(j) * work[j]!;
      this.intercept = intercept;
      this.interceptError = Math.sqrt(Math.max(0, variance * (1 / window + quadratic)));
    }
    return true;
  }

  private choleskySolve(right: Float64Array, into: Float64Array): void {
    const { k, lower } = this;
    for (let i = 0; i < k; i++) {
      let sum = right[i]!;
      for (let m = 0; m < i; m++) sum -= lower[i * k + m]! * into[m]!;
      into[i] = sum / lower[i * k + i]!;
    }
    for (let i = k - 1; i >= 0; i--) {
      let sum = into[i]!;
      for (let m = i + 1; m < k; m++) sum -= lower[m * k + i]! * into[m]!;
      into[i] = sum / lower[i * k + i]!;
    }
  }

}

/**
 * One window through the single-fit path: the working design, Householder QR with the engine's rank rule,
 * double-double refinement, the perfect-fit rule (least-squares.ts). Errors name the window's first row.
 */
class ExactWindowSolver {
  readonly slopes: Float64Array;
  readonly slopeErrors: Float64Array;
  intercept = 0;
  interceptError = 0;
  residualStandardError = 0;
  rSquared = 0;

  constructor(
    private readonly predictors: Float64Array[],
    private readonly response: Float64Array,
    private readonly names: string[],
    private readonly responseName: string,
    private readonly hasIntercept: boolean,
    private readonly window: number,
  ) {
    this.slopes = new Float64Array(predictors.length);
    this.slopeErrors = new Float64Array(predictors.length);
  }

  solve(start: number): this {
    const { window, hasIntercept, names } = this;
    const end = start + window;
    const y = this.response.subarray(start, end);
    const columns = this.predictors.map((column) => column.subarray(start, end));
    const design = hasIntercept
      ? { names: [INTERCEPT_NAME, ...names], columns: [new Float64Array(window).fill(1), ...columns], n: window, hasIntercept: true }
      : { names: [...names], columns, n: window, hasIntercept: false };
    let solution;
    try {
      solution = solveLeastSquares(design, y);
    } catch (error) {
      if (error instanceof EngineError) {
        throw new EngineError(error.code, `${error.message} (in the window starting at row ${start}, 0-based)`, {
          ...(error.column !== undefined ? { column: error.column } : {}),
          ...(error.columns !== undefined ? { columns: error.columns } : {}),
          row: start,
          field: 'window',
        });
      }
      throw error;
    }
    const total = totalSumOfSquares(y, null, hasIntercept);
    if (!(total > 0)) {
      throw new EngineError('constant-response', `"${this.responseName}" does not vary in the window starting at row ${start} (0-based).`, {
        column: this.responseName,
        row: start,
        field: 'window',
      });
    }
    const p = design.columns.length;
    const variance = solution.residualSumOfSquares / (window - p);
    const offset = hasIntercept ? 1 : 0;
    if (hasIntercept) {
      this.intercept = solution.coefficients[0]!;
      this.interceptError = Math.sqrt(variance * solution.unscaledCovariance[0]![0]!);
    }
    for (let j = 0; j < this.slopes.length; j++) {
      this.slopes[j] = solution.coefficients[j + offset]!;
      this.slopeErrors[j] = Math.sqrt(variance * solution.unscaledCovariance[j + offset]![j + offset]!);
    }
    this.residualStandardError = Math.sqrt(variance);
    this.rSquared = 1 - solution.residualSumOfSquares / total;
    return this;
  }
}
