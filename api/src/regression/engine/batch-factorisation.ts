/**
 * One factorisation of a shared design, reused for many responses.
 *
 * The design goes through exactly the path of a single fit: the centred and scaled working design
 * (working-design.ts, with its rules for zero, constant and near-constant columns) and its Householder QR
 * with the engine's one rank test (refined-qr-solver.ts, collinear columns named), so a batch refuses the
 * same columns as /v1/fits. The factorisation O(n p^2) and the covariance of the coefficients (the same for
 * every response) are paid once. Each response then costs:
 *  - for a well-conditioned design (working condition number up to FAST_CONDITION): the centred response
 *    solved against the QR of the centred predictors with one refinement step in double (Golub & Van Loan,
 *    "Matrix Computations", 4th ed., section 5.3.8); its error is about kappa^2 u, below 1e-10 here;
 *  - otherwise (a polynomial design, say): the single fit's refinement with double-double residuals, so
 *    ill-conditioned batches keep the accuracy of /v1/fits.
 *
 * Errors: those of prepareWorkingDesign and factoriseWorking (`zero-column`, `constant-column`,
 * `collinear-columns`, `non-finite-value`), naming the predictor.
 */

import { INTERCEPT_NAME } from './least-squares';
import { isPerfectFit, isPerfectFitFromSums } from './perfect-fit';
import { EngineError } from './errors';
import { applyQTranspose, HouseholderFactor, householderFactorise, solveUpper } from './householder-qr';
import { inverseGram, upperInverse } from './triangular';
import { rankToleranceFor } from './working-design';
import { factoriseWorking, mappedCovariance, solveWithFactor, WorkingFactor, workingGramInverse } from './refined-qr-solver';
import { prepareWorkingDesign, weightedMean, WorkingDesign } from './working-design';

/** Up to this working condition number the double-precision path is accurate to about 1e-11. */
export const FAST_CONDITION = 1e2;

interface CentredFactorisation {
  n: number;
  hasIntercept: boolean;
  names: string[];
  working: Float64Array[];
  factor: HouseholderFactor;
  means: Float64Array;
  inverseScale: Float64Array;
  unscaledCovariance: Float64Array[];
}

export interface SharedFactorisation {
  n: number;
  /** The fast path's factorisation, when the design is well conditioned. */
  centred: CentredFactorisation | null;
  scratch: Float64Array;
  hasIntercept: boolean;
  /** Coefficient names in order (intercept first when present). */
  names: string[];
  design: WorkingDesign;
  factored: WorkingFactor;
  /** (X'X)^-1 in the caller's parametrisation, p rows. */
  unscaledCovariance: Float64Array[];
}

export interface SharedSolution {
  coefficients: Float64Array;
  /** Exactly 0 for a perfect fit (perfect-fit.ts). */
  residualSumOfSquares: number;
  /** sum (y - mean y)^2 for intercept models, sum y^2 otherwise. */
  totalSumOfSquares: number;
}

export function factoriseShared(predictorNames: string[], columns: Float64Array[], hasIntercept: boolean): SharedFactorisation {
  const n = columns[0]?.length ?? 0;
  const names = hasIntercept ? [INTERCEPT_NAME, ...predictorNames] : [...predictorNames];
  const designColumns = hasIntercept ? [new Float64Array(n).fill(1), ...columns] : columns;
  const design = prepareWorkingDesign(names, designColumns, n, hasIntercept, undefined);
  const factored = factoriseWorking(design);
  const inverse = workingGramInverse(design, factored);
  const centred = factored.conditionNumber <= FAST_CONDITION ? factoriseCentred(predictorNames, columns, hasIntercept) : null;
  return {
    n,
    centred,
    scratch: new Float64Array(n),
    hasIntercept,
    names,
    design,
    factored,
    unscaledCovariance: mappedCovariance(design, inverse.hi, inverse.lo),
  };
}

/** Least squares for one response against the shared factorisation. */
export function solveShared(shared: SharedFactorisation, response: Float64Array): SharedSolution {
  const { n, hasIntercept, design, factored } = shared;
  if (shared.centred) {
    const fast = solveCentred(shared.centred, response, shared.scratch);
    return { ...fast, residualSumOfSquares: fast.perfect ? 0 : fast.residualSumOfSquares };
  }
  const solution = solveWithFactor(design, factored.factor, response);
  const perfect = isPerfectFit(solution.residuals, response, undefined);
  let totalSumOfSquares = 0;
  const mean = hasIntercept ? weightedMean(response, undefined, n, n) : 0;
  for (let i = 0; i < n; i++) {
    const deviation = response[i]! - mean;
    totalSumOfSquares += deviation * deviation;
  }
  return {
    coefficients: solution.coefficients,
    residualSumOfSquares: perfect ? 0 : solution.residualSumOfSquares,
    totalSumOfSquares,
  };
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

function factoriseCentred(predictorNames: string[], columns: Float64Array[], hasIntercept: boolean): CentredFactorisation {
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
function solveCentred(shared: CentredFactorisation, response: Float64Array, scratch: Float64Array): SharedSolution & { perfect: boolean } {
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
  let responseSquares = 0;
  for (let i = 0; i < n; i++) responseSquares += response[i]! * response[i]!;
  return { coefficients, residualSumOfSquares, totalSumOfSquares, perfect: isPerfectFitFromSums(residualSumOfSquares, responseSquares) };
}
