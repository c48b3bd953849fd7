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
import { OuterSum } from './working-coordinates';

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

/**
 * C S C for the HAC meat S, from a_t = C x_t and f_t = w_t e_t in time order:
 *   sum_t f_t^2 a_t a_t' + sum_{l=1..L} w_l sum_{t>l} f_t f_{t-l} (a_t a_{t-l}' + a_{t-l} a_t').
 */
export function neweyWestMeat(rows: Float64Array[], scores: Float64Array, lag: number): OuterSum {
  const n = rows.length;
  const p = rows[0]?.length ?? 0;
  const sum = new OuterSum(p);
  for (let t = 0; t < n; t++) sum.addSquare(rows[t] as Float64Array, scores[t]! * scores[t]!);
  for (let l = 1; l <= lag; l++) {
    const weight = 1 - l / (lag + 1);
    for (let t = l; t < n; t++) {
      sum.addCross(rows[t] as Float64Array, rows[t - l] as Float64Array, weight * scores[t]! * scores[t - l]!);
    }
  }
  return sum;
}
