/**
 * Per-observation scores and leverages shared by the sandwich covariance estimators.
 *
 * For (weighted) least squares the estimating equations are sum_i w_i x_i (y_i - x_i'b) = 0, so the
 * score of row i is u_i = w_i e_i x_i and the bread is (X'WX)^-1 (the solver's unscaled covariance).
 * Leverage h_i = w_i x_i' (X'WX)^-1 x_i is the diagonal of the weighted hat matrix.
 */

import { FittedModel } from './diagnostics/model-context';
import { bilinear, SquareMatrix, zeroMatrix } from './diagnostics/small-matrix';

/** Row i of the design (the caller's columns). */
export function designRow(columns: Float64Array[], i: number, into: Float64Array): Float64Array {
  for (let j = 0; j < columns.length; j++) into[j] = (columns[j] as Float64Array)[i]!;
  return into;
}

/** u_i = w_i e_i x_i for every row, as n rows of length p. */
export function scoreRows(model: FittedModel): Float64Array[] {
  const { design, solution, weights } = model;
  const p = design.columns.length;
  const rows: Float64Array[] = [];
  for (let i = 0; i < design.n; i++) {
    const row = designRow(design.columns, i, new Float64Array(p));
    const factor = (weights ? weights[i]! : 1) * solution.residuals[i]!;
    for (let j = 0; j < p; j++) row[j]! *= factor;
    rows.push(row);
  }
  return rows;
}

export function leverages(model: FittedModel): Float64Array {
  const { design, solution, weights } = model;
  const p = design.columns.length;
  const row = new Float64Array(p);
  const result = new Float64Array(design.n);
  for (let i = 0; i < design.n; i++) {
    designRow(design.columns, i, row);
    result[i] = (weights ? weights[i]! : 1) * bilinear(row, solution.unscaledCovariance, row);
  }
  return result;
}

/** sum_i c_i u_i u_i' over the given score rows. */
export function weightedOuterSum(rows: Float64Array[], factors: ArrayLike<number> | null): SquareMatrix {
  const p = rows[0]?.length ?? 0;
  const result = zeroMatrix(p);
  for (let i = 0; i < rows.length; i++) {
    const u = rows[i] as Float64Array;
    const c = factors ? factors[i]! : 1;
    for (let j = 0; j < p; j++) {
      const scaled = c * u[j]!;
      if (scaled === 0) continue;
      const target = result[j] as Float64Array;
      for (let k = j; k < p; k++) target[k]! += scaled * u[k]!;
    }
  }
  for (let j = 0; j < p; j++) for (let k = 0; k < j; k++) result[j]![k] = result[k]![j]!;
  return result;
}
