/**
 * One factorisation of a shared design, reused for many responses.
 *
 * The predictor columns are centred (intercept models) and scaled by the power of two nearest their
 * centred norm, as in working-design.ts, and factorised once by Householder QR (householder-qr.ts):
 * Z = Q R. For each response y (centred likewise), the scaled slopes are g = R^-1 Q'y, followed by one
 * step of iterative refinement on the residual (g += R^-1 Q'(y - Z g); Golub & Van Loan, "Matrix
 * Computations", 4th ed., section 5.3.8), so each response costs O(n k) and the factorisation O(n k^2)
 * is paid once. Slopes are b_j = g_j / c_j and the intercept b_0 = mean y - sum_j m_j b_j.
 *
 * The unscaled covariance (X'X)^-1 is the same for every response:
 *   slopes:   S = D (R'R)^-1 D,  D = diag(1 / c_j);
 *   intercept (when present): 1/n + m'S m, and -(S m)_j against slope j.
 *
 * Errors: EngineError `constant-column` (a predictor with no variation, intercept models), `zero-column`,
 * `collinear-columns` (naming the first dependent predictor).
 */

import { EngineError } from './errors';
import { applyQTranspose, HouseholderFactor, householderFactorise, solveUpper } from './householder-qr';
import { INTERCEPT_NAME } from './least-squares';
import { inverseGram, upperInverse } from './triangular';
import { rankToleranceFor } from './working-design';

export interface SharedFactorisation {
  n: number;
  hasIntercept: boolean;
  /** Coefficient names in order (intercept first when present). */
  names: string[];
  /** Centred, scaled predictor columns Z (kept for the refinement residual). */
  working: Float64Array[];
  factor: HouseholderFactor;
  means: Float64Array;
  inverseScale: Float64Array;
  /** (X'X)^-1 in the caller's parametrisation, p rows. */
  unscaledCovariance: Float64Array[];
}

export interface SharedSolution {
  coefficients: Float64Array;
  residualSumOfSquares: number;
  /** sum (y - mean y)^2 for intercept models, sum y^2 otherwise. */
  totalSumOfSquares: number;
}

function powerOfTwoNear(value: number): number {
  return Math.pow(2, Math.max(-1000, Math.min(1000, Math.round(Math.log2(value)))));
}

function meanOf(values: Float64Array): number {
  const n = values.length;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += values[i]!;
  let mean = sum / n;
  let correction = 0;
  for (let i = 0; i < n; i++) correction += values[i]! - mean;
  mean += correction / n;
  return mean;
}

