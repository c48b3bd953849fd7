/**
 * The least-squares solve: the one entry point every fit in the engine goes through.
 *
 * Convention for the design: when `hasIntercept` is true, `columns[0]` is the intercept column (every
 * entry 1) and `names[0]` is `INTERCEPT_NAME`; the remaining columns are the predictors in order, and
 * `coefficients[j]` belongs to `columns[j]`. When `hasIntercept` is false there is no ones column.
 *
 * Method: Householder QR of the centred and scaled columns, never an inverse of X'X, then iterative
 * refinement with residuals in double-double (refined-qr-solver.ts) so that coefficients and the
 * covariance reach (almost) full double precision for the caller's data. Tall problems
 * (n * p above `TALL_SKINNY_THRESHOLD`) use a blocked tall-skinny QR without storing Q
 * (tall-skinny-solver.ts), which hands ill-conditioned problems back to the refined solver. Weighted least squares (WLS)
 * minimises sum_i w_i (y_i - x_i'b)^2.
 *
 * Errors (EngineError): `invalid-argument` (shapes), `non-finite-value`, `non-positive-weight`,
 * `too-few-observations` (n <= p), `zero-column`, `constant-column`, `collinear-columns` (with the
 * offending column and the columns it depends on).
 */

import { EngineError } from './errors';
import { solveRefinedQr } from './refined-qr-solver';
import { solveTallSkinny } from './tall-skinny-solver';
import { firstNonFinite } from './finite-values';
import { prepareWorkingDesign, WorkingDesign } from './working-design';
import { isPerfectFit } from './perfect-fit';

export const INTERCEPT_NAME = '(intercept)';

/** Above this many design entries (n * p) the blocked tall-skinny solver is used. */
export const TALL_SKINNY_THRESHOLD = 1 << 21;

export interface DesignMatrix {
  /** One name per column; `names[0]` is `INTERCEPT_NAME` when `hasIntercept`. */
  names: string[];
  /** Columns of X as Float64Array (not copied, not modified). */
  columns: Float64Array[];
  /** Number of observations (rows). */
  n: number;
  /** True when `columns[0]` is the intercept column of ones. */
  hasIntercept: boolean;
  /**
   * Optional low-order parts: column j is exactly columns[j] + lowParts[j] (a double-double). Lets a
   * derived column (a power, a product) keep the digits its double rounding would lose; the solver
   * refines against the exact sum.
   */
  lowParts?: ReadonlyArray<Float64Array | null | undefined>;
}

export interface LeastSquaresOptions {
  /** Positive finite weights (WLS); omitted for ordinary least squares. */
  weights?: Float64Array;
  /** Also return the leverage (diagonal of the hat matrix of the weighted design). */
  computeLeverage?: boolean;
  /** Force one solver instead of choosing by size (tests and benchmarks). */
  method?: LeastSquaresMethod;
}

export type LeastSquaresMethod = 'householder-refined' | 'tall-skinny';

export interface LeastSquaresSolution {
  /** b, one per design column, in column order. */
  coefficients: Float64Array;
  /** X b. */
  fitted: Float64Array;
  /** y - X b on the response's own scale (not multiplied by sqrt(w)). */
  residuals: Float64Array;
  /** sum_i w_i (y_i - x_i'b)^2 (w_i = 1 without weights); exactly 0 for a perfect fit (perfect-fit.ts). */
  residualSumOfSquares: number;
  /** The residuals are rounding noise of the response (perfect-fit.ts): the one flag every part reads. */
  perfectFit: boolean;
  /** (X'WX)^-1 as p rows, formed from the QR factor R, never by inverting X'X. */
  unscaledCovariance: Float64Array[];
  /** Diagonal of the hat matrix W^1/2 X (X'WX)^-1 X' W^1/2, when requested. */
  leverage?: Float64Array;
  /** Always p: rank-deficient designs raise `collinear-columns` instead. */
  rank: number;
  /** Frobenius condition number of the centred and scaled working design. */
  conditionNumber: number;
  /** Refinement steps taken for the coefficients. */
  refinementSteps: number;
  method: LeastSquaresMethod;
  /**
   * The solve in its centred and scaled working coordinates (working-design.ts): every derived quantity
   * (sandwich covariances, leverages, predictions, auxiliary regressions) is computed here and mapped back
   * once, so offsets such as epoch timestamps or price levels never enter a raw quadratic form.
   */
  working: WorkingFit;
}

