/**
 * Small dense helpers for an upper-triangular factor R (p x p, row-major), used for the covariance
 * (R'R)^-1 = R^-1 R^-T and a condition estimate. Nothing here inverts X'X: R comes from a QR
 * factorisation, and (R'R)^-1 is formed from R^-1, whose accuracy depends on cond(R), not cond(R)^2.
 */

export interface UpperTriangular {
  size: number;
  /** Row-major p x p; entries below the diagonal are zero. */
  entries: Float64Array;
}

/** R^-1 (upper triangular, row-major) by back substitution, one column at a time. */
export function upperInverse(triangle: UpperTriangular): Float64Array {
  const { size: p, entries } = triangle;
  const inverse = new Float64Array(p * p);
  for (let k = 0; k < p; k++) {
    inverse[k * p + k] = 1 / entries[k * p + k]!;
    for (let i = k - 1; i >= 0; i--) {
      let sum = 0;
      for (let j = i + 1; j <= k; j++) sum += entries[i * p + j]! * inverse[j * p + k]!;
      inverse[i * p + k] = -sum / entries[i * p + i]!;
    }
  }
  return inverse;
}

/** R^-1 R^-T (symmetric, row-major) from R^-1. */
export function inverseGram(inverse: Float64Array): Float64Array {
  const p = Math.round(Math.sqrt(inverse.length));
  const result = new Float64Array(p * p);
  for (let a = 0; a < p; a++) {
    for (let b = a; b < p; b++) {
      let sum = 0;
      for (let k = Math.max(a, b); k < p; k++) sum += inverse[a * p + k]! * inverse[b * p + k]!;
      result[a * p + b] = sum;
      result[b * p + a] = sum;
    }
  }
  return result;
}

/** ||R||_F * ||R^-1||_F: the Frobenius-norm condition number of R (and of the working design). */
export function frobeniusConditionNumber(triangle: UpperTriangular): number {
  const inverse = upperInverse(triangle);
  let norm = 0;
  let inverseNorm = 0;
  for (let i = 0; i < triangle.entries.length; i++) {
    norm += triangle.entries[i]! * triangle.entries[i]!;
    inverseNorm += inverse[i]! * inverse[i]!;
  }
  return Math.sqrt(norm * inverseNorm);
}
