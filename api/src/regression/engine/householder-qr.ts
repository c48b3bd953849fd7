/**
 * Householder QR factorisation of a tall matrix held as columns (Float64Array each), in place.
 *
 * Layout (the compact form of Golub & Van Loan, "Matrix Computations", 4th ed., section 5.2): after
 * factorising, `columns[k][k..n)` holds the k-th Householder vector v_k (scaled so that the reflection
 * is H_k = I - v_k v_k' / v_k[k]), `columns[k][0..k)` holds column k of R above the diagonal, and
 * `diagonal[k]` holds R[k][k]. Q = H_0 H_1 ... H_{p-1}.
 *
 * Columns are processed in their given order without pivoting: the engine's columns are already scaled
 * to unit size, and keeping the order lets a rank failure name the first column that adds nothing new.
 */

export interface HouseholderFactor {
  rows: number;
  cols: number;
  packed: Float64Array[];
  diagonal: Float64Array;
}

export interface RankFailure {
  /** Index of the first column whose part orthogonal to the earlier columns is below tolerance. */
  column: number;
  /** Coefficients expressing that column through the earlier ones (from the leading triangle of R). */
  dependency: Float64Array;
}

/**
 * Factorises `columns` in place (columns are expected to be scaled to norm about 1).
 *
 * Rank test: column k is rejected when the part of it orthogonal to columns 0..k-1 has norm below
 *   tolerance * sqrt(ratio_k^2 + sum_j (dependency_j * ratio_j)^2) * ||column k||,
 * where ratio_j (>= 1) says how much larger column j's rounding noise is than machine precision because
 * of an offset removed by centring, and dependency_j expresses column k through the earlier columns.
 * That is the size of the rounding noise the residual direction can carry: anything smaller is noise.
 */
export function householderFactorise(
  columns: Float64Array[],
  rows: number,
  tolerance: number,
  noiseRatios: ArrayLike<number>,
): { factor: HouseholderFactor } | { failure: RankFailure } {
  const cols = columns.length;
  const diagonal = new Float64Array(cols);
  for (let k = 0; k < cols; k++) {
    const ak = columns[k] as Float64Array;
    let originalSquares = 0;
    for (let i = 0; i < rows; i++) originalSquares += ak[i]! * ak[i]!;
    let remainingSquares = 0;
    for (let i = k; i < rows; i++) remainingSquares += ak[i]! * ak[i]!;
    let norm = Math.sqrt(remainingSquares);
    const originalNorm = Math.sqrt(originalSquares);
    if (!(norm > 1e-3 * originalNorm)) {
      const dependency = dependencyOf(columns, diagonal, k);
      const ratio = noiseRatios[k] ?? 1;
      let noise = ratio * ratio;
      for (let j = 0; j < k; j++) {
        const term = dependency[j]! * (noiseRatios[j] ?? 1);
        noise += term * term;
      }
      if (!(norm > tolerance * Math.sqrt(noise) * originalNorm)) {
        return { failure: { column: k, dependency } };
      }
    }
    if (ak[k]! < 0) norm = -norm;
    const inverse = 1 / norm;
    for (let i = k; i < rows; i++) ak[i]! *= inverse;
    ak[k]! += 1;
    const pivot = ak[k]!;
    for (let j = k + 1; j < cols; j++) {
      const aj = columns[j] as Float64Array;
      let dot = 0;
      for (let i = k; i < rows; i++) dot += ak[i]! * aj[i]!;
      const scale = -dot / pivot;
      for (let i = k; i < rows; i++) aj[i]! += scale * ak[i]!;
    }
    diagonal[k] = -norm;
  }
  return { factor: { rows, cols, packed: columns, diagonal } };
}

/** Solves R[0..k)[0..k) g = R[0..k)[k] using the partially factorised columns. */
function dependencyOf(columns: Float64Array[], diagonal: Float64Array, k: number): Float64Array {
  const result = new Float64Array(k);
  const ak = columns[k] as Float64Array;
  for (let i = k - 1; i >= 0; i--) {
    let sum = ak[i]!;
    for (let j = i + 1; j < k; j++) sum -= (columns[j] as Float64Array)[i]! * result[j]!;
    result[i] = sum / diagonal[i]!;
  }
  return result;
}

/** b <- Q' b (in place). */
export function applyQTranspose(factor: HouseholderFactor, b: Float64Array): void {
  const { rows, cols, packed } = factor;
  for (let k = 0; k < cols; k++) reflect(packed[k] as Float64Array, k, rows, b);
}

/** b <- Q b (in place). */
export function applyQ(factor: HouseholderFactor, b: Float64Array): void {
  const { rows, cols, packed } = factor;
  for (let k = cols - 1; k >= 0; k--) reflect(packed[k] as Float64Array, k, rows, b);
}

function reflect(v: Float64Array, k: number, rows: number, b: Float64Array): void {
  let dot = 0;
  for (let i = k; i < rows; i++) dot += v[i]! * b[i]!;
  const scale = -dot / v[k]!;
  for (let i = k; i < rows; i++) b[i]! += scale * v[i]!;
}

/** R[i][j] for i <= j. */
export function upperEntry(factor: HouseholderFactor, i: number, j: number): number {
  return i === j ? factor.diagonal[i]! : (factor.packed[j] as Float64Array)[i]!;
}

/** Solves R x = b in place (back substitution). */
export function solveUpper(factor: HouseholderFactor, b: Float64Array): void {
  const { cols, packed, diagonal } = factor;
  for (let i = cols - 1; i >= 0; i--) {
    let sum = b[i]!;
    for (let j = i + 1; j < cols; j++) sum -= (packed[j] as Float64Array)[i]! * b[j]!;
    b[i] = sum / diagonal[i]!;
  }
}

/** Solves R' x = b in place (forward substitution). */
export function solveUpperTranspose(factor: HouseholderFactor, b: Float64Array): void {
  const { cols, packed, diagonal } = factor;
  for (let i = 0; i < cols; i++) {
    let sum = b[i]!;
    const column = packed[i] as Float64Array;
    for (let j = 0; j < i; j++) sum -= column[j]! * b[j]!;
    b[i] = sum / diagonal[i]!;
  }
}

/**
 * Rows 0..n of Q's first p columns (the thin Q1), as p columns. Used for leverage: h_i = sum_k Q1[i][k]^2.
 */
export function thinQ(factor: HouseholderFactor): Float64Array[] {
  const result: Float64Array[] = [];
  for (let k = 0; k < factor.cols; k++) {
    const e = new Float64Array(factor.rows);
    e[k] = 1;
    applyQ(factor, e);
    result.push(e);
  }
  return result;
}
