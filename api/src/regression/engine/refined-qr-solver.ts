/**
 * Least squares through Householder QR of the centred and scaled working design, followed by iterative
 * refinement of the augmented system with residuals accumulated in double-double precision.
 *
 * Method (Björck, 1967, "Iterative refinement of linear least squares solutions I", BIT 7; also Björck,
 * "Numerical Methods for Least Squares Problems", SIAM 1996, section 2.9): the least-squares solution g
 * and residual r = S(y - Z g) solve
 *     [ I   A ] [ r ]   [ S y ]
 *     [ A'  0 ] [ g ] = [  e  ]        with A = S Z, e = 0.
 * Each step evaluates f = S y - r - A g and h = e - A' r in double-double against the exact working
 * design (Z carried as hi + lo, see working-design.ts), then solves for the corrections with the
 * double-precision QR factors. The contraction per step is about (condition number) x 1.1e-16, so
 * even a design with condition number 4e9 (the NIST Filip polynomial after centring and scaling) gains
 * six or more digits per step, and g converges to the exact solution for the caller's data rather than
 * to a backward-stable approximation. g and r are carried in double-double.
 *
 * The same iteration with S y = 0 and e = -e_k yields column k of (A'A)^-1, which is how the
 * covariance is refined for small and moderate problems (see `shouldRefineCovariance`).
 */

import { EngineError } from './errors';
import { DoubleDoubleAccumulator } from './double-double';
import {
  applyQ,
  applyQTranspose,
  householderFactorise,
  HouseholderFactor,
  solveUpper,
  solveUpperTranspose,
  thinQ,
  upperEntry,
} from './householder-qr';
import { UpperTriangular, frobeniusConditionNumber, upperInverse, inverseGram } from './triangular';
import { designMap, toDesignCoefficients, WorkingDesign, workingColumn } from './working-design';

const SPLITTER = 134217729;
const MAX_REFINEMENT_STEPS = 12;
/** Corrections below this relative size no longer change the rounded double result. */
const CONVERGED = 1e-19;

export interface RefinedSolution {
  coefficients: Float64Array;
  residuals: Float64Array;
  fitted: Float64Array;
  residualSumOfSquares: number;
  unscaledCovariance: Float64Array[];
  leverage?: Float64Array;
  conditionNumber: number;
  refinementSteps: number;
  /** Which solver produced it (the tall path hands ill-conditioned problems to the refined one). */
  solver?: 'householder-refined' | 'tall-skinny';
  /** g, the coefficients in the working coordinates (b = M g, see working-design.ts), as hi + lo. */
  workingCoefficients: Float64Array;
  workingCoefficientsLow: Float64Array;
  /** (A'A)^-1 of the working design A = S Z (row-major p x p) as hi + lo (lo null when not refined). */
  workingCovariance: Float64Array;
  workingCovarianceLow: Float64Array | null;
}

/** Refining p covariance columns costs about 10 n p^2 double-double operations: keep it bounded. */
export function shouldRefineCovariance(n: number, p: number, conditionNumber: number): boolean {
  return n * p * p <= 4e6 || (conditionNumber > 1e6 && n * p * p <= 4e8);
}

export interface WorkingFactor {
  factor: HouseholderFactor;
  triangle: UpperTriangular;
  conditionNumber: number;
}

/** Householder QR of the working design, with the engine's one rank rule (collinearity raised here). */
export function factoriseWorking(design: WorkingDesign): WorkingFactor {
  const { n, p } = design;
  const packed: Float64Array[] = [];
  for (let j = 0; j < p; j++) packed.push(workingColumn(design, j));
  const outcome = householderFactorise(packed, n, design.rankTolerance, design.offsetRatio);
  if ('failure' in outcome) throw collinearityError(design, outcome.failure.column, outcome.failure.dependency);
  const triangle = extractTriangle(outcome.factor);
  return { factor: outcome.factor, triangle, conditionNumber: frobeniusConditionNumber(triangle) };
}

/** (A'A)^-1 of the working design as hi + lo: refined columns when affordable, else from R^-1. */
export function workingGramInverse(design: WorkingDesign, factored: WorkingFactor): { hi: Float64Array; lo: Float64Array | null } {
  return shouldRefineCovariance(design.n, design.p, factored.conditionNumber)
    ? refinedGramInverse(design, factored.factor)
    : { hi: inverseGram(upperInverse(factored.triangle)), lo: null };
}

