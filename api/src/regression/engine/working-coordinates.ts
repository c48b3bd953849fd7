/**
 * Derived quantities of a fit, computed in the solver's centred and scaled working coordinates and mapped
 * back once (working-design.ts: z_ij = (x_ij - m_j) / c_j, b = M g).
 *
 * Why: a raw quadratic form such as x0' V x0 or the sandwich (X'X)^-1 [sum u_i u_i'] (X'X)^-1 with
 * u_i = e_i x_i cancels catastrophically when a column carries a large offset (epoch milliseconds near
 * 1.7e12, a price level near 1e5): the terms are 1e24 times larger than their sum. In working coordinates
 * every column is centred and of unit scale, so nothing cancels, and the only large numbers (the offsets
 * m_j) enter through the exact map M, applied in double-double.
 *
 * For each row the vector v_i = C z_i with C = (A'A)^-1 (the solver's working covariance, refined to
 * double-double for small and moderate problems) is formed in double-double, and mapped to the caller's
 * parametrisation as vb_i = M v_i = (X'WX)^-1 x_i. Every sandwich is a sum of outer products of these
 * vectors, accumulated in double-double, so the diagonal (the variances) is a sum of non-negative terms
 * each exact to a few units of rounding: its relative error is a few times 1e-16 whatever the offsets.
 * Large problems (n p^2 above DOUBLE_DOUBLE_WORK) use the same formulas in double precision in working
 * coordinates, still free of the offsets.
 */

import { EngineError } from './errors';
import { LeastSquaresSolution } from './least-squares';
import { mappedCovariance } from './refined-qr-solver';
import { WorkingDesign } from './working-design';
import { SquareMatrix, zeroMatrix } from './diagnostics/small-matrix';

const SPLITTER = 134217729;
/** Above this many row-by-entry operations (n p^2) the double-double path gives way to plain doubles. */
export const DOUBLE_DOUBLE_WORK = 4e6;

/** Working row z_i (unweighted): hi and lo parts. Intercept entry 1/c_0. */
export function workingRowInto(design: WorkingDesign, i: number, hi: Float64Array, lo: Float64Array): void {
  const { p, interceptIndex } = design;
  for (let j = 0; j < p; j++) {
    const inverse = design.inverseScale[j]!;
    if (j === interceptIndex) {
      hi[j] = inverse;
      lo[j] = 0;
      continue;
    }
    const x = (design.columns[j] as Float64Array)[i]!;
    const low = design.lowParts[j];
    shiftAndScale(x, design.shift[j]!, inverse, low ? low[i]! : 0, j, hi, lo);
  }
}

/** z0 for a point given as a full design row (1 in the intercept position). */
export function workingPointInto(
  shift: ArrayLike<number>,
  inverseScale: ArrayLike<number>,
  interceptIndex: number,
  point: ArrayLike<number>,
  hi: Float64Array,
  lo: Float64Array,
): void {
  for (let j = 0; j < hi.length; j++) {
    if (j === interceptIndex) {
      hi[j] = inverseScale[j]!;
      lo[j] = 0;
    } else shiftAndScale(point[j]!, shift[j]!, inverseScale[j]!, 0, j, hi, lo);
  }
}

/** (x - m + low) * inverse as a double-double (TwoSum for x - m; the scale is a power of two, exact). */
function shiftAndScale(x: number, m: number, inverse: number, low: number, j: number, hi: Float64Array, lo: Float64Array): void {
  const d = x - m;
  const bb = d - x;
  const error = x - (d - bb) + (-m - bb) + low;
  const sum = d + error;
  hi[j] = sum * inverse;
  lo[j] = (error - (sum - d)) * inverse;
}

/** out = C z in double-double, C given as row-major hi (and optional lo) parts. */
function multiplyInto(
  p: number,
  cHi: Float64Array,
  cLo: Float64Array | null,
  zHi: Float64Array,
  zLo: Float64Array,
  outHi: Float64Array,
  outLo: Float64Array,
): void {
  for (let a = 0; a < p; a++) {
    let sHi = 0;
    let sLo = 0;
    for (let k = 0; k < p; k++) {
      const c = cHi[a * p + k]!;
      const z = zHi[k]!;
      const product = c * z;
      let t = SPLITTER * c;
      const cH = t - (t - c);
      const cL = c - cH;
      t = SPLITTER * z;
      const zH = t - (t - z);
      const zL = z - zH;
      const productError = cH * zH - product + cH * zL + cL * zH + cL * zL + c * zLo[k]! + (cLo ? cLo[a * p + k]! * z : 0);
      const total = sHi + product;
      const back = total - sHi;
      sLo += sHi - (total - back) + (product - back) + productError;
      sHi = total;
    }
    const hi = sHi + sLo;
    outHi[a] = hi;
    outLo[a] = sLo - (hi - sHi);
  }
}

