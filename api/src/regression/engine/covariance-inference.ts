/**
 * The coefficient table and the Wald test under a chosen coefficient covariance V.
 *
 *   standard error_j = sqrt(V_jj),  t_j = b_j / se_j,  p_j = P(|T_df| >= |t_j|),
 *   interval_j = b_j -/+ t_{df, (1 + level)/2} se_j,
 * with df = the covariance's inference degrees of freedom (n - p, or G - 1 for cluster).
 *
 * Wald test that every slope is 0 (every coefficient when the model has no intercept):
 *   F = (R b)' (R V R')^-1 (R b) / q ~ F(q, df),  R selecting the q tested coefficients.
 * When R V R' is singular (for example a cluster covariance with q > G - 1) the test is not defined
 * and `waldTest` is null.
 */

import type { CoefficientEstimate } from './coefficient-inference';
import { assertRepresentable } from './representable';
import { studentTInverseSurvival, studentTTwoSidedPValue, fisherFSurvival } from './distributions';
import { CoefficientCovariance, CovarianceDescription } from './covariance';
import { cholesky, choleskySolve, SquareMatrix } from './diagnostics/small-matrix';

/** The coefficient names in design order and whether the first is the intercept. */
export interface TermLayout {
  names: string[];
  hasIntercept: boolean;
}

/** One row of the coefficient table: the same shape as the classical table's (coefficient-inference.ts). */
export type CoefficientRow = CoefficientEstimate;

export interface WaldTest {
  /** Terms tested jointly against 0. */
  terms: string[];
  statistic: number;
  numeratorDegreesOfFreedom: number;
  denominatorDegreesOfFreedom: number;
  pValue: number;
}

export interface CoefficientInference {
  covariance: CovarianceDescription;
  confidenceLevel: number;
  coefficients: CoefficientRow[];
  waldTest: WaldTest | null;
  /** Relative error bound of each standard error in `coefficients` (accuracy.ts); absent for batch fits. */
  standardErrorAccuracy?: (number | null)[];
}

export function coefficientInference(
  design: TermLayout,
  coefficients: Float64Array,
  covariance: CoefficientCovariance,
  confidenceLevel: number,
  /** t_{df, (1 + level)/2} when the caller already has it (batch fits share one). */
  criticalValue?: number,
): CoefficientInference {
  const df = covariance.description.inferenceDegreesOfFreedom;
  const critical = criticalValue ?? studentTInverseSurvival((1 - confidenceLevel) / 2, df);
  const rows = design.names.map((term, j): CoefficientRow => {
    const estimate = coefficients[j]!;
    const standardError = Math.sqrt(Math.max(0, covariance.matrix[j]![j]!));
    // A zero standard error (an exact fit) leaves t undefined: reported as null, never NaN or Infinity.
    const tStatistic = standardError > 0 ? estimate / standardError : null;
    return {
      term,
      estimate,
      standardError,
      tStatistic,
      pValue: tStatistic === null ? null : studentTTwoSidedPValue(tStatistic, df),
      confidenceInterval: { lower: estimate - critical * standardError, upper: estimate + critical * standardError },
    };
  });
  assertRepresentable(rows.map((row) => row.standardError), design.names);
  return {
    covariance: covariance.description,
    confidenceLevel,
    coefficients: rows,
    waldTest: waldTest(design, coefficients, covariance.matrix, df),
    ...(covariance.standardErrorBounds ? { standardErrorAccuracy: covariance.standardErrorBounds } : {}),
  };
}

export function waldTest(design: TermLayout, coefficients: Float64Array, matrix: SquareMatrix, df: number): WaldTest | null {
  const start = design.hasIntercept ? 1 : 0;
  const indices = design.names.map((_, j) => j).filter((j) => j >= start);
  const q = indices.length;
  if (q === 0) return null;
  const restricted = indices.map((j) => Float64Array.from(indices.map((k) => matrix[j]![k]!)));
  const lower = cholesky(restricted, 1e-12);
  if (!lower) return null;
  const estimates = indices.map((j) => coefficients[j]!);
  const solved = choleskySolve(lower, estimates);
  let quadratic = 0;
  for (let k = 0; k < q; k++) quadratic += estimates[k]! * solved[k]!;
  const statistic = quadratic / q;
  return {
    terms: indices.map((j) => design.names[j]!),
    statistic,
    numeratorDegreesOfFreedom: q,
    denominatorDegreesOfFreedom: df,
    pValue: fisherFSurvival(statistic, q, df),
  };
}
