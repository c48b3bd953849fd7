/**
 * A-posteriori accuracy of an answer: a bound on the relative error of every reported coefficient and
 * standard error, computed from the reported numbers themselves.
 *
 * Coefficients. For least squares the error of any candidate g in working coordinates is exactly
 *   g* - g = C A'(S y - A g),   C = (A'A)^-1,  A = S Z     (the normal equations are linear in g),
 * so the residual of the reported b, evaluated in double-double, gives the error of b directly:
 * delta_b = M C A' S (y - X b). Three things are not exact, and each is bounded:
 *  - C is known to a relative accuracy of about kappa * u (kappa the working condition number, u = 2^-53):
 *    the estimate is doubled, which covers it while kappa * u <= 1/2; above 1e-3 no bound is claimed (null);
 *  - the double-double residual carries at most 2^-100 of |y_i| + sum_j |x_ij b_j| per row, propagated
 *    through |M| |C| |A'| as an additive floor;
 *  - delta_b itself is rounded: its relative error is a few u, far inside the doubling.
 * Standard errors. SE = sqrt(V_jj). V's relative error is bounded by the accuracy of its inputs: C refined
 * in double-double (error below 2^-60 once refinement converged) or from R^-1 R^-T (kappa^2 u p), the
 * residual sum of squares (a few u), and for sandwiches the rounding of each term (4 u) times the ratio of
 * the sum of |terms| to |V_jj| (1 for HC0-HC3, whose terms are non-negative). The SE bound is half the
 * variance bound plus 2 u for the square root and the final rounding.
 * These are bounds under the stated floating-point model, checked against exact rational references in
 * exact-reference.spec.ts (never below the error actually made).
 */

import { LeastSquaresSolution } from './least-squares';
import { shouldRefineCovariance } from './refined-qr-solver';
import { workingRowInto } from './working-coordinates';

const UNIT_ROUNDOFF = Number.EPSILON / 2;
const DOUBLE_DOUBLE_ROUNDOFF = Math.pow(2, -100);
const SPLITTER = 134217729;
/** Above this kappa * u no bound is claimed. */
const LARGEST_CLAIMED_CONDITION_ROUNDOFF = 1e-3;

export interface AccuracyReport {
  /** Bound on |reported - exact| / |exact| for each coefficient, in design order; null when not claimed. */
  coefficients: (number | null)[];
  /** The same for each standard error of the covariance in use. */
  standardErrors: (number | null)[];
}