/** (aHi + aLo) . (bHi + bLo) accumulated in double-double (exact products, lo x lo dropped), rounded. */
function dotDoubleDouble(aHi: Float64Array, aLo: Float64Array, bHi: Float64Array, bLo: Float64Array): number {
  let sHi = 0;
  let sLo = 0;
  for (let j = 0; j < aHi.length; j++) {
    const a = aHi[j]!;
    const b = bHi[j]!;
    const product = a * b;
    let t = SPLITTER * a;
    const aH = t - (t - a);
    const aL = a - aH;
    t = SPLITTER * b;
    const bH = t - (t - b);
    const bL = b - bH;
    const productError = aH * bH - product + aH * bL + aL * bH + aL * bL + a * bLo[j]! + aLo[j]! * b;
    const total = sHi + product;
    const back = total - sHi;
    sLo += sHi - (total - back) + (product - back) + productError;
    sHi = total;
  }
  return sHi + sLo;
}

/** vb = M v in double-double (M from working-design.ts: diagonal 1/c_j, intercept row -m_j/c_j). */
function mapInto(design: WorkingDesign, vHi: Float64Array, vLo: Float64Array, outHi: Float64Array, outLo: Float64Array): void {
  const { p, interceptIndex, inverseScale, shift } = design;
  for (let j = 0; j < p; j++) {
    outHi[j] = vHi[j]! * inverseScale[j]!;
    outLo[j] = vLo[j]! * inverseScale[j]!;
  }
  if (interceptIndex < 0) return;
  let sHi = outHi[interceptIndex]!;
  let sLo = outLo[interceptIndex]!;
  for (let j = 0; j < p; j++) {
    if (j === interceptIndex || shift[j] === 0) continue;
    const m = -shift[j]!;
    const b = outHi[j]!;
    const product = m * b;
    let t = SPLITTER * m;
    const mH = t - (t - m);
    const mL = m - mH;
    t = SPLITTER * b;
    const bH = t - (t - b);
    const bL = b - bH;
    const productError = mH * bH - product + mH * bL + mL * bH + mL * bL + m * outLo[j]!;
    const total = sHi + product;
    const back = total - sHi;
    sLo += sHi - (total - back) + (product - back) + productError;
    sHi = total;
  }
  const hi = sHi + sLo;
  outHi[interceptIndex] = hi;
  outLo[interceptIndex] = sLo - (hi - sHi);
}

/** Per-row vectors of the sandwich: v_i = C z_i (working) and vb_i = M v_i (caller's coefficients), rounded. */
export interface RowVectors {
  working: Float64Array[];
  design: Float64Array[];
  /** h_i = w_i z_i' C z_i, in double-double before rounding. */
  leverage: Float64Array;
  /** True when the double-double path was used. */
  exact: boolean;
}

export function rowVectors(solution: LeastSquaresSolution, weights: Float64Array | undefined): RowVectors {
  const { design, covariance, covarianceLow } = solution.working;
  const { n, p } = design;
  const exact = n * p * p <= DOUBLE_DOUBLE_WORK;
  const zHi = new Float64Array(p);
  const zLo = new Float64Array(p);
  const vHi = new Float64Array(p);
  const vLo = new Float64Array(p);
  const bHi = new Float64Array(p);
  const bLo = new Float64Array(p);
  const working: Float64Array[] = [];
  const mapped: Float64Array[] = [];
  const leverage = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    workingRowInto(design, i, zHi, zLo);
    if (!exact) zLo.fill(0);
    multiplyInto(p, covariance, exact ? covarianceLow : null, zHi, zLo, vHi, vLo);
    leverage[i] = dotDoubleDouble(zHi, zLo, vHi, vLo) * (weights ? weights[i]! : 1);
    working.push(Float64Array.from(vHi, (value, j) => value + vLo[j]!));
    if (exact) {
      mapInto(design, vHi, vLo, bHi, bLo);
      mapped.push(Float64Array.from(bHi, (value, j) => value + bLo[j]!));
    }
  }
  return { working, design: exact ? mapped : [], leverage, exact };
}

/**
 * A symmetric p x p sum of outer products a_i b_i' (plus b_i a_i' when `symmetric` pairs are added),
 * accumulated in double-double with exact products.
 */
export class OuterSum {
  private readonly hi: Float64Array;
  private readonly lo: Float64Array;

  constructor(private readonly p: number) {
    this.hi = new Float64Array(p * p);
    this.lo = new Float64Array(p * p);
  }

  /** += c a a' (upper triangle only). */
  addSquare(a: Float64Array, c: number): void {
    const { p } = this;
    for (let j = 0; j < p; j++) {
      const left = c * a[j]!;
      if (left === 0) continue;
      for (let k = j; k < p; k++) this.add(j * p + k, left, a[k]!);
    }
  }

  /** += c (a b' + b a') (upper triangle only). */
  addCross(a: Float64Array, b: Float64Array, c: number): void {
    const { p } = this;
    for (let j = 0; j < p; j++) {
      for (let k = j; k < p; k++) {
        this.add(j * p + k, c * a[j]!, b[k]!);
        this.add(j * p + k, c * b[j]!, a[k]!);
      }
    }
  }

