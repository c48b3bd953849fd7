/**
 * The covariance of the coefficients under the requested assumption about the errors.
 *
 * With C = (X'WX)^-1 (the solver's unscaled covariance), scores u_i = w_i e_i x_i and leverages h_i
 * (covariance-scores.ts). Every sandwich is computed as sum_i c_i (w_i e_i)^2 (C x_i)(C x_i)' with C x_i
 * formed in the solver's working coordinates (working-coordinates.ts), never as a raw quadratic form:
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
import { scale, SquareMatrix } from './diagnostics/small-matrix';
import { clusterFactor, clusterMeat, GroupLabel, indexGroups } from './covariance-cluster';
import { neweyWestMeat, resolveNeweyWestLag } from './covariance-newey-west';
import { heteroskedasticMeat, scoreFactors } from './covariance-scores';
import { mapWorkingMatrix, OuterSum, RowVectors, rowVectors } from './working-coordinates';
import { ddAdd, twoProduct } from './double-double';
import { standardErrorAccuracy } from './accuracy';

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
  /** Covariance of the coefficients b. */
  matrix: SquareMatrix;
  /** The same covariance for the working coefficients g (b = M g); predictions use it. */
  workingMatrix?: SquareMatrix;
  workingMatrixLow?: SquareMatrix;
  /** Relative error bound of each standard error sqrt(V_jj) (accuracy.ts); null where none is claimed. */
  standardErrorBounds?: (number | null)[];
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
    const bread = workingBread(model);
    const working = scaleDoubleDouble(bread.hi, bread.lo, variance);
    return {
      matrix: scale(solution.unscaledCovariance, variance),
      workingMatrix: working.hi,
      workingMatrixLow: working.lo,
      standardErrorBounds: standardErrorAccuracy(solution, new Float64Array(p).fill(1), 'none'),
      description: base,
    };
  }
  const vectors = rowVectors(solution, model.weights);
  const scores = scoreFactors(model);
  if (type === 'hc0' || type === 'hc1') {
    const factor = type === 'hc1' ? n / residualDegreesOfFreedom : 1;
    return { ...sandwichOf(model, vectors, (a) => heteroskedasticMeat(a, scores, null), factor), description: { ...base, smallSampleFactor: factor } };
  }
  if (type === 'hc2' || type === 'hc3') {
    const power = type === 'hc2' ? 1 : 2;
    const factors = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const remaining = 1 - vectors.leverage[i]!;
      if (!(remaining > 1e-12)) {
        throw new AnalysisError(
          'leverage-of-one',
          `Row ${i} (0-based) has leverage 1 (the model fits it exactly whatever its value), so ${type.toUpperCase()} is not defined; use HC0 or HC1.`,
          { field: 'covariance.type', row: i },
        );
      }
      factors[i] = 1 / Math.pow(remaining, power);
    }
    return { ...sandwichOf(model, vectors, (a) => heteroskedasticMeat(a, scores, factors), 1), description: base };
  }
  if (type === 'newey-west') {
    const { lag, rule } = resolveNeweyWestLag(request.lag, n);
    const factor = request.smallSampleCorrection === true ? n / residualDegreesOfFreedom : 1;
    return {
      ...sandwichOf(model, vectors, (a) => neweyWestMeat(a, scores, lag), factor, neweyWestTermRatio(scores, lag)),
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
    ...sandwichOf(model, vectors, (a) => clusterMeat(a, scores, index, count), factor, clusterTermRatio(scores, index, count)),
    description: { ...base, clusterCount: count, smallSampleFactor: factor, inferenceDegreesOfFreedom: count - 1 },
  };
}

/** (A'A)^-1 of the working design as rows of hi and lo parts. */
function workingBread(model: FittedModel): { hi: SquareMatrix; lo: SquareMatrix } {
  const { covariance, covarianceLow, design } = model.solution.working;
  const p = design.p;
  const hi: SquareMatrix = [];
  const lo: SquareMatrix = [];
  for (let j = 0; j < p; j++) {
    hi.push(covariance.slice(j * p, (j + 1) * p));
    lo.push(covarianceLow ? covarianceLow.slice(j * p, (j + 1) * p) : new Float64Array(p));
  }
  return { hi, lo };
}

