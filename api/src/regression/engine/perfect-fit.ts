/**
 * The one rule for a perfect fit, used by every part of an answer (the coefficient table, ANOVA, R², the
 * robust covariances and every assumption check).
 *
 * A fit is perfect when the residuals are no larger than the rounding of the response itself:
 *   ||s e||_2 <= PERFECT_FIT_ROUNDING_UNITS * epsilon * ||s y||_2      (s_i = sqrt(w_i), 1 without weights)
 * with epsilon = 2^-52. A response computed exactly from the predictors and then rounded to double
 * carries residuals of about 0.5 epsilon |y_i| per row; 32 units leaves room for that and for the log
 * transform of a log-y form, while any real noise, even at 1e-14 of the response's level, stays above it.
 * The threshold is relative to the raw (uncentred) response because rounding happens at the response's
 * level, not at its spread. A perfect fit reports a residual sum of squares of exactly 0: standard errors
 * are 0, t, p and F are null, and checks that need residual variation are reported as not defined.
 */

export const PERFECT_FIT_ROUNDING_UNITS = 32;

/** Scaled 2-norm (no overflow or underflow for any finite input). */
function weightedNorm(values: Float64Array, weights: Float64Array | null | undefined): number {
  let largest = 0;
  for (let i = 0; i < values.length; i++) {
    const v = Math.abs(values[i]!) * (weights ? Math.sqrt(weights[i]!) : 1);
    if (v > largest) largest = v;
  }
  if (!(largest > 0) || !Number.isFinite(largest)) return largest;
  let sum = 0;
  const inverse = 1 / largest;
  for (let i = 0; i < values.length; i++) {
    const v = values[i]! * (weights ? Math.sqrt(weights[i]!) : 1) * inverse;
    sum += v * v;
  }
  return largest * Math.sqrt(sum);
}

export function isPerfectFit(
  residuals: Float64Array,
  response: Float64Array,
  weights: Float64Array | null | undefined,
): boolean {
  const residualNorm = weightedNorm(residuals, weights);
  return residualNorm <= PERFECT_FIT_ROUNDING_UNITS * Number.EPSILON * weightedNorm(response, weights);
}

/** The same rule from sums: residual sum of squares against the raw (uncentred) sum of squares of y. */
export function isPerfectFitFromSums(residualSumOfSquares: number, responseRawSquares: number): boolean {
  const limit = PERFECT_FIT_ROUNDING_UNITS * Number.EPSILON;
  return residualSumOfSquares <= limit * limit * responseRawSquares;
}
