/**
 * The centred and scaled working form of a design matrix, shared by the least-squares solvers.
 *
 * For an intercept model every predictor column x_j is replaced by z_j = (x_j - m_j) / c_j, where m_j
 * is the (weighted) mean and c_j is the power of two nearest the centred column's norm. Without an
 * intercept, m_j = 0. Because c_j is a power of two, the scaling is exact, and x_j - m_j is carried
 * exactly as a double-double (TwoSum), so the working columns are an exact reparametrisation of the
 * caller's data: X b = Z g with
 *   b_j = g_j / c_j (j >= 1),   b_0 = g_0 / c_0 - sum_j (m_j / c_j) g_j   (intercept models).
 * Centring removes the offset that makes raw-sum methods lose every digit; scaling puts every column
 * on the same footing so that one rank tolerance serves all columns.
 *
 * Weights enter as s_i = fl(sqrt(w_i)): the engine solves the problem with weights s_i^2 exactly,
 * which differs from w_i by at most one rounding (relative 1.1e-16) per observation.
 */

import { EngineError } from './errors';
import { assertFinite } from './finite-values';

const EPSILON = Number.EPSILON;

export interface WorkingDesign {
  n: number;
  p: number;
  names: string[];
  /** The caller's columns (not copied). */
  columns: Float64Array[];
  /** Optional low parts: column j is exactly columns[j] + lowParts[j] (double-double). */
  lowParts: (Float64Array | null)[];
  /** Index of the intercept column (0) or -1. */
  interceptIndex: number;
  /** m_j (0 for the intercept column and for no-intercept models). */
  shift: Float64Array;
  /** 1 / c_j, an exact power of two. */
  inverseScale: Float64Array;
  /** ||x_j|| / ||x_j - m_j||: how much of a column's magnitude is offset. Rounding noise grows with it. */
  offsetRatio: Float64Array;
  /** fl(sqrt(w_i)), or null when unweighted. */
  sqrtWeights: Float64Array | null;
  /** Relative size below which a column's new direction counts as zero (times offsetRatio). */
  rankTolerance: number;
}

/** Nearest power of two to `value` (> 0). */
function powerOfTwoNear(value: number): number {
  const exponent = Math.round(Math.log2(value));
  return Math.pow(2, Math.max(-1000, Math.min(1000, exponent)));
}

/**
 * Rank tolerance: a column whose part orthogonal to the earlier columns is below
 * 16 * machine epsilon * sqrt(p) of its norm (times its offset ratio) is indistinguishable from
 * rounding noise. The factor 16 * sqrt(p) is common practice for Householder QR error growth.
 */
export function rankToleranceFor(p: number): number {
  return 16 * EPSILON * Math.sqrt(Math.max(1, p));
}

export function prepareWorkingDesign(
  names: string[],
  columns: Float64Array[],
  n: number,
  hasIntercept: boolean,
  weights: Float64Array | undefined,
  lowParts?: ReadonlyArray<Float64Array | null | undefined>,
): WorkingDesign {
  const p = columns.length;
  const sqrtWeights = weights ? new Float64Array(n) : null;
  let weightTotal = n;
  if (weights && sqrtWeights) {
    weightTotal = 0;
    for (let i = 0; i < n; i++) {
      const w = weights[i]!;
      sqrtWeights[i] = Math.sqrt(w);
      weightTotal += w;
    }
  }
  const shift = new Float64Array(p);
  const inverseScale = new Float64Array(p);
  const offsetRatio = new Float64Array(p);
  const rankTolerance = rankToleranceFor(p);
  const interceptIndex = hasIntercept ? 0 : -1;

  for (let j = 0; j < p; j++) {
    const column = columns[j] as Float64Array;
    if (j === interceptIndex) {
      inverseScale[j] = 1 / powerOfTwoNear(Math.sqrt(weightTotal));
      offsetRatio[j] = 1;
      continue;
    }
    const name = names[j] ?? `#${j}`;
    const moments = columnMoments(column, weights, weightTotal, hasIntercept);
    if (!moments) {
      assertFinite(name, column);
      throw new EngineError('magnitude-out-of-range', `Column "${name}" holds values too large to work with (above about 1e300); rescale it.`, {
        column: name,
      });
    }
    const { centredNorm, rawNorm } = moments;
    if (!(rawNorm > 0)) {
      throw new EngineError('zero-column', `Column "${name}" is zero in every row, so it cannot be estimated.`, {
        column: name,
      });
    }
    if (!(centredNorm > rankTolerance * rawNorm)) {
      throw new EngineError(
        'constant-column',
        `Column "${name}" has the same value in every row (zero variance), so its coefficient cannot be ` +
          'separated from the intercept; remove it or fit without an intercept.',
        { column: name },
      );
    }
    shift[j] = moments.mean;
    inverseScale[j] = 1 / powerOfTwoNear(centredNorm);
    offsetRatio[j] = rawNorm / centredNorm;
  }
  const low: (Float64Array | null)[] = [];
  for (let j = 0; j < p; j++) low.push(j === interceptIndex ? null : (lowParts?.[j] ?? null));
  return {
    n,
    p,
    names,
    columns,
    lowParts: low,
    interceptIndex,
    shift,
    inverseScale,
    offsetRatio,
    sqrtWeights,
    rankTolerance,
  };
}

