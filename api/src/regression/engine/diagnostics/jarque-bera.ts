/**
 * Jarque-Bera test of normal errors (Jarque & Bera 1987, International Statistical Review 55(2),
 * 163-172):
 *   JB = n / 6 (S^2 + (K - 3)^2 / 4) ~ chi-square(2) asymptotically,
 * with the moment-based (biased, population) sample skewness and kurtosis of the residuals
 *   m_k = (1/n) sum (e_i - mean e)^k,   S = m_3 / m_2^(3/2),   K = m_4 / m_2^2.
 * The residual mean is subtracted (it is 0 for an intercept model); for a weighted fit the whitened
 * residuals are used. K is the raw kurtosis (3 for a normal distribution), not the excess.
 */

import { FittedModel, scaledWhitenedResiduals } from './model-context';
import { chiSquareOutcome, requireImperfectFit, requireResidualVariation, TestOutcome } from './test-outcome';

export interface JarqueBeraResult extends TestOutcome {
  variant: 'moment-skewness-kurtosis';
  skewness: number;
  kurtosis: number;
}

export function momentShape(values: ArrayLike<number>): { skewness: number; kurtosis: number } {
  const n = values.length;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += values[i]!;
  mean /= n;
  let second = 0;
  let third = 0;
  let fourth = 0;
  for (let i = 0; i < n; i++) {
    const deviation = values[i]! - mean;
    const square = deviation * deviation;
    second += square;
    third += square * deviation;
    fourth += square * square;
  }
  requireResidualVariation(second, 'Jarque-Bera test');
  second /= n;
  third /= n;
  fourth /= n;
  return { skewness: third / Math.pow(second, 1.5), kurtosis: fourth / (second * second) };
}

export function jarqueBeraTest(model: FittedModel, significanceLevel: number): JarqueBeraResult {
  requireImperfectFit(model, 'Jarque-Bera test');
  const residuals = scaledWhitenedResiduals(model);
  const n = residuals.length;
  const { skewness, kurtosis } = momentShape(residuals);
  const excess = kurtosis - 3;
  const statistic = (n / 6) * (skewness * skewness + (excess * excess) / 4);
  return {
    variant: 'moment-skewness-kurtosis',
    skewness,
    kurtosis,
    ...chiSquareOutcome(statistic, 2, significanceLevel),
  };
}
