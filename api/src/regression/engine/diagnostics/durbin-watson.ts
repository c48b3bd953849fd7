/**
 * Durbin-Watson statistic for first-order serial correlation of the errors, rows taken in time order
 * (Durbin & Watson 1950, Biometrika 37(3/4), 409-428; 1951, Biometrika 38(1/2), 159-178):
 *   d = sum_{t=2..n} (e_t - e_{t-1})^2 / sum_{t=1..n} e_t^2     (whitened residuals for a weighted fit).
 *
 * p-value: not the bounds test. Under normal errors d = e'Ae / e'e with e = M u, M = I - X(X'X)^-1 X'
 * and A the first-difference matrix D'D, so its exact null mean and variance follow from traces
 * (Durbin & Watson 1950, section 3):
 *   P = tr(MA) = 2(n - 1) - tr((X'X)^-1 X'AX),
 *   Q = tr((MA)^2) = (6n - 8) - 2 tr((X'X)^-1 X'A^2X) + tr([(X'X)^-1 X'AX]^2),
 *   E d = P / nu,  Var d = 2 (Q - P^2 / nu) / (nu (nu + 2)),  nu = n - p.
 * d / 4 is then approximated by a beta distribution with that mean and variance (the beta
 * approximation of Durbin & Watson 1951, section 4); P(d <= d_obs) is the p-value against positive
 * correlation. Everything costs O(n p^2); no n x n matrix is formed. The flag compares that p-value with
 * the significance level (unlike the bounds test it is never inconclusive).
 *
 * Alternatives: 'positive' (default, lower tail), 'negative' (upper tail), 'two-sided' (twice the smaller
 * tail, capped at 1).
 */

import { incompleteBeta } from '../special-functions';
import { AnalysisError } from './analysis-error';
import { FittedModel, scaledWhitenedResiduals, workingColumns } from './model-context';
import { multiply, SquareMatrix, trace, zeroMatrix } from './small-matrix';
import { requireImperfectFit, requireResidualVariation, TestOutcome } from './test-outcome';

export type SerialCorrelationAlternative = 'positive' | 'negative' | 'two-sided';

export interface DurbinWatsonResult extends TestOutcome {
  variant: 'beta-approximation-exact-moments';
  alternative: SerialCorrelationAlternative;
  /** Exact mean of d under no serial correlation, given the design. */
  nullMean: number;
  /** Exact variance of d under no serial correlation, given the design. */
  nullVariance: number;
}

export function durbinWatsonStatistic(residuals: ArrayLike<number>): number {
  let numerator = 0;
  let denominator = 0;
  for (let t = 0; t < residuals.length; t++) {
    const value = residuals[t]!;
    denominator += value * value;
    if (t > 0) {
      const difference = value - residuals[t - 1]!;
      numerator += difference * difference;
    }
  }
  requireResidualVariation(denominator, 'Durbin-Watson test');
  return numerator / denominator;
}

/** Exact null mean and variance of d for the (whitened) design `columns` with (X'X)^-1 = `inverseGram`. */
export function durbinWatsonNullMoments(
  columns: Float64Array[],
  inverseGram: SquareMatrix,
  n: number,
): { mean: number; variance: number } {
  const p = columns.length;
  const differences = columns.map((column) => {
    const result = new Float64Array(n - 1);
    for (let t = 1; t < n; t++) result[t - 1] = column[t]! - column[t - 1]!;
    return result;
  });
  // A x = D'(D x): (Ax)_1 = -(Dx)_1, (Ax)_t = (Dx)_{t-1} - (Dx)_t, (Ax)_n = (Dx)_{n-1} (1-based).
  const applied = differences.map((difference) => {
    const result = new Float64Array(n);
    for (let t = 0; t < n; t++) {
      const before = t > 0 ? difference[t - 1]! : 0;
      const after = t < n - 1 ? difference[t]! : 0;
      result[t] = before - after;
    }
    return result;
  });
  const firstGram = zeroMatrix(p);
  const secondGram = zeroMatrix(p);
  for (let j = 0; j < p; j++) {
    for (let k = j; k < p; k++) {
      const first = dot(differences[j]!, differences[k]!);
      const second = dot(applied[j]!, applied[k]!);
      firstGram[j]![k] = first;
      firstGram[k]![j] = first;
      secondGram[j]![k] = second;
      secondGram[k]![j] = second;
    }
  }
  const projectedFirst = multiply(inverseGram, firstGram);
  const traceMA = 2 * (n - 1) - trace(projectedFirst);
  const traceMAMA = 6 * n - 8 - 2 * trace(multiply(inverseGram, secondGram)) + trace(multiply(projectedFirst, projectedFirst));
  const nu = n - p;
  const mean = traceMA / nu;
  const variance = (2 * (traceMAMA - (traceMA * traceMA) / nu)) / (nu * (nu + 2));
  return { mean, variance };
}

export function durbinWatsonTest(
  model: FittedModel,
  significanceLevel: number,
  alternative: SerialCorrelationAlternative = 'positive',
): DurbinWatsonResult {
  requireImperfectFit(model, 'Durbin-Watson test');
  const residuals = scaledWhitenedResiduals(model);
  const n = residuals.length;
  const statistic = durbinWatsonStatistic(residuals);
  // The hat matrix from the working design A = S Z and its (A'A)^-1: the same projection as from the
  // raw columns, without their offsets (working-coordinates.ts).
  const { covariance, covarianceLow, design } = model.solution.working;
  const p = design.p;
  const workingInverse: SquareMatrix = [];
  for (let j = 0; j < p; j++) {
    workingInverse.push(Float64Array.from({ length: p }, (_, k) => covariance[j * p + k]! + (covarianceLow ? covarianceLow[j * p + k]! : 0)));
  }
  const roots = model.weights ? model.weights.map(Math.sqrt) : null;
  const columns = workingColumns(model).map((column) => (roots ? column.map((value, i) => value * roots[i]!) : column));
  const { mean, variance } = durbinWatsonNullMoments(columns, workingInverse, n);
  const lowerTail = durbinWatsonLowerTail(statistic, mean, variance);
  const upperTail = 1 - lowerTail;
  const pValue =
    alternative === 'positive'
      ? lowerTail
      : alternative === 'negative'
        ? upperTail
        : Math.min(1, 2 * Math.min(lowerTail, upperTail));
  return {
    variant: 'beta-approximation-exact-moments',
    alternative,
    nullMean: mean,
    nullVariance: variance,
    statistic,
    distribution: 'beta-approximation',
    degreesOfFreedom: null,
    denominatorDegreesOfFreedom: null,
    pValue,
    significanceLevel,
    flagged: pValue < significanceLevel,
  };
}

/** P(d <= value) with d / 4 ~ Beta(a, b) matched to the given mean and variance. */
export function durbinWatsonLowerTail(value: number, mean: number, variance: number): number {
  const m = mean / 4;
  const v = variance / 16;
  const total = (m * (1 - m)) / v - 1;
  if (!(m > 0 && m < 1 && v > 0 && total > 0)) {
    throw new AnalysisError('test-not-defined', 'The null distribution of the Durbin-Watson statistic is degenerate for this design.', {
      field: 'diagnostics',
    });
  }
  const x = Math.min(1, Math.max(0, value / 4));
  if (x === 0) return 0;
  if (x === 1) return 1;
  return incompleteBeta(x, 1 - x, m * total, (1 - m) * total).lower;
}

function dot(left: Float64Array, right: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < left.length; i++) sum += left[i]! * right[i]!;
  return sum;
}