interface ColumnMoments {
  mean: number;
  /** sqrt of the (weighted) centred and raw sums of squares, formed without overflow. */
  centredNorm: number;
  rawNorm: number;
}

/**
 * (Weighted) mean, centred and raw sums of squares in two passes: sums, then deviations from the
 * provisional mean with the correction sum(w d) folded back (the corrected two-pass algorithm of Chan,
 * Golub & LeVeque, 1983). Null when a sum is not finite (a NaN or Infinity in the column, or overflow),
 * so the per-element finiteness check costs nothing on clean data.
 */
function columnMoments(
  column: Float64Array,
  weights: Float64Array | undefined,
  weightTotal: number,
  centre: boolean,
): ColumnMoments | null {
  // Scale by a power of two near the largest magnitude first (exact), so squares neither underflow for
  // |x| near 1e-160 nor overflow for |x| near 1e160; the moments are scaled back at the end.
  const n = column.length;
  let largest = 0;
  for (let i = 0; i < n; i++) {
    const magnitude = Math.abs(column[i]!);
    if (magnitude > largest) largest = magnitude;
  }
  if (!Number.isFinite(largest)) return null;
  if (largest === 0) return { mean: 0, centredNorm: 0, rawNorm: 0 };
  const exponent = Math.round(Math.log2(largest));
  const down = Math.pow(2, -Math.max(-1000, Math.min(1000, exponent)));
  const up = 1 / down;
  let sum = 0;
  let rawSquares = 0;
  if (weights) {
    for (let i = 0; i < n; i++) {
      const x = column[i]! * down;
      const wx = weights[i]! * x;
      sum += wx;
      rawSquares += wx * x;
    }
  } else {
    for (let i = 0; i < n; i++) {
      const x = column[i]! * down;
      sum += x;
      rawSquares += x * x;
    }
  }
  if (!Number.isFinite(sum + rawSquares)) return null;
  const rawNorm = Math.sqrt(rawSquares) * up;
  if (!centre) return { mean: 0, centredNorm: rawNorm, rawNorm };
  const provisional = sum / weightTotal;
  let deviationSum = 0;
  let deviationSquares = 0;
  if (weights) {
    for (let i = 0; i < n; i++) {
      const d = column[i]! * down - provisional;
      const wd = weights[i]! * d;
      deviationSum += wd;
      deviationSquares += wd * d;
    }
  } else {
    for (let i = 0; i < n; i++) {
      const d = column[i]! * down - provisional;
      deviationSum += d;
      deviationSquares += d * d;
    }
  }
  return {
    mean: (provisional + deviationSum / weightTotal) * up,
    centredNorm: Math.sqrt(Math.max(0, deviationSquares - (deviationSum * deviationSum) / weightTotal)) * up,
    rawNorm,
  };
}

