/**
 * The score factors and the heteroskedasticity-consistent meat shared by the sandwich estimators.
 *
 * For (weighted) least squares the estimating equations are sum_i w_i x_i (y_i - x_i'b) = 0, so the
 * score of row i is u_i = w_i e_i x_i. With a_i = C x_i (C = (X'WX)^-1, from working-coordinates.ts),
 * C u_i = f_i a_i with f_i = w_i e_i, and every sandwich C [sum ...] C becomes a sum of outer products
 * of the a_i, accumulated in double-double (OuterSum).
 */

import { FittedModel } from './diagnostics/model-context';
import { OuterSum } from './working-coordinates';

/** f_i = w_i e_i. */
export function scoreFactors(model: FittedModel): Float64Array {
  const { solution, weights } = model;
  const n = solution.residuals.length;
  const factors = new Float64Array(n);
  // A perfect fit (perfect-fit.ts) has residuals that are rounding noise: its scores are zero.
  if (solution.perfectFit) return factors;
  for (let i = 0; i < n; i++) factors[i] = (weights ? weights[i]! : 1) * solution.residuals[i]!;
  return factors;
}

/** sum_i c_i f_i^2 a_i a_i' (c_i = 1 when `extra` is null): HC0 to HC3 before any small-sample factor. */
export function heteroskedasticMeat(rows: Float64Array[], scores: Float64Array, extra: Float64Array | null): OuterSum {
  const p = rows[0]?.length ?? 0;
  const sum = new OuterSum(p);
  for (let i = 0; i < rows.length; i++) {
    const f = scores[i]!;
    sum.addSquare(rows[i] as Float64Array, f * f * (extra ? extra[i]! : 1));
  }
  return sum;
}
