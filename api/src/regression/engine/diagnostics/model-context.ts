/**
 * A fitted least-squares model as the diagnostics see it, and its whitened form.
 *
 * Weighted least squares with weights w is ordinary least squares on the whitened model
 * sqrt(w) y = sqrt(w) X b + u. Every residual-based check is therefore applied to the whitened
 * residuals sqrt(w_i) e_i and the whitened regressors sqrt(w_i) x_i; without weights these are the
 * model's own residuals and columns.
 */

import { DesignMatrix, LeastSquaresSolution } from '../least-squares';
import { workingRowInto } from '../working-coordinates';

export interface FittedModel {
  design: DesignMatrix;
  /** The response on the model's scale (after any log transform). */
  response: Float64Array;
  solution: LeastSquaresSolution;
  /** Positive weights of a weighted fit, row-aligned with the design. */
  weights?: Float64Array;
}

export interface RegressorSet {
  /** True when an explicit constant is part of the set (it is not listed in `names`/`columns`). */
  constant: boolean;
  names: string[];
  columns: Float64Array[];
}

export function whitenedResiduals(model: FittedModel): Float64Array {
  const { residuals } = model.solution;
  const { weights } = model;
  if (!weights) return residuals;
  const result = new Float64Array(residuals.length);
  for (let i = 0; i < residuals.length; i++) result[i] = Math.sqrt(weights[i]!) * residuals[i]!;
  return result;
}

/**
 * The whitened residuals divided by a power of two near their largest magnitude (an exact scaling). Every
 * residual-based statistic here is invariant to rescaling the residuals (ratios such as R², skewness,
 * kurtosis, Durbin-Watson), while squares and fourth powers of raw residuals near 1e144 or 1e-144 would
 * overflow or underflow.
 */
export function scaledWhitenedResiduals(model: FittedModel): Float64Array {
  const residuals = Float64Array.from(whitenedResiduals(model));
  let largest = 0;
  for (let i = 0; i < residuals.length; i++) largest = Math.max(largest, Math.abs(residuals[i]!));
  if (!(largest > 0) || !Number.isFinite(largest)) return residuals;
  const inverse = Math.pow(2, -Math.round(Math.log2(largest)));
  for (let i = 0; i < residuals.length; i++) residuals[i]! *= inverse;
  return residuals;
}

/** The design's columns multiplied row-wise by sqrt(w); the columns themselves when unweighted. */
export function whitenedColumns(model: FittedModel): Float64Array[] {
  const { weights } = model;
  if (!weights) return model.design.columns;
  const roots = weights.map(Math.sqrt);
  return model.design.columns.map((column) => column.map((value, i) => value * roots[i]!));
}

/**
 * The solver's working columns z_j = (x_j - m_j) / c_j (working-design.ts), rounded, unweighted; the
 * intercept column is the constant 1/c_0. Each is an affine image of the caller's column, so every
 * auxiliary regression that includes a constant (or the intercept column) spans the same space with them
 * as with the raw columns, and its statistics are the same in exact arithmetic; but they are centred and
 * of unit scale, so offsets such as epoch timestamps never turn squares and cross-products into noise.
 */
export function workingColumns(model: FittedModel): Float64Array[] {
  const { design } = model.solution.working;
  const { n, p } = design;
  const columns: Float64Array[] = [];
  for (let j = 0; j < p; j++) columns.push(new Float64Array(n));
  const hi = new Float64Array(p);
  const lo = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    workingRowInto(design, i, hi, lo);
    for (let j = 0; j < p; j++) columns[j]![i] = hi[j]! + lo[j]!;
  }
  return columns;
}

function whiten(columns: Float64Array[], weights: Float64Array | undefined): Float64Array[] {
  if (!weights) return columns;
  const roots = weights.map(Math.sqrt);
  return columns.map((column) => column.map((value, i) => value * roots[i]!));
}

/**
 * The model's regressors for an auxiliary regression, in working coordinates (workingColumns): an
 * unweighted intercept model gives the
 * constant plus its slope columns; otherwise every whitened column, with no separate constant (for a
 * weighted intercept model the whitened intercept column sqrt(w) takes the constant's place).
 */
export function modelRegressors(model: FittedModel): RegressorSet {
  const { design } = model;
  const columns = workingColumns(model);
  if (design.hasIntercept && !model.weights) {
    return { constant: true, names: design.names.slice(1), columns: columns.slice(1) };
  }
  const names = design.names.map((name, j) => (design.hasIntercept && j === 0 ? WHITENED_INTERCEPT_NAME : name));
  return { constant: false, names, columns: whiten(columns, model.weights) };
}

/** Name of the whitened intercept column sqrt(w) in auxiliary regressions of a weighted fit. */
export const WHITENED_INTERCEPT_NAME = 'sqrt(weight)';

/**
 * Non-constant regressors to which a test adds its own constant: the slope columns of an unweighted
 * intercept model, every whitened column otherwise (a column equal to the constant is dropped later by
 * the auxiliary regression's collinearity handling).
 */
export function nonConstantRegressors(model: FittedModel): { names: string[]; columns: Float64Array[] } {
  const regressors = modelRegressors(model);
  return { names: regressors.names, columns: regressors.columns.map(centredAndScaled) };
}

/**
 * A column minus its mean (x - m in double-double, then rounded), divided by a power of two near its
 * norm. The tests that add their own constant (Breusch-Pagan, White) span the same space with these
 * columns, their squares and cross-products as with the originals, so their statistics are unchanged;
 * centring keeps a level (a price near 1e5 in a model without intercept) out of the squares.
 */
function centredAndScaled(column: Float64Array): Float64Array {
  const n = column.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += column[i]!;
  let mean = sum / n;
  let correction = 0;
  for (let i = 0; i < n; i++) correction += column[i]! - mean;
  mean += correction / n;
  const out = new Float64Array(n);
  let squares = 0;
  for (let i = 0; i < n; i++) {
    const x = column[i]!;
    const d = x - mean;
    const back = d - x;
    out[i] = d + (x - (d - back) + (-mean - back));
    squares += out[i]! * out[i]!;
  }
  if (!(squares > 0) || !Number.isFinite(squares)) return out;
  const inverse = Math.pow(2, -Math.round(Math.log2(Math.sqrt(squares))));
  for (let i = 0; i < n; i++) out[i]! *= inverse;
  return out;
}