  private add(index: number, x: number, y: number): void {
    const product = x * y;
    let t = SPLITTER * x;
    const xH = t - (t - x);
    const xL = x - xH;
    t = SPLITTER * y;
    const yH = t - (t - y);
    const yL = y - yH;
    const productError = xH * yH - product + xH * yL + xL * yH + xL * yL;
    const sum = this.hi[index]!;
    const total = sum + product;
    const back = total - sum;
    this.lo[index]! += sum - (total - back) + (product - back) + productError;
    this.hi[index] = total;
  }

  /** The low parts left after rounding (hi + lo - rounded), symmetric. */
  lowMatrix(): SquareMatrix {
    const { p } = this;
    const result = zeroMatrix(p);
    for (let j = 0; j < p; j++) {
      for (let k = j; k < p; k++) {
        const hi = this.hi[j * p + k]!;
        const lo = this.lo[j * p + k]!;
        const value = lo - (hi + lo - hi);
        result[j]![k] = value;
        result[k]![j] = value;
      }
    }
    return result;
  }

  /** The rounded symmetric matrix. */
  matrix(): SquareMatrix {
    const { p } = this;
    const result = zeroMatrix(p);
    for (let j = 0; j < p; j++) {
      for (let k = j; k < p; k++) {
        const value = this.hi[j * p + k]! + this.lo[j * p + k]!;
        result[j]![k] = value;
        result[k]![j] = value;
      }
    }
    return result;
  }
}

/** M V M' for a working-coordinate matrix V (rows), mapped in double-double. */
export function mapWorkingMatrix(design: WorkingDesign, matrix: SquareMatrix): SquareMatrix {
  const { p } = design;
  const flat = new Float64Array(p * p);
  for (let j = 0; j < p; j++) for (let k = 0; k < p; k++) flat[j * p + k] = matrix[j]![k]!;
  return mappedCovariance(design, flat, null);
}

/** The working form a stored prediction model carries (plain arrays, JSON-serialisable). */
export interface WorkingPredictionModel {
  shift: number[];
  inverseScale: number[];
  interceptIndex: number;
  /** g (hi) and its low part. */
  coefficients: number[];
  coefficientsLow: number[];
  /** Covariance of g under the chosen covariance type (already multiplied by sigma^2 when classical). */
  covariance: number[][];
  /** Its low parts (double-double), so that z0' V z0 keeps its digits for ill-conditioned designs. */
  covarianceLow?: number[][];
}

export function workingPredictionModel(
  solution: LeastSquaresSolution,
  workingCovarianceOfG: SquareMatrix,
  workingCovarianceLow: SquareMatrix | undefined,
): WorkingPredictionModel {
  const { design, coefficients, coefficientsLow } = solution.working;
  return {
    ...(workingCovarianceLow ? { covarianceLow: workingCovarianceLow.map((row) => Array.from(row)) } : {}),
    shift: Array.from(design.shift),
    inverseScale: Array.from(design.inverseScale),
    interceptIndex: design.interceptIndex,
    coefficients: Array.from(coefficients),
    coefficientsLow: Array.from(coefficientsLow),
    covariance: workingCovarianceOfG.map((row) => Array.from(row)),
  };
}

/** x0'b and x0' V x0 for a full design row, evaluated as z0'g and z0' V_g z0 in double-double. */
export function evaluateAtPoint(model: WorkingPredictionModel, point: ArrayLike<number>): { estimate: number; variance: number } {
  const p = model.coefficients.length;
  if (point.length !== p) {
    throw new EngineError('invalid-argument', `A point needs ${p} design entries; got ${point.length}.`, { field: 'points' });
  }
  const zHi = new Float64Array(p);
  const zLo = new Float64Array(p);
  workingPointInto(model.shift, model.inverseScale, model.interceptIndex, point, zHi, zLo);
  let eHi = 0;
  let eLo = 0;
  for (let j = 0; j < p; j++) {
    const a = zHi[j]!;
    const g = model.coefficients[j]!;
    const product = a * g;
    let t = SPLITTER * a;
    const aH = t - (t - a);
    const aL = a - aH;
    t = SPLITTER * g;
    const gH = t - (t - g);
    const gL = g - gH;
    const productError = aH * gH - product + aH * gL + aL * gH + aL * gL + a * (model.coefficientsLow[j] ?? 0) + zLo[j]! * g;
    const total = eHi + product;
    const back = total - eHi;
    eLo += eHi - (total - back) + (product - back) + productError;
    eHi = total;
  }
  const covariance = new Float64Array(p * p);
  const covarianceLow = model.covarianceLow ? new Float64Array(p * p) : null;
  for (let j = 0; j < p; j++) {
    for (let k = 0; k < p; k++) {
      covariance[j * p + k] = model.covariance[j]![k]!;
      if (covarianceLow) covarianceLow[j * p + k] = model.covarianceLow![j]![k]!;
    }
  }
  const vHi = new Float64Array(p);
  const vLo = new Float64Array(p);
  multiplyInto(p, covariance, covarianceLow, zHi, zLo, vHi, vLo);
  return { estimate: eHi + eLo, variance: Math.max(0, dotDoubleDouble(zHi, zLo, vHi, vLo)) };
}