/** One response against an existing factor: refined g (hi, lo), b, residuals and the weighted RSS. */
export function solveWithFactor(design: WorkingDesign, factor: HouseholderFactor, response: Float64Array) {
  const { n, p } = design;
  const state = refineAugmented(design, factor, response, null);
  const mapped = toDesignCoefficients(design, state.gHi, state.gLo);
  const coefficients = new Float64Array(p);
  for (let j = 0; j < p; j++) coefficients[j] = mapped.hi[j]! + mapped.lo[j]!;
  const raw = rawResiduals(design, response, state.gHi, state.gLo);
  return { state, coefficients, residuals: raw.residuals, residualSumOfSquares: raw.weightedSquares, n };
}

export function solveRefinedQr(
  design: WorkingDesign,
  response: Float64Array,
  computeLeverage: boolean,
): RefinedSolution {
  const { n } = design;
  const factored = factoriseWorking(design);
  const { factor, conditionNumber } = factored;
  const { state, coefficients, residuals, residualSumOfSquares } = solveWithFactor(design, factor, response);
  const raw = { residuals, weightedSquares: residualSumOfSquares };
  const fitted = new Float64Array(n);
  for (let i = 0; i < n; i++) fitted[i] = response[i]! - raw.residuals[i]!;

  const workingCovariance = workingGramInverse(design, factored);
  const unscaledCovariance = mappedCovariance(design, workingCovariance.hi, workingCovariance.lo);

  const solution: RefinedSolution = {
    coefficients,
    residuals: raw.residuals,
    fitted,
    residualSumOfSquares: raw.weightedSquares,
    unscaledCovariance,
    conditionNumber,
    refinementSteps: state.steps,
    workingCoefficients: state.gHi,
    workingCoefficientsLow: state.gLo,
    workingCovariance: workingCovariance.hi,
    workingCovarianceLow: workingCovariance.lo,
  };
  if (computeLeverage) solution.leverage = leverageFromThinQ(factor);
  return solution;
}

function extractTriangle(factor: HouseholderFactor): UpperTriangular {
  const size = factor.cols;
  const entries = new Float64Array(size * size);
  for (let i = 0; i < size; i++) for (let j = i; j < size; j++) entries[i * size + j] = upperEntry(factor, i, j);
  return { size, entries };
}

export function collinearityError(design: WorkingDesign, column: number, dependency: Float64Array): EngineError {
  const name = design.names[column] ?? `#${column}`;
  let largest = 0;
  for (let j = 0; j < dependency.length; j++) largest = Math.max(largest, Math.abs(dependency[j]!));
  const partners: string[] = [];
  for (let j = 0; j < dependency.length; j++) {
    if (Math.abs(dependency[j]!) > 1e-6 * largest) partners.push(design.names[j] ?? `#${j}`);
  }
  const others = partners.filter((partner) => partner !== name);
  const description =
    others.length > 0
      ? `Column "${name}" is an exact linear combination of ${others.map((o) => `"${o}"`).join(', ')} ` +
        '(to within rounding); remove one of them.'
      : `Column "${name}" adds no information beyond the earlier columns; remove it.`;
  return new EngineError('collinear-columns', description, { column: name, columns: [...others, name] });
}

interface AugmentedState {
  gHi: Float64Array;
  gLo: Float64Array;
  steps: number;
}

/**
 * Björck's refinement for [I A; A' 0][r; g] = [S y; e] (y or e may be null for zero). Returns g in
 * double-double. Stops when corrections no longer change the double result, or stop shrinking.
 */