/** (hi + lo) * factor as a double-double (TwoProduct of hi, so no digit of the pair is lost). */
function scaleDoubleDouble(hi: SquareMatrix, lo: SquareMatrix, factor: number): { hi: SquareMatrix; lo: SquareMatrix } {
  const outHi = hi.map((row) => new Float64Array(row.length));
  const outLo = hi.map((row) => new Float64Array(row.length));
  hi.forEach((row, j) => {
    row.forEach((value, k) => {
      const product = twoProduct(value, factor);
      const sum = ddAdd(product.hi, product.lo, lo[j]![k]! * factor, 0);
      outHi[j]![k] = sum.hi;
      outLo[j]![k] = sum.lo;
    });
  });
  return { hi: outHi, lo: outLo };
}

/**
 * The sandwich in both parametrisations from the per-row vectors (working-coordinates.ts): the meat is
 * summed over v_i = C z_i (working) and vb_i = (X'WX)^-1 x_i (caller's), so no bread multiplication
 * remains. When the problem is too large for the double-double row vectors, the working matrix is mapped.
 */
function sandwichOf(
  model: FittedModel,
  vectors: RowVectors,
  meat: (rows: Float64Array[]) => OuterSum,
  factor: number,
  termRatio?: (rows: Float64Array[], matrix: SquareMatrix) => Float64Array,
): { matrix: SquareMatrix; workingMatrix: SquareMatrix; workingMatrixLow: SquareMatrix; standardErrorBounds: (number | null)[] } {
  const workingSum = meat(vectors.working);
  const working = scaleDoubleDouble(workingSum.matrix(), workingSum.lowMatrix(), factor);
  const matrix = vectors.exact ? scale(meat(vectors.design).matrix(), factor) : mapWorkingMatrix(model.solution.working.design, working.hi);
  const p = matrix.length;
  const ratios = vectors.exact && termRatio ? termRatio(vectors.design, scale(matrix, 1 / factor)) : new Float64Array(p).fill(1);
  const standardErrorBounds = standardErrorAccuracy(model.solution, ratios, vectors.exact ? 'row-vectors' : 'mapped');
  return { matrix, workingMatrix: working.hi, workingMatrixLow: working.lo, standardErrorBounds };
}

/** sum |terms| / |V_jj| of a Newey-West diagonal: the cross terms may cancel. */
function neweyWestTermRatio(scores: Float64Array, lag: number): (rows: Float64Array[], matrix: SquareMatrix) => Float64Array {
  return (rows, matrix) => {
    const p = matrix.length;
    const ratio = new Float64Array(p);
    for (let j = 0; j < p; j++) {
      let total = 0;
      for (let t = 0; t < rows.length; t++) total += (scores[t]! * rows[t]![j]!) ** 2;
      for (let l = 1; l <= lag; l++) {
        const weight = 1 - l / (lag + 1);
        for (let t = l; t < rows.length; t++) total += 2 * weight * Math.abs(scores[t]! * rows[t]![j]! * scores[t - l]! * rows[t - l]![j]!);
      }
      ratio[j] = total / Math.abs(matrix[j]![j]!);
    }
    return ratio;
  };
}

/** sum_g (sum_{i in g} |f_i a_ij|)^2 / V_jj for a cluster diagonal. */
function clusterTermRatio(scores: Float64Array, index: Int32Array, count: number): (rows: Float64Array[], matrix: SquareMatrix) => Float64Array {
  return (rows, matrix) => {
    const p = matrix.length;
    const ratio = new Float64Array(p);
    for (let j = 0; j < p; j++) {
      const sums = new Float64Array(count);
      for (let i = 0; i < rows.length; i++) sums[index[i]!]! += Math.abs(scores[i]! * rows[i]![j]!);
      let total = 0;
      for (let g = 0; g < count; g++) total += sums[g]! * sums[g]!;
      ratio[j] = total / Math.abs(matrix[j]![j]!);
    }
    return ratio;
  };
}
