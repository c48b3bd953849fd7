/**
 * Double-double arithmetic: a value is carried as an unevaluated sum hi + lo of two doubles, giving
 * about 32 significant digits. Used where the engine must evaluate residuals and cross-products more
 * accurately than the working precision (iterative refinement, sums of squares).
 *
 * The error-free transformations are Knuth's TwoSum and Dekker's TwoProduct with Veltkamp splitting
 * (Dekker, 1971, "A floating-point technique for extending the available precision", Numer. Math. 18).
 * JavaScript has no fused multiply-add, hence the splitting. Splitting overflows for |a| > ~1e300; the
 * engine's working values are scaled to O(1) long before they reach these routines.
 *
 * Hot loops inline the same formulas instead of calling these helpers, to avoid allocating pairs.
 */

export interface DoubleDouble {
  hi: number;
  lo: number;
}

const SPLITTER = 134217729; // 2^27 + 1

export function twoSum(a: number, b: number): DoubleDouble {
  const s = a + b;
  const bb = s - a;
  return { hi: s, lo: a - (s - bb) + (b - bb) };
}

export function twoProduct(a: number, b: number): DoubleDouble {
  const p = a * b;
  let t = SPLITTER * a;
  const aHi = t - (t - a);
  const aLo = a - aHi;
  t = SPLITTER * b;
  const bHi = t - (t - b);
  const bLo = b - bHi;
  return { hi: p, lo: aHi * bHi - p + aHi * bLo + aLo * bHi + aLo * bLo };
}

/** (aHi + aLo) + (bHi + bLo), renormalised. */
export function ddAdd(aHi: number, aLo: number, bHi: number, bLo: number): DoubleDouble {
  const s = aHi + bHi;
  const bb = s - aHi;
  const e = aHi - (s - bb) + (bHi - bb) + aLo + bLo;
  const hi = s + e;
  return { hi, lo: e - (hi - s) };
}

/** (aHi + aLo) * (bHi + bLo), renormalised; relative error about 2^-104. */
export function ddMul(aHi: number, aLo: number, bHi: number, bLo: number): DoubleDouble {
  const p = twoProduct(aHi, bHi);
  const e = p.lo + (aHi * bLo + aLo * bHi);
  const hi = p.hi + e;
  return { hi, lo: e - (hi - p.hi) };
}

/** (aHi + aLo) / (bHi + bLo), renormalised (one Newton correction of the double quotient). */
export function ddDiv(aHi: number, aLo: number, bHi: number, bLo: number): DoubleDouble {
  const q1 = aHi / bHi;
  const prod = ddMul(q1, 0, bHi, bLo);
  const rem = ddAdd(aHi, aLo, -prod.hi, -prod.lo);
  const q2 = rem.hi / bHi;
  const hi = q1 + q2;
  return { hi, lo: q2 - (hi - q1) };
}

/** Square root of a non-negative double-double value. */
export function ddSqrt(aHi: number, aLo: number): DoubleDouble {
  if (aHi <= 0) return { hi: 0, lo: 0 };
  const root = Math.sqrt(aHi);
  const square = twoProduct(root, root);
  const rem = ddAdd(aHi, aLo, -square.hi, -square.lo);
  const correction = rem.hi / (2 * root);
  const hi = root + correction;
  return { hi, lo: correction - (hi - root) };
}

/** Accumulates a sum of doubles and exact products in double-double. */
export class DoubleDoubleAccumulator {
  hi = 0;
  lo = 0;

  add(value: number): this {
    const s = this.hi + value;
    const bb = s - this.hi;
    this.lo += this.hi - (s - bb) + (value - bb);
    this.hi = s;
    return this;
  }

  addDoubleDouble(hi: number, lo: number): this {
    this.add(hi);
    this.lo += lo;
    return this;
  }

  addProduct(a: number, b: number): this {
    const p = twoProduct(a, b);
    this.add(p.hi);
    this.lo += p.lo;
    return this;
  }

  value(): number {
    return this.hi + this.lo;
  }

  normalised(): DoubleDouble {
    const hi = this.hi + this.lo;
    return { hi, lo: this.lo - (hi - this.hi) };
  }
}
