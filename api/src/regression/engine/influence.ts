/**
 * Observation-level measures of a least-squares fit (all on the weighted scale for WLS, where the
 * residual of observation i is e_i = sqrt(w_i) (y_i - yhat_i)):
 *   leverage h_i            diagonal of the hat matrix
 *   standardised residual   e_i / (s sqrt(1 - h_i))             (internally studentised)
 *   studentised residual    e_i / (s_(i) sqrt(1 - h_i)),        (externally studentised)
 *                           s_(i)^2 = (RSS - e_i^2 / (1 - h_i)) / (n - p - 1)
 *   Cook's distance         e_i^2 h_i / (p s^2 (1 - h_i)^2)
 * (Cook & Weisberg, 1982, "Residuals and Influence in Regression", chapter 2.) A value is null where
 * it is undefined: h_i = 1 (the fit passes through the point), s = 0 (perfect fit), or n - p - 1 = 0.
 */

export interface InfluenceMeasures {
  standardisedResiduals: (number | null)[];
  studentisedResiduals: (number | null)[];
  cooksDistance: (number | null)[];
}

/** Leverage within this distance of 1 is treated as 1 (the point is fitted exactly). */
const LEVERAGE_ONE_TOLERANCE = 1e-10;

export function influenceMeasures(
  residuals: Float64Array,
  leverage: Float64Array,
  weights: Float64Array | null,
  residualSumOfSquares: number,
  parameterCount: number,
): InfluenceMeasures {
  const n = residuals.length;
  const residualDf = n - parameterCount;
  const variance = residualSumOfSquares / residualDf;
  const scale = Math.sqrt(variance);
  const standardisedResiduals: (number | null)[] = new Array(n);
  const studentisedResiduals: (number | null)[] = new Array(n);
  const cooksDistance: (number | null)[] = new Array(n);
  for (let i = 0; i < n; i++) {
    const e = weights ? Math.sqrt(weights[i]!) * residuals[i]! : residuals[i]!;
    const h = leverage[i]!;
    const remainder = 1 - h;
    if (!(scale > 0) || remainder <= LEVERAGE_ONE_TOLERANCE) {
      standardisedResiduals[i] = null;
      studentisedResiduals[i] = null;
      cooksDistance[i] = null;
      continue;
    }
    standardisedResiduals[i] = e / (scale * Math.sqrt(remainder));
    cooksDistance[i] = (e * e * h) / (parameterCount * variance * remainder * remainder);
    const deletedVariance = (residualSumOfSquares - (e * e) / remainder) / (residualDf - 1);
    studentisedResiduals[i] =
      residualDf > 1 && deletedVariance > 0 ? e / Math.sqrt(deletedVariance * remainder) : null;
  }
  return { standardisedResiduals, studentisedResiduals, cooksDistance };
}
