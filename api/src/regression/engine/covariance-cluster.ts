/**
 * Cluster-robust covariance, CR1 (Liang & Zeger 1986, Biometrika 73(1), 13-22; Arellano 1987, Oxford
 * Bulletin of Economics and Statistics 49(4), 431-434; small-sample factor as in Cameron & Miller 2015,
 * Journal of Human Resources 50(2), 317-372):
 *   V = c (X'WX)^-1 [sum_g s_g s_g'] (X'WX)^-1,  s_g = sum_{i in g} u_i,  c = G/(G-1) (n-1)/(n-p),
 * with G the number of distinct groups. t-tests and the Wald F-test then use G - 1 degrees of freedom.
 *
 * Errors: AnalysisError `invalid-cluster-groups` (wrong length, missing or non-finite labels),
 * `too-few-clusters` (G < 2); field `covariance.groups`.
 */

import { AnalysisError } from './diagnostics/analysis-error';
import { ddAdd, twoProduct } from './double-double';
import { OuterSum } from './working-coordinates';

export type GroupLabel = string | number;

/** Group index of every row, and the number of groups. */
export function indexGroups(groups: ArrayLike<GroupLabel>, n: number): { index: Int32Array; count: number } {
  if (groups === null || typeof groups !== 'object' || groups.length !== n) {
    throw new AnalysisError(
      'invalid-cluster-groups',
      `The cluster groups must give one label per observation (${n}); got ${groups && typeof groups === 'object' ? groups.length : 'none'}.`,
      { field: 'covariance.groups' },
    );
  }
  const seen = new Map<GroupLabel, number>();
  const index = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    const label = groups[i];
    if (!(typeof label === 'string' || (typeof label === 'number' && Number.isFinite(label)))) {
      throw new AnalysisError('invalid-cluster-groups', `The cluster label at row ${i} (0-based) is missing or not finite.`, {
        field: 'covariance.groups',
        row: i,
      });
    }
    let group = seen.get(label);
    if (group === undefined) {
      group = seen.size;
      seen.set(label, group);
    }
    index[i] = group;
  }
  if (seen.size < 2) {
    throw new AnalysisError(
      'too-few-clusters',
      'Cluster-robust standard errors need at least two groups; every observation is in the same group.',
      { field: 'covariance.groups' },
    );
  }
  return { index, count: seen.size };
}

/** C [sum_g s_g s_g'] C with C s_g = sum_{i in g} f_i a_i, the group sums kept in double-double. */
export function clusterMeat(rows: Float64Array[], scores: Float64Array, index: Int32Array, count: number): OuterSum {
  const p = rows[0]?.length ?? 0;
  const hi = new Float64Array(count * p);
  const lo = new Float64Array(count * p);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] as Float64Array;
    const offset = index[i]! * p;
    const f = scores[i]!;
    for (let j = 0; j < p; j++) {
      const product = twoProduct(f, row[j]!);
      const sum = ddAdd(hi[offset + j]!, lo[offset + j]!, product.hi, product.lo);
      hi[offset + j] = sum.hi;
      lo[offset + j] = sum.lo;
    }
  }
  const total = new OuterSum(p);
  for (let g = 0; g < count; g++) {
    total.addSquare(Float64Array.from({ length: p }, (_, j) => hi[g * p + j]! + lo[g * p + j]!), 1);
  }
  return total;
}

export function clusterFactor(groupCount: number, n: number, p: number): number {
  return (groupCount / (groupCount - 1)) * ((n - 1) / (n - p));
}
