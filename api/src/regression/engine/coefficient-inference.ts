/**
 * The coefficient table: estimate, standard error, t-statistic, two-sided p-value and confidence
 * interval for each coefficient of a least-squares fit.
 *
 * standard error_j = s sqrt([(X'WX)^-1]_jj) with s^2 = RSS / (n - p) (the residual mean square);
 * t_j = b_j / se_j on n - p degrees of freedom; p_j = P(|T| >= |t_j|) computed from one tail (so values
 * down to 1e-308 keep their relative accuracy); interval b_j -/+ t_{(1+level)/2, n-p} se_j.
 * For a perfect fit (RSS = 0) the standard errors are 0, t and p are null (undefined), and the
 * interval collapses to the estimate.
 */

import { studentTQuantile, studentTTwoSidedPValue } from './distributions';

export interface CoefficientEstimate {
  term: string;
  estimate: number;
  standardError: number;
  /** null when the standard error is 0 (perfect fit). */
  tStatistic: number | null;
  /** Two-sided; null when the t-statistic is null. */
  pValue: number | null;
  confidenceInterval: { lower: number; upper: number };
}

export function coefficientTable(
  terms: string[],
  coefficients: Float64Array,
  unscaledCovariance: Float64Array[],
  residualMeanSquare: number,
  residualDegreesOfFreedom: number,
  confidenceLevel: number,
): CoefficientEstimate[] {
  const criticalValue = studentTQuantile(0.5 + 0.5 * confidenceLevel, residualDegreesOfFreedom);
  const scale = Math.sqrt(residualMeanSquare);
  return terms.map((term, j) => {
    const estimate = coefficients[j]!;
    const variance = Math.max(0, (unscaledCovariance[j] as Float64Array)[j]!);
    const standardError = scale * Math.sqrt(variance);
    const tStatistic = standardError > 0 ? estimate / standardError : null;
    const pValue = tStatistic === null ? null : studentTTwoSidedPValue(tStatistic, residualDegreesOfFreedom);
    const halfWidth = criticalValue * standardError;
    return {
      term,
      estimate,
      standardError,
      tStatistic,
      pValue,
      confidenceInterval: { lower: estimate - halfWidth, upper: estimate + halfWidth },
    };
  });
}