export interface WorkingFit {
  design: WorkingDesign;
  /** g with b = M g, as hi + lo. */
  coefficients: Float64Array;
  coefficientsLow: Float64Array;
  /** (A'A)^-1 for A = S Z, row-major p x p, as hi + lo (lo null when the solver did not refine it). */
  covariance: Float64Array;
  covarianceLow: Float64Array | null;
}

export function solveLeastSquares(
  design: DesignMatrix,
  response: Float64Array,
  options: LeastSquaresOptions = {},
): LeastSquaresSolution {
  validateLeastSquaresInput(design, response, options.weights);
  const { n, columns, names, hasIntercept } = design;
  const p = columns.length;
  const working = prepareWorkingDesign(names, columns, n, hasIntercept, options.weights, design.lowParts);
  const computeLeverage = options.computeLeverage === true;
  const method = options.method ?? (n * p > TALL_SKINNY_THRESHOLD ? 'tall-skinny' : 'householder-refined');
  const solution =
    method === 'tall-skinny' ? solveTallSkinny(working, response, computeLeverage) : solveRefinedQr(working, response, computeLeverage);
  const { workingCoefficients, workingCoefficientsLow, workingCovariance, workingCovarianceLow, solver, ...rest } = solution;
  const perfectFit = isPerfectFit(solution.residuals, response, options.weights);
  return {
    ...rest,
    residualSumOfSquares: perfectFit ? 0 : solution.residualSumOfSquares,
    perfectFit,
    rank: p,
    method: method === 'tall-skinny' ? (solver ?? 'householder-refined') : 'householder-refined',
    working: {
      design: working,
      coefficients: workingCoefficients,
      coefficientsLow: workingCoefficientsLow,
      covariance: workingCovariance,
      covarianceLow: workingCovarianceLow,
    },
  };
}

/** Shape and value checks; fit-model.ts has already given friendlier messages for request data. */
export function validateLeastSquaresInput(
  design: DesignMatrix,
  response: Float64Array,
  weights: Float64Array | undefined,
): void {
  const { n, columns, names, hasIntercept } = design;
  const p = columns.length;
  if (!Number.isInteger(n) || n < 1) {
    throw new EngineError('empty-input', 'The design has no observations.', { field: 'n' });
  }
  if (names.length !== p || p < 1) {
    throw new EngineError('invalid-argument', 'The design needs one name per column and at least one column.', {
      field: 'names',
    });
  }
  if (response.length !== n) {
    throw new EngineError('length-mismatch', `The response has ${response.length} values, the design ${n} rows.`, {
      field: 'response',
    });
  }
  for (let j = 0; j < p; j++) {
    const column = columns[j] as Float64Array;
    const name = names[j] as string;
    if (column.length !== n) {
      throw new EngineError('length-mismatch', `Column "${name}" has ${column.length} values, expected ${n}.`, {
        column: name,
      });
    }
    const low = design.lowParts?.[j];
    if (low && low.length !== n) {
      throw new EngineError('length-mismatch', `The low part of column "${name}" has ${low.length} values, expected ${n}.`, {
        column: name,
      });
    }
    if (low && firstNonFinite(low) >= 0) {
      throw new EngineError('non-finite-value', `The low part of column "${name}" is not finite.`, { column: name });
    }
    if (hasIntercept && j === 0) {
      for (let i = 0; i < n; i++) {
        if (column[i] !== 1) {
          throw new EngineError('invalid-argument', 'With hasIntercept, the first design column must be all ones.', {
            column: name,
            row: i,
          });
        }
      }
    }
    // Finiteness of the other columns is checked inside their first pass (working-design.ts).
  }
  const responseRow = firstNonFinite(response);
  if (responseRow >= 0) {
    throw new EngineError('non-finite-value', `The response has a non-finite value at row ${responseRow} (0-based).`, {
      field: 'response',
      row: responseRow,
    });
  }
  if (weights) {
    if (weights.length !== n) {
      throw new EngineError('length-mismatch', `The weights have ${weights.length} values, expected ${n}.`, {
        field: 'weights',
      });
    }
    for (let i = 0; i < n; i++) {
      const w = weights[i]!;
      if (!(Number.isFinite(w) && w > 0)) {
        throw new EngineError('non-positive-weight', `Weight at row ${i} (0-based) is not a positive finite number.`, {
          field: 'weights',
          row: i,
        });
      }
    }
  }
  if (n <= p) {
    throw new EngineError(
      'too-few-observations',
      `${n} observations cannot estimate ${p} coefficients with any residual degrees of freedom; ` +
        'at least p + 1 observations are needed.',
      { field: 'n' },
    );
  }
}