function refineAugmented(
  design: WorkingDesign,
  factor: HouseholderFactor,
  response: Float64Array | null,
  target: Float64Array | null,
): AugmentedState {
  const { n, p } = design;
  const gHi = new Float64Array(p);
  const gLo = new Float64Array(p);
  const rHi = new Float64Array(n);
  const rLo = new Float64Array(n);
  const f = new Float64Array(n);
  const h = new Float64Array(p);
  const accumulatorHi = new Float64Array(n);
  const accumulatorLo = new Float64Array(n);
  const deltaG = new Float64Array(p);
  let previous = Infinity;
  let steps = 0;
  for (let step = 0; step < MAX_REFINEMENT_STEPS; step++) {
    if (step === 0) {
      // r = 0, g = 0: f = S y, h = e exactly.
      if (response) {
        const s = design.sqrtWeights;
        for (let i = 0; i < n; i++) f[i] = s ? s[i]! * response[i]! : response[i]!;
      } else f.fill(0);
      for (let j = 0; j < p; j++) h[j] = target ? target[j]! : 0;
    } else {
      residualOfAugmented(design, response, target, gHi, gLo, rHi, rLo, accumulatorHi, accumulatorLo, f, h);
    }
    // Corrections: h <- R^-T h; d = Q' f; dg = R^-1 (d1 - h); dr = Q [h; d2].
    solveUpperTranspose(factor, h);
    applyQTranspose(factor, f);
    for (let j = 0; j < p; j++) deltaG[j] = f[j]! - h[j]!;
    solveUpper(factor, deltaG);
    for (let j = 0; j < p; j++) f[j] = h[j]!;
    applyQ(factor, f);

    const size = correctionSize(gHi, deltaG, rHi, f, step === 0);
    if (step > 1 && size > previous) break; // diverging: keep the better iterate
    addInPlace(gHi, gLo, deltaG);
    addInPlace(rHi, rLo, f);
    steps = step + 1;
    if (step > 0 && (size <= CONVERGED || size > 0.5 * previous)) break;
    previous = size;
  }
  return { gHi, gLo, steps };
}

function correctionSize(
  gHi: Float64Array,
  deltaG: Float64Array,
  rHi: Float64Array,
  deltaR: Float64Array,
  first: boolean,
): number {
  if (first) return Infinity;
  let gNorm = 0;
  for (let j = 0; j < gHi.length; j++) gNorm = Math.max(gNorm, Math.abs(gHi[j]!));
  let size = 0;
  for (let j = 0; j < gHi.length; j++) {
    const scale = Math.max(Math.abs(gHi[j]!), 1e-30 * gNorm, Number.MIN_VALUE);
    size = Math.max(size, Math.abs(deltaG[j]!) / scale);
  }
  let rNorm = 0;
  let dNorm = 0;
  for (let i = 0; i < rHi.length; i++) {
    rNorm = Math.max(rNorm, Math.abs(rHi[i]!));
    dNorm = Math.max(dNorm, Math.abs(deltaR[i]!));
  }
  if (dNorm > 0) size = Math.max(size, dNorm / Math.max(rNorm, 1e-30 * gNorm, Number.MIN_VALUE));
  return size;
}

function addInPlace(hi: Float64Array, lo: Float64Array, delta: Float64Array): void {
  for (let i = 0; i < hi.length; i++) {
    const a = hi[i]!;
    const b = delta[i]!;
    const s = a + b;
    const bb = s - a;
    const e = a - (s - bb) + (b - bb) + lo[i]!;
    const r = s + e;
    hi[i] = r;
    lo[i] = e - (r - s);
  }
}

/**
 * accumulator = y - Z g (double-double, raw scale), the exact working design generated on the fly:
 * z_ij = (x_ij - m_j) / c_j as hi + lo.
 */
function rawResidualInto(
  design: WorkingDesign,
  response: Float64Array | null,
  gHi: Float64Array,
  gLo: Float64Array,
  accumulatorHi: Float64Array,
  accumulatorLo: Float64Array,
): void {
  const { n, p, interceptIndex } = design;
  if (response) accumulatorHi.set(response);
  else accumulatorHi.fill(0);
  accumulatorLo.fill(0);
  for (let j = 0; j < p; j++) {
    const gh = gHi[j]!;
    const gl = gLo[j]!;
    if (gh === 0 && gl === 0) continue;
    const inverse = design.inverseScale[j]!;
    let t = SPLITTER * gh;
    const gH = t - (t - gh);
    const gL = gh - gH;
    if (j === interceptIndex) {
      const zh = inverse;
      t = SPLITTER * zh;
      const zH = t - (t - zh);
      const zL = zh - zH;
      const product = zh * gh;
      const productError = zH * gH - product + zH * gL + zL * gH + zL * gL + zh * gl;
      for (let i = 0; i < n; i++) {
        const a = accumulatorHi[i]!;
        const s = a - product;
        const bb = s - a;
        accumulatorLo[i] = accumulatorLo[i]! + (a - (s - bb) + (-product - bb)) - productError;
        accumulatorHi[i] = s;
      }
      continue;
    }
    const column = design.columns[j] as Float64Array;
    const low = design.lowParts[j];
    const m = design.shift[j]!;
    for (let i = 0; i < n; i++) {
      const x = column[i]!;
      const d = x - m;
      const db = d - x;
      const zh = d * inverse;
      const zl = (x - (d - db) + (-m - db) + (low ? low[i]! : 0)) * inverse;
      t = SPLITTER * zh;
      const zH = t - (t - zh);
      const zL = zh - zH;
      const product = zh * gh;
      const productError = zH * gH - product + zH * gL + zL * gH + zL * gL + zh * gl + zl * gh;
      const a = accumulatorHi[i]!;
      const s = a - product;
      const bb = s - a;
      accumulatorLo[i] = accumulatorLo[i]! + (a - (s - bb) + (-product - bb)) - productError;
      accumulatorHi[i] = s;
    }
  }
}