/** Relative error bound of each coefficient b (as reported) of a QR-path solution. */
export function coefficientAccuracy(
  solution: LeastSquaresSolution,
  response: Float64Array,
  weights: Float64Array | undefined,
): (number | null)[] {
  const { design, covariance } = solution.working;
  const { n, p, interceptIndex, inverseScale, shift } = design;
  const b = solution.coefficients;
  if (!(solution.conditionNumber * UNIT_ROUNDOFF <= LARGEST_CLAIMED_CONDITION_ROUNDOFF)) return new Array<number | null>(p).fill(null);
  // h = A' S (y - X b) in double-double; floor = |A'| |S| (residual evaluation error).
  const hHi = new Float64Array(p);
  const hLo = new Float64Array(p);
  const floor = new Float64Array(p);
  const zHi = new Float64Array(p);
  const zLo = new Float64Array(p);
  for (let i = 0; i < n; i++) {
    // r = y - sum_j x_ij b_j in double-double, x_ij = columns + lowParts.
    let rHi = response[i]!;
    let rLo = 0;
    let magnitude = Math.abs(rHi);
    for (let j = 0; j < p; j++) {
      const x = j === interceptIndex ? 1 : (design.columns[j] as Float64Array)[i]!;
      const low = j === interceptIndex ? 0 : (design.lowParts[j]?.[i] ?? 0);
      const coefficient = b[j]!;
      const product = x * coefficient;
      let t = SPLITTER * x;
      const xH = t - (t - x);
      const xL = x - xH;
      t = SPLITTER * coefficient;
      const cH = t - (t - coefficient);
      const cL = coefficient - cH;
      const productError = xH * cH - product + xH * cL + xL * cH + xL * cL + low * coefficient;
      const total = rHi - product;
      const back = total - rHi;
      rLo += rHi - (total - back) + (-product - back) - productError;
      rHi = total;
      magnitude += Math.abs(product);
    }
    const residual = rHi + rLo;
    const weight = weights ? weights[i]! : 1;
    workingRowInto(design, i, zHi, zLo);
    for (let j = 0; j < p; j++) {
      // A' S r = Z' W r: z_ij w_i r_i accumulated in double-double (w r rounded: its error is relative u,
      // covered by the doubling below).
      const factor = weight * residual;
      const z = zHi[j]!;
      const product = z * factor;
      let t = SPLITTER * z;
      const zH = t - (t - z);
      const zL = z - zH;
      t = SPLITTER * factor;
      const fH = t - (t - factor);
      const fL = factor - fH;
      const productError = zH * fH - product + zH * fL + zL * fH + zL * fL + zLo[j]! * factor;
      const total = hHi[j]! + product;
      const back = total - hHi[j]!;
      hLo[j]! += hHi[j]! - (total - back) + (product - back) + productError;
      hHi[j] = total;
      floor[j]! += Math.abs(z) * weight * DOUBLE_DOUBLE_ROUNDOFF * magnitude;
    }
  }
  const deltaG = new Float64Array(p);
  const floorG = new Float64Array(p);
  for (let a = 0; a < p; a++) {
    for (let k = 0; k < p; k++) {
      deltaG[a]! += covariance[a * p + k]! * (hHi[k]! + hLo[k]!);
      floorG[a]! += Math.abs(covariance[a * p + k]!) * floor[k]!;
    }
  }
  // |delta_b| <= |M| (2 |delta_g| + floor_g), M as in working-design.ts.
  const bound = new Float64Array(p);
  for (let j = 0; j < p; j++) bound[j] = inverseScale[j]! * (2 * Math.abs(deltaG[j]!) + floorG[j]!);
  if (interceptIndex >= 0) {
    for (let j = 0; j < p; j++) {
      if (j !== interceptIndex) bound[interceptIndex]! += Math.abs(shift[j]! * inverseScale[j]!) * (2 * Math.abs(deltaG[j]!) + floorG[j]!);
    }
  }
  return Array.from(b, (value, j) => {
    const absolute = bound[j]! * (1 + 8 * UNIT_ROUNDOFF);
    if (value === 0) return absolute === 0 ? 0 : null;
    return Math.max(absolute / Math.abs(value), Number.MIN_VALUE);
  });
}

/**
 * Relative error bound of the standard errors sqrt(V_jj): `termRatio[j]` is sum |terms| / |V_jj| of the
 * sandwich's diagonal (1 for classical and HC types), `sandwich` whether per-row terms were summed.
 */
export function standardErrorAccuracy(
  solution: LeastSquaresSolution,
  termRatio: ArrayLike<number>,
  sandwich: 'none' | 'row-vectors' | 'mapped',
): (number | null)[] {
  const { design, covarianceLow } = solution.working;
  const { n, p } = design;
  const kappa = solution.conditionNumber;
  // A sandwich summed in working coordinates and mapped afterwards (problems too large for the per-row
  // double-double vectors) can cancel in the intercept's row: no bound is claimed for it.
  if (!(kappa * UNIT_ROUNDOFF <= LARGEST_CLAIMED_CONDITION_ROUNDOFF) || sandwich === 'mapped') return new Array<number | null>(p).fill(null);
  // Relative accuracy of C = (A'A)^-1: refined columns converge to double-double; otherwise perturbation
  // theory of the inverse from R (Higham 2002, "Accuracy and Stability of Numerical Algorithms", ch. 14).
  const refined = covarianceLow !== null && shouldRefineCovariance(n, p, kappa);
  const breadError = refined ? Math.pow(2, -60) : 4 * p * kappa * kappa * UNIT_ROUNDOFF;
  return Array.from({ length: p }, (_, j) => {
    // Classical: sigma^2 (a few u) times C_jj. Sandwich: each term c f^2 a_j^2 carries 2 bread errors,
    // 2 residual roundings and 4 u of arithmetic, amplified by sum |terms| / |V_jj|.
    const varianceError = sandwich === 'row-vectors'
      ? (2 * breadError + 8 * UNIT_ROUNDOFF) * Math.max(1, termRatio[j]!) + 4 * UNIT_ROUNDOFF
      : breadError + 6 * UNIT_ROUNDOFF;
    return varianceError / 2 + 2 * UNIT_ROUNDOFF;
  });
}
