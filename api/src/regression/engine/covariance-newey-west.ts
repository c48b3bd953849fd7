/**
 * Newey-West heteroskedasticity and autocorrelation consistent (HAC) covariance (Newey & West 1987,
 * Econometrica 55(3), 703-708), rows taken in time order:
 *   S = G_0 + sum_{l=1..L} w_l (G_l + G_l'),   G_l = sum_{t=l+1..n} u_t u_{t-l}',   w_l = 1 - l / (L + 1)
 * (Bartlett weights), V = (X'WX)^-1 S (X'WX)^-1, optionally times n / (n - p) (default: no factor).
 *
 * Lag rule: a fixed L (integer, 0 <= L <= n - 1), or 'automatic' L = floor(4 (n / 100)^(2/9)), the
 * Bartlett-kernel starting bandwidth of Newey & West (1994, Review of Economic Studies 61(4), 631-653).
 *
 * Errors: AnalysisError `invalid-lag` (negative or not an integer), `lag-too-large` (L >= n); field
 * `covariance.lag`.
 */

import { AnalysisError } from './diagnostics/analysis-error';
import { SquareMatrix, zeroMatrix } from './diagnostics/small-matrix';
import { weightedOuterSum } from './covariance-scores';

export function automaticNeweyWestLag(n: number): number {
  return Math.floor(4 * Math.pow(n / 100, 2 / 9));
}

export function resolveNeweyWestLag(lag: number | 'automatic' | undefined, n: number): { lag: number; rule: 'fixed' | 'automatic' } {
  if (lag === undefined || lag === 'automatic') return { lag: Math.min(automaticNeweyWestLag(n), n - 1), rule: 'automatic' };
  if (typeof lag !== 'number' || !Number.isInteger(lag) || lag < 0) {
    throw new AnalysisError('invalid-lag', `The Newey-West lag must be a non-negative integer or "automatic"; got ${JSON.stringify(lag)}.`, {
      field: 'covariance.lag',
    });
  }
  if (lag >= n) {
    throw new AnalysisError(
      'lag-too-large',
      `A Newey-West lag of ${lag} needs more than ${lag} observations; the sample has ${n}. Use at most ${n - 1}.`,
      { field: 'covariance.lag' },
    );
  }
  return { lag, rule: 'fixed' };
}

/** The HAC meat S from score rows u_t in time order. */
export function neweyWestMeat(scores: Float64Array[], lag: number): SquareMatrix {
  const n = scores.length;
  const p = scores[0]?.length ?? 0;
  const meat = weightedOuterSum(scores, null);
  for (let l = 1; l <= lag; l++) {
    const weight = 1 - l / (lag + 1);
    const cross = zeroMatrix(p);
    for (let t = l; t < n; t++) {
      const current = scores[t] as Float64Array;
      const previous = scores[t - l] as Float64Array;
      for (let j = 0; j < p; j++) {
        const row = cross[j] as Float64Array;
        const value = current[j]!;
        for (let k = 0; k < p; k++) row[k]! += value * previous[k]!;
      }
    }
    for (let j = 0; j < p; j++) {
      for (let k = 0; k < p; k++) meat[j]![k]! += weight * (cross[j]![k]! + cross[k]![j]!);
    }
  }
  return meat;
}
