/**
 * The covariance of the coefficients under the requested assumption about the errors.
 *
 * With C = (X'WX)^-1 (the solver's unscaled covariance), scores u_i = w_i e_i x_i and leverages h_i
 * (covariance-scores.ts):
 *   classical   sigma^2 C,  sigma^2 = RSS / (n - p)
 *   hc0         C [sum u_i u_i'] C                                  (White 1980, Econometrica 48(4))
 *   hc1         hc0 * n / (n - p)                                   (MacKinnon & White 1985, J. Econometrics 29(3))
 *   hc2         C [sum u_i u_i' / (1 - h_i)] C                      (MacKinnon & White 1985)
 *   hc3         C [sum u_i u_i' / (1 - h_i)^2] C                    (MacKinnon & White 1985; Davidson & MacKinnon 1993)
 *   newey-west  covariance-newey-west.ts (Bartlett weights, fixed or automatic lag, no small-sample factor by default)
 *   cluster     covariance-cluster.ts (CR1, G - 1 degrees of freedom)
 * t-tests use n - p degrees of freedom for every type except cluster (G - 1).
 *
 * Errors: AnalysisError `unknown-covariance` (field `covariance.type`), `leverage-of-one` (HC2/HC3 with
 * an observation of leverage 1, field `covariance.type`, row), plus the lag and group errors of the
 * Newey-West and cluster files.
 */

import { AnalysisError } from './diagnostics/analysis-error';
import { FittedModel } from './diagnostics/model-context';
import { sandwich, scale, SquareMatrix } from './diagnostics/small-matrix';
import { clusterFactor, clusterMeat, GroupLabel, indexGroups } from './covariance-cluster';
import { neweyWestMeat, resolveNeweyWestLag } from './covariance-newey-west';
import { leverages, scoreRows, weightedOuterSum } from './covariance-scores';

export const COVARIANCE_TYPES = ['classical', 'hc0', 'hc1', 'hc2', 'hc3', 'newey-west', 'cluster'] as const;
export type CovarianceType = (typeof COVARIANCE_TYPES)[number];

export interface CovarianceRequest {
  type: CovarianceType;
  /** Newey-West: a fixed lag, or 'automatic' (the default). */
  lag?: number | 'automatic';
  /** Newey-West: multiply by n / (n - p) (default false). */
  smallSampleCorrection?: boolean;
  /** Cluster: one group label per observation. */
  groups?: ArrayLike<GroupLabel>;
}

export interface CovarianceDescription {
  type: CovarianceType;
  /** Newey-West lag L; null for other types. */
  lag: number | null;
  lagRule: 'fixed' | 'automatic' | null;
  kernel: 'bartlett' | null;
  /** Number of clusters G; null for other types. */
  clusterCount: number | null;
  /** The factor the sandwich is multiplied by (1 when none). */
  smallSampleFactor: number;
  /** Degrees of freedom of the t and F reference distributions. */
  inferenceDegreesOfFreedom: number;
}

export interface CoefficientCovariance {
  matrix: SquareMatrix;
  description: CovarianceDescription;
}

export function validateCovarianceType(type: unknown): CovarianceType {
  if (type === undefined) return 'classical';
  if (typeof type !== 'string' || !(COVARIANCE_TYPES as readonly string[]).includes(type)) {
    throw new AnalysisError(
      'unknown-covariance',
      `Unknown covariance type ${JSON.stringify(type)}; use one of ${COVARIANCE_TYPES.join(', ')}.`,
      { field: 'covariance.type' },
    );
  }
  return type as CovarianceType;
}

export function coefficientCovariance(model: FittedModel, request: CovarianceRequest = { type: 'classical' }): CoefficientCovariance {
  const type = validateCovarianceType(request.type);
  const { design, solution } = model;
  const n = design.n;
  const p = design.columns.length;
  const bread = solution.unscaledCovariance;
  const residualDegreesOfFreedom = n - p;
  const base: CovarianceDescription = {
    type,
    lag: null,
    lagRule: null,
    kernel: null,
    clusterCount: null,
    smallSampleFactor: 1,
    inferenceDegreesOfFreedom: residualDegreesOfFreedom,
  };
  if (type === 'classical') {
    const variance = solution.residualSumOfSquares / residualDegreesOfFreedom;
    return { matrix: scale(bread, variance), description: base };
  }
  const scores = scoreRows(model);
  if (type === 'hc0' || type === 'hc1') {
    const factor = type === 'hc1' ? n / residualDegreesOfFreedom : 1;
    return { matrix: scale(sandwich(bread, weightedOuterSum(scores, null)), factor), description: { ...base, smallSampleFactor: factor } };
  }
  if (type === 'hc2' || type === 'hc3') {
    const power = type === 'hc2' ? 1 : 2;
    const leverage = leverages(model);
    const factors = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const remaining = 1 - leverage[i]!;
      if (!(remaining > 1e-12)) {
        throw new AnalysisError(
          'leverage-of-one',
          `Row ${i} (0-based) has leverage 1 (the model fits it exactly whatever its value), so ${type.toUpperCase()} is not defined; use hc0 or hc1.`,
          { field: 'covariance.type', row: i },
        );
      }
      factors[i] = 1 / Math.pow(remaining, power);
    }
    return { matrix: sandwich(bread, weightedOuterSum(scores, factors)), description: base };
  }
  if (type === 'newey-west') {
    const { lag, rule } = resolveNeweyWestLag(request.lag, n);
    const factor = request.smallSampleCorrection === true ? n / residualDegreesOfFreedom : 1;
    return {
      matrix: scale(sandwich(bread, neweyWestMeat(scores, lag)), factor),
      description: { ...base, lag, lagRule: rule, kernel: 'bartlett', smallSampleFactor: factor },
    };
  }
  if (request.groups === undefined) {
    throw new AnalysisError('invalid-cluster-groups', 'Cluster-robust standard errors need a group label per observation.', {
      field: 'covariance.groups',
    });
  }
  const { index, count } = indexGroups(request.groups, n);
  const factor = clusterFactor(count, n, p);
  return {
    matrix: scale(sandwich(bread, clusterMeat(scores, index, count)), factor),
    description: { ...base, clusterCount: count, smallSampleFactor: factor, inferenceDegreesOfFreedom: count - 1 },
  };
}