export function factoriseShared(predictorNames: string[], columns: Float64Array[], hasIntercept: boolean): SharedFactorisation {
  const k = columns.length;
  const n = columns[0]?.length ?? 0;
  const means = new Float64Array(k);
  const inverseScale = new Float64Array(k);
  const noise = new Float64Array(k);
  const working: Float64Array[] = [];
  for (let j = 0; j < k; j++) {
    const column = columns[j] as Float64Array;
    const name = predictorNames[j]!;
    const mean = hasIntercept ? meanOf(column) : 0;
    const centred = new Float64Array(n);
    let centredSquares = 0;
    let rawSquares = 0;
    for (let i = 0; i < n; i++) {
      const value = column[i]! - mean;
      centred[i] = value;
      centredSquares += value * value;
      rawSquares += column[i]! * column[i]!;
    }
    if (!(centredSquares > 0)) {
      throw hasIntercept
        ? new EngineError('constant-column', `Predictor "${name}" takes the same value in every row, so its slope cannot be estimated.`, {
            column: name,
          })
        : new EngineError('zero-column', `Predictor "${name}" is zero in every row, so it cannot be estimated.`, { column: name });
    }
    const scale = powerOfTwoNear(Math.sqrt(centredSquares));
    for (let i = 0; i < n; i++) centred[i]! /= scale;
    means[j] = mean;
    inverseScale[j] = 1 / scale;
    noise[j] = Math.sqrt(rawSquares / centredSquares);
    working.push(centred);
  }
  const packed = working.map((column) => Float64Array.from(column));
  const outcome = householderFactorise(packed, n, rankToleranceFor(k + (hasIntercept ? 1 : 0)), noise);
  if ('failure' in outcome) {
    const name = predictorNames[outcome.failure.column] ?? `#${outcome.failure.column}`;
    throw new EngineError('collinear-columns', `Predictor "${name}" is an exact linear combination of the earlier predictors (to within rounding); remove it.`, {
      column: name,
      columns: predictorNames.slice(0, outcome.failure.column + 1),
    });
  }
  const factor = outcome.factor;
  const triangle = { size: k, entries: new Float64Array(k * k) };
  for (let i = 0; i < k; i++) {
    triangle.entries[i * k + i] = factor.diagonal[i]!;
    for (let j = i + 1; j < k; j++) triangle.entries[i * k + j] = factor.packed[j]![i]!;
  }
  const scaledInverse = inverseGram(upperInverse(triangle));
  const p = k + (hasIntercept ? 1 : 0);
  const offset = hasIntercept ? 1 : 0;
  const covariance: Float64Array[] = [];
  for (let i = 0; i < p; i++) covariance.push(new Float64Array(p));
  for (let i = 0; i < k; i++) {
    for (let j = 0; j < k; j++) covariance[i + offset]![j + offset] = scaledInverse[i * k + j]! * inverseScale[i]! * inverseScale[j]!;
  }
  if (hasIntercept) {
    let quadratic = 0;
    for (let i = 0; i < k; i++) {
      let cross = 0;
      for (let j = 0; j < k; j++) cross += covariance[i + 1]![j + 1]! * means[j]!;
      covariance[0]![i + 1] = -cross;
      covariance[i + 1]![0] = -cross;
      quadratic += means[i]! * cross;
    }
    covariance[0]![0] = 1 / n + quadratic;
  }
  return {
    n,
    hasIntercept,
    names: hasIntercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames],
    working,
    factor,
    means,
    inverseScale,
    unscaledCovariance: covariance,
  };
}

/** Least squares for one response against the shared factorisation; `scratch` has length n. */
export function solveShared(shared: SharedFactorisation, response: Float64Array, scratch = new Float64Array(shared.n)): SharedSolution {
  const { n, working, factor, hasIntercept, means, inverseScale } = shared;
  const k = working.length;
  const responseMean = hasIntercept ? meanOf(response) : 0;
  const residual = new Float64Array(n);
  let totalSumOfSquares = 0;
  for (let i = 0; i < n; i++) {
    const value = response[i]! - responseMean;
    residual[i] = value;
    totalSumOfSquares += value * value;
  }
  const scaled = new Float64Array(k);
  // Two passes: the first solves, the second refines against the residual of the first.
  for (let pass = 0; pass < 2; pass++) {
    scratch.set(residual);
    applyQTranspose(factor, scratch);
    const correction = scratch.slice(0, k);
    solveUpper(factor, correction);
    for (let j = 0; j < k; j++) {
      scaled[j]! += correction[j]!;
      const column = working[j] as Float64Array;
      const step = correction[j]!;
      for (let i = 0; i < n; i++) residual[i]! -= step * column[i]!;
    }
  }
  let residualSumOfSquares = 0;
  for (let i = 0; i < n; i++) residualSumOfSquares += residual[i]! * residual[i]!;
  const p = k + (hasIntercept ? 1 : 0);
  const coefficients = new Float64Array(p);
  let intercept = responseMean;
  for (let j = 0; j < k; j++) {
    const slope = scaled[j]! * inverseScale[j]!;
    coefficients[j + (hasIntercept ? 1 : 0)] = slope;
    intercept -= means[j]! * slope;
  }
  if (hasIntercept) coefficients[0] = intercept;
  return { coefficients, residualSumOfSquares, totalSumOfSquares };
}
