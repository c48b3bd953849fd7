/**
 * Power terms x, x^2, ..., x^degree of one column, computed in double-double so that each term is
 * exact to about 32 digits (columns[k] + lowParts[k]). Rounding x^k to a double perturbs the data by
 * up to k/2 units in the last place, which an ill-conditioned polynomial fit (degree 10 on an offset
 * range, for example) magnifies by its condition number; passing the low parts to the solver removes
 * that loss.
 */

import { ddMul } from './double-double';
import { EngineError } from './errors';

export interface PowerTerms {
  /** Rounded powers, columns[k - 1] ~ x^k. */
  columns: Float64Array[];
  /** Low parts: x^k = columns[k - 1] + lowParts[k - 1] to double-double accuracy. */
  lowParts: Float64Array[];
}

export function powerTerms(x: ArrayLike<number>, degree: number): PowerTerms {
  if (!Number.isInteger(degree) || degree < 1) {
    throw new EngineError('invalid-argument', 'The polynomial degree must be a positive integer.', {
      field: 'degree',
    });
  }
  const n = x.length;
  const columns: Float64Array[] = [];
  const lowParts: Float64Array[] = [];
  const first = Float64Array.from(x);
  columns.push(first);
  lowParts.push(new Float64Array(n));
  for (let k = 2; k <= degree; k++) {
    const previousHi = columns[k - 2] as Float64Array;
    const previousLo = lowParts[k - 2] as Float64Array;
    const hi = new Float64Array(n);
    const lo = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const product = ddMul(previousHi[i]!, previousLo[i]!, first[i]!, 0);
      hi[i] = product.hi;
      lo[i] = product.lo;
    }
    columns.push(hi);
    lowParts.push(lo);
  }
  return { columns, lowParts };
}