/** Weighted mean with one correction pass (the corrected two-pass algorithm). */
export function weightedMean(
  column: Float64Array,
  weights: Float64Array | undefined,
  weightTotal: number,
  n: number,
): number {
  let sum = 0;
  for (let i = 0; i < n; i++) sum += (weights ? weights[i]! : 1) * column[i]!;
  let mean = sum / weightTotal;
  let correction = 0;
  for (let i = 0; i < n; i++) correction += (weights ? weights[i]! : 1) * (column[i]! - mean);
  mean += correction / weightTotal;
  return mean;
}

/** Rounded working column j (s_i * fl(x_ij - m_j) / c_j), the input of the double-precision QR. */
export function workingColumn(design: WorkingDesign, j: number, into?: Float64Array): Float64Array {
  const { n, sqrtWeights } = design;
  const out = into ?? new Float64Array(n);
  const inverse = design.inverseScale[j]!;
  if (j === design.interceptIndex) {
    if (sqrtWeights) for (let i = 0; i < n; i++) out[i] = sqrtWeights[i]! * inverse;
    else out.fill(inverse);
    return out;
  }
  const column = design.columns[j] as Float64Array;
  const low = design.lowParts[j];
  const m = design.shift[j]!;
  if (low) for (let i = 0; i < n; i++) out[i] = (column[i]! - m + low[i]!) * inverse;
  else for (let i = 0; i < n; i++) out[i] = (column[i]! - m) * inverse;
  if (sqrtWeights) for (let i = 0; i < n; i++) out[i]! *= sqrtWeights[i]!;
  return out;
}

/**
 * Maps working-space coefficients g (double-double, hi/lo) to the caller's parametrisation b
 * (double-double), following the formula in the file comment.
 */
export function toDesignCoefficients(
  design: WorkingDesign,
  gHi: Float64Array,
  gLo: Float64Array,
): { hi: Float64Array; lo: Float64Array } {
  const { p, interceptIndex, inverseScale, shift } = design;
  const hi = new Float64Array(p);
  const lo = new Float64Array(p);
  for (let j = 0; j < p; j++) {
    hi[j] = gHi[j]! * inverseScale[j]!;
    lo[j] = gLo[j]! * inverseScale[j]!;
  }
  if (interceptIndex >= 0) {
    let sHi = hi[interceptIndex]!;
    let sLo = lo[interceptIndex]!;
    for (let j = 0; j < p; j++) {
      if (j === interceptIndex || shift[j] === 0) continue;
      // subtract m_j * b_j (double-double product, m_j exact double)
      const m = shift[j]!;
      const product = m * hi[j]!;
      let t = 134217729 * m;
      const mH = t - (t - m);
      const mL = m - mH;
      t = 134217729 * hi[j]!;
      const bH = t - (t - hi[j]!);
      const bL = hi[j]! - bH;
      const productError = mH * bH - product + mH * bL + mL * bH + mL * bL + m * lo[j]!;
      const s = sHi - product;
      const bb = s - sHi;
      const e = sHi - (s - bb) + (-product - bb) + sLo - productError;
      sHi = s + e;
      sLo = e - (sHi - s);
    }
    hi[interceptIndex] = sHi;
    lo[interceptIndex] = sLo;
  }
  return { hi, lo };
}

/**
 * The linear map M with b = M g as a dense p x p matrix (row-major). Rows of non-intercept columns have
 * a single entry 1/c_j; the intercept row is (1/c_0, -m_1/c_1, ..., -m_{p-1}/c_{p-1}). Every entry is
 * exact: m_j / c_j only changes the exponent of m_j.
 */
export function designMap(design: WorkingDesign): Float64Array {
  const { p, interceptIndex, inverseScale, shift } = design;
  const map = new Float64Array(p * p);
  for (let j = 0; j < p; j++) map[j * p + j] = inverseScale[j]!;
  if (interceptIndex >= 0) {
    for (let j = 0; j < p; j++) {
      if (j !== interceptIndex) map[interceptIndex * p + j] = -shift[j]! * inverseScale[j]!;
    }
  }
  return map;
}
