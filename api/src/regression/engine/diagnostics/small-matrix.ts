/**
 * Dense helpers for the small p x p matrices of inference (p = number of coefficients), stored as
 * arrays of Float64Array rows. Cholesky factorisation (Golub & Van Loan, "Matrix Computations", 4th ed.,
 * algorithm 4.2.1) is used for symmetric positive definite solves; a pivot below `relativeTolerance`
 * times its diagonal entry reports the matrix as singular instead of dividing by rounding noise.
 */

export type SquareMatrix = Float64Array[];

export function zeroMatrix(size: number): SquareMatrix {
  const rows: SquareMatrix = [];
  for (let i = 0; i < size; i++) rows.push(new Float64Array(size));
  return rows;
}

export function entry(matrix: SquareMatrix, i: number, j: number): number {
  return (matrix[i] as Float64Array)[j]!;
}

/** A B for square matrices of the same size. */
export function multiply(a: SquareMatrix, b: SquareMatrix): SquareMatrix {
  const size = a.length;
  const result = zeroMatrix(size);
  for (let i = 0; i < size; i++) {
    const row = result[i] as Float64Array;
    const aRow = a[i] as Float64Array;
    for (let k = 0; k < size; k++) {
      const factor = aRow[k]!;
      if (factor === 0) continue;
      const bRow = b[k] as Float64Array;
      for (let j = 0; j < size; j++) row[j]! += factor * bRow[j]!;
    }
  }
  return result;
}

/** The sandwich B M B for symmetric B (the bread) and M (the meat); the result is symmetrised. */
export function sandwich(bread: SquareMatrix, meat: SquareMatrix): SquareMatrix {
  const result = multiply(multiply(bread, meat), bread);
  return symmetrise(result);
}

export function symmetrise(matrix: SquareMatrix): SquareMatrix {
  const size = matrix.length;
  for (let i = 0; i < size; i++) {
    for (let j = i + 1; j < size; j++) {
      const mean = 0.5 * (entry(matrix, i, j) + entry(matrix, j, i));
      (matrix[i] as Float64Array)[j] = mean;
      (matrix[j] as Float64Array)[i] = mean;
    }
  }
  return matrix;
}

export function scale(matrix: SquareMatrix, factor: number): SquareMatrix {
  return matrix.map((row) => row.map((value) => value * factor));
}

export function trace(matrix: SquareMatrix): number {
  let sum = 0;
  for (let i = 0; i < matrix.length; i++) sum += entry(matrix, i, i);
  return sum;
}

/** Lower Cholesky factor L (L L' = A), or null when A is not numerically positive definite. */
export function cholesky(matrix: SquareMatrix, relativeTolerance = 1e-13): SquareMatrix | null {
  const size = matrix.length;
  const lower = zeroMatrix(size);
  for (let j = 0; j < size; j++) {
    const lowerJ = lower[j] as Float64Array;
    let diagonal = entry(matrix, j, j);
    for (let k = 0; k < j; k++) diagonal -= lowerJ[k]! * lowerJ[k]!;
    if (!(diagonal > relativeTolerance * Math.abs(entry(matrix, j, j))) || !(diagonal > 0)) return null;
    const pivot = Math.sqrt(diagonal);
    lowerJ[j] = pivot;
    for (let i = j + 1; i < size; i++) {
      const lowerI = lower[i] as Float64Array;
      let sum = entry(matrix, i, j);
      for (let k = 0; k < j; k++) sum -= lowerI[k]! * lowerJ[k]!;
      lowerI[j] = sum / pivot;
    }
  }
  return lower;
}

/** Solves L L' x = b given the Cholesky factor L. */
export function choleskySolve(lower: SquareMatrix, b: ArrayLike<number>): Float64Array {
  const size = lower.length;
  const x = Float64Array.from(b);
  for (let i = 0; i < size; i++) {
    const row = lower[i] as Float64Array;
    let sum = x[i]!;
    for (let k = 0; k < i; k++) sum -= row[k]! * x[k]!;
    x[i] = sum / row[i]!;
  }
  for (let i = size - 1; i >= 0; i--) {
    let sum = x[i]!;
    for (let k = i + 1; k < size; k++) sum -= entry(lower, k, i) * x[k]!;
    x[i] = sum / entry(lower, i, i);
  }
  return x;
}

/** A^-1 from its Cholesky factor, column by column. */
export function choleskyInverse(lower: SquareMatrix): SquareMatrix {
  const size = lower.length;
  const result = zeroMatrix(size);
  for (let j = 0; j < size; j++) {
    const unit = new Float64Array(size);
    unit[j] = 1;
    const column = choleskySolve(lower, unit);
    for (let i = 0; i < size; i++) (result[i] as Float64Array)[j] = column[i]!;
  }
  return symmetrise(result);
}

/** x' A y. */
export function bilinear(x: ArrayLike<number>, matrix: SquareMatrix, y: ArrayLike<number>): number {
  let sum = 0;
  for (let i = 0; i < matrix.length; i++) {
    const row = matrix[i] as Float64Array;
    let inner = 0;
    for (let j = 0; j < row.length; j++) inner += row[j]! * y[j]!;
    sum += x[i]! * inner;
  }
  return sum;
}