/** f = S y - r - A g and h = e - A' r, evaluated in double-double and rounded. */
function residualOfAugmented(
  design: WorkingDesign,
  response: Float64Array | null,
  target: Float64Array | null,
  gHi: Float64Array,
  gLo: Float64Array,
  rHi: Float64Array,
  rLo: Float64Array,
  accumulatorHi: Float64Array,
  accumulatorLo: Float64Array,
  f: Float64Array,
  h: Float64Array,
): void {
  const { n, p, interceptIndex } = design;
  const s = design.sqrtWeights;
  rawResidualInto(design, response, gHi, gLo, accumulatorHi, accumulatorLo);
  for (let i = 0; i < n; i++) {
    let aHi = accumulatorHi[i]!;
    let aLo = accumulatorLo[i]!;
    if (s) {
      const w = s[i]!;
      const product = w * aHi;
      let t = SPLITTER * w;
      const wH = t - (t - w);
      const wL = w - wH;
      t = SPLITTER * aHi;
      const aH = t - (t - aHi);
      const aL = aHi - aH;
      aLo = wH * aH - product + wH * aL + wL * aH + wL * aL + w * aLo;
      aHi = product;
    }
    const r = rHi[i]!;
    const d = aHi - r;
    const bb = d - aHi;
    f[i] = d + (aHi - (d - bb) + (-r - bb) + aLo - rLo[i]!);
  }
  // S r in double-double, reused for every column of A' r = Z' (S r).
  const srHi = accumulatorHi;
  const srLo = accumulatorLo;
  for (let i = 0; i < n; i++) {
    if (s) {
      const w = s[i]!;
      const r = rHi[i]!;
      const product = w * r;
      let t = SPLITTER * w;
      const wH = t - (t - w);
      const wL = w - wH;
      t = SPLITTER * r;
      const rH = t - (t - r);
      const rL = r - rH;
      srHi[i] = product;
      srLo[i] = wH * rH - product + wH * rL + wL * rH + wL * rL + w * rLo[i]!;
    } else {
      srHi[i] = rHi[i]!;
      srLo[i] = rLo[i]!;
    }
  }
  for (let j = 0; j < p; j++) {
    const inverse = design.inverseScale[j]!;
    let sumHi = 0;
    let sumLo = 0;
    if (j === interceptIndex) {
      for (let i = 0; i < n; i++) {
        const v = srHi[i]!;
        const total = sumHi + v;
        const bb = total - sumHi;
        sumLo += sumHi - (total - bb) + (v - bb) + srLo[i]!;
        sumHi = total;
      }
      sumHi *= inverse;
      sumLo *= inverse;
    } else {
      const column = design.columns[j] as Float64Array;
      const low = design.lowParts[j];
      const m = design.shift[j]!;
      for (let i = 0; i < n; i++) {
        const x = column[i]!;
        const d = x - m;
        const db = d - x;
        const zh = d * inverse;
        const zl = (x - (d - db) + (-m - db) + (low ? low[i]! : 0)) * inverse;
        const v = srHi[i]!;
        const product = zh * v;
        let t = SPLITTER * zh;
        const zH = t - (t - zh);
        const zL = zh - zH;
        t = SPLITTER * v;
        const vH = t - (t - v);
        const vL = v - vH;
        const productError = zH * vH - product + zH * vL + zL * vH + zL * vL + zh * srLo[i]! + zl * v;
        const total = sumHi + product;
        const bb = total - sumHi;
        sumLo += sumHi - (total - bb) + (product - bb) + productError;
        sumHi = total;
      }
    }
    const targetValue = target ? target[j]! : 0;
    h[j] = targetValue - sumHi - sumLo;
  }
}

/** Residuals y - X b on the response's scale, and the weighted residual sum of squares, from g. */
function rawResiduals(
  design: WorkingDesign,
  response: Float64Array,
  gHi: Float64Array,
  gLo: Float64Array,
): { residuals: Float64Array; weightedSquares: number } {
  const { n } = design;
  const accumulatorHi = new Float64Array(n);
  const accumulatorLo = new Float64Array(n);
  rawResidualInto(design, response, gHi, gLo, accumulatorHi, accumulatorLo);
  const s = design.sqrtWeights;
  let sumHi = 0;
  let sumLo = 0;
  for (let i = 0; i < n; i++) {
    // residual in double-double, then its weighted square in double-double
    const rHi = accumulatorHi[i]! + accumulatorLo[i]!;
    const rLo = accumulatorLo[i]! - (rHi - accumulatorHi[i]!);
    accumulatorHi[i] = rHi;
    let vHi = rHi;
    let vLo = rLo;
    if (s) {
      const w = s[i]!;
      vHi = w * rHi;
      vLo = w * rLo;
      const t1 = SPLITTER * w;
      const wH = t1 - (t1 - w);
      const wL = w - wH;
      const t2 = SPLITTER * rHi;
      const rH = t2 - (t2 - rHi);
      const rL = rHi - rH;
      vLo += wH * rH - vHi + wH * rL + wL * rH + wL * rL;
    }
    const square = vHi * vHi;
    const t = SPLITTER * vHi;
    const vH = t - (t - vHi);
    const vL = vHi - vH;
    const squareError = vH * vH - square + 2 * vH * vL + vL * vL + 2 * vHi * vLo;
    const total = sumHi + square;
    const bb = total - sumHi;
    sumLo += sumHi - (total - bb) + (square - bb) + squareError;
    sumHi = total;
  }
  return { residuals: accumulatorHi, weightedSquares: sumHi + sumLo };
}

/** Refined columns of (A'A)^-1 in double-double (hi, lo), row-major; mapped to b by mappedCovariance. */
function refinedGramInverse(design: WorkingDesign, factor: HouseholderFactor): { hi: Float64Array; lo: Float64Array } {
  const { p } = design;
  const gramInverseHi = new Float64Array(p * p);
  const gramInverseLo = new Float64Array(p * p);
  const target = new Float64Array(p);
  for (let k = 0; k < p; k++) {
    target.fill(0);
    target[k] = -1;
    const column = refineAugmented(design, factor, null, target);
    for (let j = 0; j < p; j++) {
      gramInverseHi[j * p + k] = column.gHi[j]!;
      gramInverseLo[j * p + k] = column.gLo[j]!;
    }
  }
  return { hi: gramInverseHi, lo: gramInverseLo };
}

/** M C M' with C = (A'A)^-1 given as hi (+ optional lo) parts; double-double accumulation. */
export function mappedCovariance(
  design: WorkingDesign,
  gramInverseHi: Float64Array,
  gramInverseLo: Float64Array | null,
): Float64Array[] {
  const { p } = design;
  const map = designMap(design);
  // T = M C (double-double), then M T' (symmetric result).
  const tHi = new Float64Array(p * p);
  const tLo = new Float64Array(p * p);
  for (let a = 0; a < p; a++) {
    for (let b = 0; b < p; b++) {
      const sum = new DoubleDoubleAccumulator();
      for (let k = 0; k < p; k++) {
        const m = map[a * p + k]!;
        if (m === 0) continue;
        sum.addProduct(m, gramInverseHi[k * p + b]!);
        if (gramInverseLo) sum.lo += m * gramInverseLo[k * p + b]!;
      }
      tHi[a * p + b] = sum.hi;
      tLo[a * p + b] = sum.lo;
    }
  }
  const rows: Float64Array[] = [];
  for (let a = 0; a < p; a++) rows.push(new Float64Array(p));
  for (let a = 0; a < p; a++) {
    for (let b = a; b < p; b++) {
      const sum = new DoubleDoubleAccumulator();
      for (let k = 0; k < p; k++) {
        const m = map[b * p + k]!;
        if (m === 0) continue;
        sum.addProduct(m, tHi[a * p + k]!);
        sum.lo += m * tLo[a * p + k]!;
      }
      const value = sum.value();
      (rows[a] as Float64Array)[b] = value;
      (rows[b] as Float64Array)[a] = value;
    }
  }
  return rows;
}

function leverageFromThinQ(factor: HouseholderFactor): Float64Array {
  const q = thinQ(factor);
  const leverage = new Float64Array(factor.rows);
  for (const column of q) for (let i = 0; i < factor.rows; i++) leverage[i]! += column[i]! * column[i]!;
  return leverage;
}
