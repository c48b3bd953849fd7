// Generates the exact reference fixtures in this folder (see README.md beside it).
//
//   node api/src/regression/engine/__fixtures__/exact/generate-exact-references.mjs
//
// Every dataset is an invented synthetic series drawn from a seeded splitmix64 generator written below
// in BigInt (Longley is the exception: the NIST StRD values, copied from the NIST file). Each double the
// fixture stores is converted exactly to a rational from its IEEE-754 bits, and the least-squares problem
// is solved exactly in rationals (normal equations, rational Gaussian elimination). Rational arithmetic
// also gives the residuals, the leverages, (X'WX)^-1 and every assumption-check statistic. Square roots,
// the sandwich sums and the distribution functions use decimal.js at a fixed working precision; the whole
// computation is run at two precisions (100 and 140 significant digits) and the script stops unless both
// runs print the same 25 significant digits, so every printed digit is correct.

import Decimal from 'decimal.js';
import { readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const HERE = dirname(fileURLToPath(import.meta.url));
// The committed copy of the NIST StRD Longley file (identical to the shared NIST reference copy).
const LONGLEY_SOURCE = join(HERE, '..', 'nist-strd', 'Longley.json');
const PRINTED_DIGITS = 25;
const PRECISIONS = [100, 140];

// ------------------------------------------------------------------ seeded generator (splitmix64)

/** splitmix64 (Steele, Lea & Flood 2014) in BigInt; uniforms are k / 2^53 (exact doubles). */
function splitmix64(seed) {
  const MASK = (1n << 64n) - 1n;
  let state = BigInt(seed) & MASK;
  const next = () => {
    state = (state + 0x9e3779b97f4a7c15n) & MASK;
    let z = state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK;
    return z ^ (z >> 31n);
  };
  const uniform = () => Number(next() >> 11n) / 2 ** 53;
  // Irwin-Hall: the sum of 12 uniforms minus 6 has mean 0 and variance 1. Only + and - are used, so the
  // sequence is bit-identical on every IEEE-754 machine (no Math.log or Math.cos).
  const normal = () => {
    let sum = 0;
    for (let k = 0; k < 12; k++) sum += uniform();
    return sum - 6;
  };
  const integer = (low, high) => low + Math.floor(uniform() * (high - low + 1));
  return { uniform, normal, integer };
}

// ------------------------------------------------------------------ exact rationals

function gcd(a, b) {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

class Rational {
  constructor(numerator, denominator = 1n) {
    if (denominator === 0n) throw new Error('division by zero in exact arithmetic');
    if (denominator < 0n) {
      numerator = -numerator;
      denominator = -denominator;
    }
    const divisor = gcd(numerator, denominator);
    this.n = divisor > 1n ? numerator / divisor : numerator;
    this.d = divisor > 1n ? denominator / divisor : denominator;
  }
  static of(value) {
    if (value instanceof Rational) return value;
    if (typeof value === 'bigint') return new Rational(value);
    return Rational.fromDouble(value);
  }
  /** The exact value of a finite double, from its IEEE-754 bits. */
  static fromDouble(value) {
    if (!Number.isFinite(value)) throw new Error(`not a finite double: ${value}`);
    const view = new DataView(new ArrayBuffer(8));
    view.setFloat64(0, value);
    const bits = view.getBigUint64(0);
    const negative = bits >> 63n === 1n;
    const exponentBits = Number((bits >> 52n) & 0x7ffn);
    let mantissa = bits & ((1n << 52n) - 1n);
    let exponent;
    if (exponentBits === 0) exponent = -1074;
    else {
      mantissa |= 1n << 52n;
      exponent = exponentBits - 1075;
    }
    if (negative) mantissa = -mantissa;
    return exponent >= 0 ? new Rational(mantissa << BigInt(exponent)) : new Rational(mantissa, 1n << BigInt(-exponent));
  }
  add(other) {
    const o = Rational.of(other);
    if (this.d === o.d) return new Rational(this.n + o.n, this.d);
    return new Rational(this.n * o.d + o.n * this.d, this.d * o.d);
  }
  sub(other) {
    const o = Rational.of(other);
    return this.add(new Rational(-o.n, o.d));
  }
  mul(other) {
    const o = Rational.of(other);
    return new Rational(this.n * o.n, this.d * o.d);
  }
  div(other) {
    const o = Rational.of(other);
    return new Rational(this.n * o.d, this.d * o.n);
  }
  neg() {
    return new Rational(-this.n, this.d);
  }
  isZero() {
    return this.n === 0n;
  }
  sign() {
    return this.n === 0n ? 0 : this.n > 0n ? 1 : -1;
  }
  toDecimal() {
    return new Decimal(this.n.toString()).div(this.d.toString());
  }
}

const ZERO = new Rational(0n);
const ONE = new Rational(1n);
const sumOf = (values) => values.reduce((total, value) => total.add(value), ZERO);

/**
 * Solves A X = B exactly (A square, B a list of right-hand columns) by Gaussian elimination with the
 * first non-zero pivot. Returns null when A is exactly singular.
 */
function solveExact(matrix, rightColumns) {
  const size = matrix.length;
  const rows = matrix.map((row, i) => [...row, ...rightColumns.map((column) => column[i])]);
  const width = size + rightColumns.length;
  for (let k = 0; k < size; k++) {
    let pivot = k;
    while (pivot < size && rows[pivot][k].isZero()) pivot++;
    if (pivot === size) return null;
    [rows[k], rows[pivot]] = [rows[pivot], rows[k]];
    const inverse = ONE.div(rows[k][k]);
    for (let j = k; j < width; j++) rows[k][j] = rows[k][j].mul(inverse);
    for (let i = 0; i < size; i++) {
      if (i === k || rows[i][k].isZero()) continue;
      const factor = rows[i][k];
      for (let j = k; j < width; j++) rows[i][j] = rows[i][j].sub(factor.mul(rows[k][j]));
    }
  }
  return rightColumns.map((_, c) => rows.map((row) => row[size + c]));
}

function gram(columns, weights) {
  return columns.map((left) =>
    columns.map((right) => sumOf(left.map((value, i) => (weights ? weights[i].mul(value) : value).mul(right[i])))),
  );
}

function crossProduct(columns, target, weights) {
  return columns.map((column) => sumOf(column.map((value, i) => (weights ? weights[i].mul(value) : value).mul(target[i]))));
}

/**
 * Exact (weighted) least squares of `target` on `columns`, adding the columns in order and dropping one
 * that is an exact linear combination of the constant and the columns kept before it (the statistic does
 * not depend on which of two exactly dependent columns is dropped; the count kept is what matters).
 */
function exactLeastSquares(columns, target, { constant, weights = null, names = null }) {
  const n = target.length;
  const ones = Array.from({ length: n }, () => ONE);
  let kept = constant ? [ones] : [];
  const keptIndices = [];
  const droppedIndices = [];
  columns.forEach((column, index) => {
    const candidate = [...kept, column];
    const singular = solveExact(gram(candidate, weights), [candidate.map(() => ZERO)]) === null;
    if (singular) droppedIndices.push(index);
    else {
      kept = candidate;
      keptIndices.push(index);
    }
  });
  const normal = gram(kept, weights);
  const [coefficients, ...inverseColumns] = solveExact(normal, [
    crossProduct(kept, target, weights),
    ...kept.map((_, j) => kept.map((__, k) => (j === k ? ONE : ZERO))),
  ]);
  const fitted = target.map((_, i) => sumOf(kept.map((column, j) => column[i].mul(coefficients[j]))));
  const residuals = target.map((value, i) => value.sub(fitted[i]));
  const weightAt = (i) => (weights ? weights[i] : ONE);
  const residualSumOfSquares = sumOf(residuals.map((e, i) => weightAt(i).mul(e).mul(e)));
  const weightTotal = sumOf(target.map((_, i) => weightAt(i)));
  const mean = sumOf(target.map((value, i) => weightAt(i).mul(value))).div(weightTotal);
  const centredTotal = sumOf(target.map((value, i) => weightAt(i).mul(value.sub(mean)).mul(value.sub(mean))));
  const rawTotal = sumOf(target.map((value, i) => weightAt(i).mul(value).mul(value)));
  return {
    coefficients,
    inverse: inverseColumns, // symmetric, so columns are rows
    fitted,
    residuals,
    residualSumOfSquares,
    centredTotal,
    rawTotal,
    coefficientCount: kept.length,
    keptIndices,
    droppedNames: names ? droppedIndices.map((index) => names[index]) : droppedIndices,
  };
}

// ------------------------------------------------------------------ decimal helpers

const decimalString = (value) => {
  const decimal = value instanceof Rational ? value.toDecimal() : value;
  return decimal.toSignificantDigits(PRINTED_DIGITS).toString();
};

function gammaOfHalfInteger(twice) {
  // Gamma(k/2) for a positive integer k: (k/2 - 1)! for even k, (2m)! sqrt(pi) / (4^m m!) for k = 2m + 1.
  const factorial = (m) => {
    let result = new Decimal(1);
    for (let j = 2; j <= m; j++) result = result.mul(j);
    return result;
  };
  if (twice % 2 === 0) return factorial(twice / 2 - 1);
  const m = (twice - 1) / 2;
  return factorial(2 * m).mul(Decimal.acos(-1).sqrt()).div(new Decimal(4).pow(m).mul(factorial(m)));
}

const lnBetaOfHalfIntegers = (twiceA, twiceB) =>
  gammaOfHalfInteger(twiceA).mul(gammaOfHalfInteger(twiceB)).div(gammaOfHalfInteger(twiceA + twiceB)).ln();

function tolerance() {
  return new Decimal(10).pow(-(Decimal.precision - 8));
}

/** Continued fraction of the regularised incomplete beta (modified Lentz), valid for x < (a+1)/(a+b+2). */
function betaContinuedFraction(x, a, b) {
  const tiny = new Decimal(10).pow(-(Decimal.precision * 2));
  const eps = tolerance();
  const sum = a.add(b);
  const clamp = (value) => (value.abs().lt(tiny) ? tiny : value);
  let c = new Decimal(1);
  let d = clamp(new Decimal(1).sub(sum.mul(x).div(a.add(1)))).pow(-1);
  let h = d;
  for (let m = 1; m < 100000; m++) {
    const twiceM = 2 * m;
    let numerator = x.mul(m).mul(b.sub(m)).div(a.add(twiceM - 1).mul(a.add(twiceM)));
    d = clamp(numerator.mul(d).add(1)).pow(-1);
    c = clamp(numerator.div(c).add(1));
    h = h.mul(d).mul(c);
    numerator = x.mul(a.add(m)).mul(sum.add(m)).neg().div(a.add(twiceM).mul(a.add(twiceM + 1)));
    d = clamp(numerator.mul(d).add(1)).pow(-1);
    c = clamp(numerator.div(c).add(1));
    const step = d.mul(c);
    h = h.mul(step);
    if (step.sub(1).abs().lt(eps)) return h;
  }
  throw new Error('incomplete beta continued fraction did not converge');
}

/** Regularised incomplete beta I_x(a, b) and its complement, a = twiceA/2, b = twiceB/2. */
function incompleteBeta(x, twiceA, twiceB) {
  const a = new Decimal(twiceA).div(2);
  const b = new Decimal(twiceB).div(2);
  const lnBeta = lnBetaOfHalfIntegers(twiceA, twiceB);
  const front = (at, first, second) => first.mul(at.ln()).add(second.mul(new Decimal(1).sub(at).ln())).sub(lnBeta).exp();
  if (x.lt(a.add(1).div(a.add(b).add(2)))) {
    const lower = front(x, a, b).mul(betaContinuedFraction(x, a, b)).div(a);
    return { lower, upper: new Decimal(1).sub(lower) };
  }
  const complement = new Decimal(1).sub(x);
  const upper = front(complement, b, a).mul(betaContinuedFraction(complement, b, a)).div(b);
  return { lower: new Decimal(1).sub(upper), upper };
}

/** Regularised upper incomplete gamma Q(a, x), a = twiceA/2 (series below a + 1, continued fraction above). */
function upperIncompleteGamma(twiceA, x) {
  const a = new Decimal(twiceA).div(2);
  const eps = tolerance();
  const lnFront = a.mul(x.ln()).sub(x).sub(gammaOfHalfInteger(twiceA).ln());
  if (x.lt(a.add(1))) {
    let term = new Decimal(1).div(a);
    let total = term;
    for (let k = 1; k < 100000; k++) {
      term = term.mul(x).div(a.add(k));
      total = total.add(term);
      if (term.abs().lt(total.abs().mul(eps))) return new Decimal(1).sub(lnFront.exp().mul(total));
    }
    throw new Error('incomplete gamma series did not converge');
  }
  const tiny = new Decimal(10).pow(-(Decimal.precision * 2));
  const clamp = (value) => (value.abs().lt(tiny) ? tiny : value);
  let b = x.add(1).sub(a);
  let c = new Decimal(1).div(tiny);
  let d = new Decimal(1).div(b);
  let h = d;
  for (let k = 1; k < 100000; k++) {
    const numerator = a.sub(k).mul(k);
    b = b.add(2);
    d = clamp(numerator.mul(d).add(b)).pow(-1);
    c = clamp(b.add(numerator.div(c)));
    const step = d.mul(c);
    h = h.mul(step);
    if (step.sub(1).abs().lt(eps)) return lnFront.exp().mul(h);
  }
  throw new Error('incomplete gamma continued fraction did not converge');
}

const chiSquareSurvival = (statistic, df) => upperIncompleteGamma(df, statistic.div(2));
/** P(F(df1, df2) > f) = I_{df2 / (df2 + df1 f)}(df2/2, df1/2). */
const fisherSurvival = (f, df1, df2) => incompleteBeta(new Decimal(df2).div(f.mul(df1).add(df2)), df2, df1).lower;
/** P(|T_df| >= |t|) = I_{df / (df + t^2)}(df/2, 1/2). */
const studentTwoSided = (t, df) => incompleteBeta(new Decimal(df).div(t.mul(t).add(df)), df, 1).lower;

/**
 * A p-value P(s) inherits the relative error of its statistic s multiplied by the condition number
 * kappa = |s P'(s) / P(s)|. Every fixture keeps kappa <= 1e4, so that the statistic's last-bit rounding
 * (2^-53) moves the p-value by at most about 1e-12 and the 1e-10 tolerance of the test stays attainable.
 */
const MAXIMUM_P_VALUE_CONDITION = 1e4;
function requireWellConditioned(statistic, pValue, density, label) {
  const kappa = statistic.abs().mul(density).div(pValue);
  if (kappa.gt(MAXIMUM_P_VALUE_CONDITION)) throw new Error(`${label}: p-value condition number ${kappa.toPrecision(3)} is too large`);
}
const chiSquareDensity = (s, df) =>
  s.ln().mul(df / 2 - 1).sub(s.div(2)).sub(new Decimal(2).ln().mul(df / 2)).sub(gammaOfHalfInteger(df).ln()).exp();
const fisherDensity = (x, df1, df2) =>
  new Decimal(df1).ln().mul(df1 / 2)
    .add(new Decimal(df2).ln().mul(df2 / 2))
    .add(x.ln().mul(df1 / 2 - 1))
    .sub(x.mul(df1).add(df2).ln().mul((df1 + df2) / 2))
    .sub(lnBetaOfHalfIntegers(df1, df2))
    .exp();
const studentDensity = (t, df) =>
  t.mul(t).div(df).add(1).ln().mul(-(df + 1) / 2).sub(lnBetaOfHalfIntegers(df, 1).add(new Decimal(df).sqrt().ln())).exp();

/** t with P(|T_df| >= t) = 1 - level, by Newton's method on the two-sided tail. */
function studentCritical(level, df) {
  const target = new Decimal(1).sub(level);
  const density = (t) => studentDensity(t, df);
  let t = new Decimal(2);
  for (let k = 0; k < 200; k++) {
    const step = studentTwoSided(t, df).sub(target).div(density(t).mul(2));
    t = t.add(step);
    if (step.abs().lt(t.mul(tolerance()))) return t;
  }
  throw new Error('t quantile did not converge');
}

// ------------------------------------------------------------------ matrices in decimals

const toDecimalMatrix = (matrix) => matrix.map((row) => row.map((value) => value.toDecimal()));
const zeroDecimal = (size) => Array.from({ length: size }, () => Array.from({ length: size }, () => new Decimal(0)));

function multiplyDecimal(left, right) {
  return left.map((row) => right[0].map((_, k) => row.reduce((total, value, j) => total.add(value.mul(right[j][k])), new Decimal(0))));
}

const sandwichDecimal = (bread, meat) => multiplyDecimal(multiplyDecimal(bread, meat), bread);

function addOuter(meat, left, right, factor) {
  for (let j = 0; j < left.length; j++) for (let k = 0; k < right.length; k++) meat[j][k] = meat[j][k].add(left[j].mul(right[k]).mul(factor));
}

const quadraticForm = (vector, matrix) =>
  vector.reduce((total, left, j) => total.add(vector.reduce((inner, right, k) => inner.add(left.mul(matrix[j][k]).mul(right)), new Decimal(0))), new Decimal(0));

// ------------------------------------------------------------------ the reference for one dataset

function automaticLag(n) {
  // floor(4 (n / 100)^(2/9)) (Newey & West 1994); the script refuses an n that lands within 1e-9 of an integer,
  // where a double evaluation could round across it.
  const value = new Decimal(n).div(100).pow(new Decimal(2).div(9)).mul(4);
  const lag = value.floor();
  if (value.sub(lag).lt(1e-9) || lag.add(1).sub(value).lt(1e-9)) throw new Error(`automatic lag for n = ${n} is too close to an integer`);
  return Math.min(lag.toNumber(), n - 1);
}

function checkEntry(statistic, pValue, degreesOfFreedom, denominatorDegreesOfFreedom = null) {
  const density =
    denominatorDegreesOfFreedom === null
      ? chiSquareDensity(statistic, degreesOfFreedom)
      : fisherDensity(statistic, degreesOfFreedom, denominatorDegreesOfFreedom);
  requireWellConditioned(statistic, pValue, density, 'check');
  return {
    statistic: decimalString(statistic),
    pValue: decimalString(pValue),
    degreesOfFreedom,
    denominatorDegreesOfFreedom,
  };
}

function computeReference(dataset, precision) {
  Decimal.set({ precision, rounding: Decimal.ROUND_HALF_EVEN });
  const { columns, response, predictors, intercept } = dataset;
  const n = columns[response].length;
  const y = columns[response].map(Rational.fromDouble);
  const xs = predictors.map((name) => columns[name].map(Rational.fromDouble));
  const weights = dataset.weights ? columns[dataset.weights].map(Rational.fromDouble) : null;
  const weightAt = (i) => (weights ? weights[i] : ONE);
  const ones = Array.from({ length: n }, () => ONE);
  const design = intercept ? [ones, ...xs] : xs;
  const p = design.length;
  const residualDf = n - p;

  // --- the fit, exactly
  const fit = exactLeastSquares(design, y, { constant: false, weights });
  if (fit.coefficientCount !== p) throw new Error(`${dataset.name}: design is exactly singular`);
  const b = fit.coefficients;
  const bread = fit.inverse; // C = (X'WX)^-1
  const e = fit.residuals;
  const rss = fit.residualSumOfSquares;
  const sigma2 = rss.div(residualDf);
  const total = intercept ? fit.centredTotal : fit.rawTotal;
  const rSquared = ONE.sub(rss.div(total));
  const rowOf = (i) => design.map((column) => column[i]);
  const leverage = Array.from({ length: n }, (_, i) => {
    const row = rowOf(i);
    return weightAt(i).mul(sumOf(row.map((left, j) => sumOf(row.map((right, k) => left.mul(bread[j][k]).mul(right))))));
  });

  // --- covariances (decimals from the exact pieces)
  const breadD = toDecimalMatrix(bread);
  const scores = Array.from({ length: n }, (_, i) => rowOf(i).map((value) => weightAt(i).mul(e[i]).mul(value).toDecimal()));
  const classical = toDecimalMatrix(bread.map((row) => row.map((value) => value.mul(sigma2))));
  const hcMeat = (power) => {
    const meat = zeroDecimal(p);
    scores.forEach((u, i) => addOuter(meat, u, u, new Decimal(1).div(ONE.sub(leverage[i]).toDecimal().pow(power))));
    return meat;
  };
  const hc0 = sandwichDecimal(breadD, hcMeat(0));
  const hc1 = hc0.map((row) => row.map((value) => value.mul(n).div(residualDf)));
  const hc2 = sandwichDecimal(breadD, hcMeat(1));
  const hc3 = sandwichDecimal(breadD, hcMeat(2));
  const neweyWest = (lag) => {
    const meat = hcMeat(0);
    for (let l = 1; l <= lag; l++) {
      const weight = new Decimal(1).sub(new Decimal(l).div(lag + 1));
      for (let t = l; t < n; t++) {
        addOuter(meat, scores[t], scores[t - l], weight);
        addOuter(meat, scores[t - l], scores[t], weight);
      }
    }
    return sandwichDecimal(breadD, meat);
  };
  const lagAutomatic = automaticLag(n);
  const standardErrors = (matrix) => matrix.map((row, j) => decimalString(row[j].sqrt()));
  const covariances = {
    hc0: standardErrors(hc0),
    hc1: standardErrors(hc1),
    hc2: standardErrors(hc2),
    hc3: standardErrors(hc3),
    neweyWestAutomatic: { lag: lagAutomatic, standardErrors: standardErrors(neweyWest(lagAutomatic)) },
    neweyWestLag2: { lag: 2, standardErrors: standardErrors(neweyWest(2)) },
  };
  if (dataset.groups) {
    const labels = columns[dataset.groups];
    const groupIds = [...new Set(labels)];
    const groupCount = groupIds.length;
    const sums = groupIds.map(() => Array.from({ length: p }, () => new Decimal(0)));
    labels.forEach((label, i) => {
      const target = sums[groupIds.indexOf(label)];
      scores[i].forEach((value, j) => (target[j] = target[j].add(value)));
    });
    const meat = zeroDecimal(p);
    sums.forEach((s) => addOuter(meat, s, s, new Decimal(1)));
    // CR1 factor G/(G-1) (n-1)/(n-p)
    const factor = new Decimal(groupCount).div(groupCount - 1).mul(n - 1).div(residualDf);
    covariances.cluster = {
      groupCount,
      degreesOfFreedom: groupCount - 1,
      standardErrors: standardErrors(sandwichDecimal(breadD, meat).map((row) => row.map((value) => value.mul(factor)))),
    };
  }
  const tTable = (matrix) => {
    const t = b.map((estimate, j) => estimate.toDecimal().div(matrix[j][j].sqrt()));
    const pValues = t.map((value) => studentTwoSided(value, residualDf));
    t.forEach((value, j) => requireWellConditioned(value, pValues[j], studentDensity(value, residualDf).mul(2), `${dataset.name} t-test`));
    return { tStatistics: t.map(decimalString), pValues: pValues.map(decimalString) };
  };

  // --- predictions
  const critical = studentCritical(new Decimal('0.95'), residualDf);
  const predictionsUnder = (matrix) =>
    dataset.points.map((point) => {
      const x0 = [...(intercept ? [ONE] : []), ...point.map(Rational.fromDouble)];
      const estimate = sumOf(x0.map((value, j) => value.mul(b[j]))).toDecimal();
      const meanVariance = quadraticForm(
        x0.map((value) => value.toDecimal()),
        matrix,
      );
      const ofMean = meanVariance.sqrt();
      const ofPrediction = meanVariance.add(sigma2.toDecimal()).sqrt();
      return {
        point,
        estimate: decimalString(estimate),
        standardErrorOfMean: decimalString(ofMean),
        standardErrorOfPrediction: decimalString(ofPrediction),
        confidenceInterval: [decimalString(estimate.sub(critical.mul(ofMean))), decimalString(estimate.add(critical.mul(ofMean)))],
        predictionInterval: [decimalString(estimate.sub(critical.mul(ofPrediction))), decimalString(estimate.add(critical.mul(ofPrediction)))],
      };
    });

  // --- assumption checks, exactly (statistics are rational; p-values in decimals)
  const roots = weights ? columns[dataset.weights].map((w) => exactSquareRoot(w, dataset.name)) : null;
  const whitenedResiduals = e.map((value, i) => (roots ? roots[i].mul(value) : value));
  const whitenedDesign = design.map((column) => column.map((value, i) => (roots ? roots[i].mul(value) : value)));
  const slopeColumns = intercept ? design.slice(1) : design;
  // Regressors the checks add their own constant to (model-context.ts): the slopes of an unweighted
  // intercept model; otherwise every whitened column (sqrt(w) standing in for the intercept).
  const nonConstant = intercept && !weights ? slopeColumns : whitenedDesign;
  const squares = whitenedResiduals.map((value) => value.mul(value));
  const squareTotal = sumOf(squares);
  const checks = {};

  // RESET: y on the design plus fitted^2, fitted^3 (same weights), F(q, n - p - q).
  {
    const powers = [2, 3].map((power) => fit.fitted.map((value) => (power === 2 ? value.mul(value) : value.mul(value).mul(value))));
    const augmented = exactLeastSquares([...slopeColumns, ...powers], y, { constant: intercept, weights });
    const q = augmented.coefficientCount - p;
    const denominatorDf = n - p - q;
    const statistic = rss.sub(augmented.residualSumOfSquares).div(q).div(augmented.residualSumOfSquares.div(denominatorDf));
    checks.reset = checkEntry(statistic.toDecimal(), fisherSurvival(statistic.toDecimal(), q, denominatorDf), q, denominatorDf);
  }
  // Breusch-Pagan: squared whitened residuals on a constant and the non-constant regressors.
  {
    const auxiliary = exactLeastSquares(nonConstant, squares, { constant: true });
    const df = auxiliary.coefficientCount - 1;
    const explained = auxiliary.centredTotal.sub(auxiliary.residualSumOfSquares);
    const studentised = explained.mul(n).div(auxiliary.centredTotal);
    checks.breuschPaganStudentised = checkEntry(studentised.toDecimal(), chiSquareSurvival(studentised.toDecimal(), df), df);
    // original: g = e^2 / (sum e^2 / n), LM = ESS(g) / 2 = ESS(e^2) n^2 / (sum e^2)^2 / 2
    const original = explained.mul(n * n).div(squareTotal.mul(squareTotal)).div(2);
    checks.breuschPaganOriginal = checkEntry(original.toDecimal(), chiSquareSurvival(original.toDecimal(), df), df);
  }
  // White: squares and pairwise cross-products of the same regressors, exactly dependent columns dropped.
  if (dataset.whiteExcluded) {
    checks.white = { excluded: dataset.whiteExcluded };
  } else {
    const products = [];
    for (let j = 0; j < nonConstant.length; j++)
      for (let k = j; k < nonConstant.length; k++) products.push(nonConstant[j].map((value, i) => value.mul(nonConstant[k][i])));
    const count = nonConstant.length + products.length + 1;
    if (n <= count) {
      checks.white = {
        notDefined: `the auxiliary regression has ${count} coefficients and only ${n} observations`,
      };
    } else {
      const auxiliary = exactLeastSquares([...nonConstant, ...products], squares, { constant: true });
      const df = auxiliary.coefficientCount - 1;
      const statistic = auxiliary.centredTotal.sub(auxiliary.residualSumOfSquares).mul(n).div(auxiliary.centredTotal);
      checks.white = { ...checkEntry(statistic.toDecimal(), chiSquareSurvival(statistic.toDecimal(), df), df), droppedColumns: auxiliary.droppedNames.length };
    }
  }
  // Durbin-Watson statistic only (the engine's p-value is a beta approximation, not an exact value).
  {
    let numerator = ZERO;
    for (let t = 1; t < n; t++) {
      const difference = whitenedResiduals[t].sub(whitenedResiduals[t - 1]);
      numerator = numerator.add(difference.mul(difference));
    }
    checks.durbinWatson = { statistic: decimalString(numerator.div(squareTotal)) };
  }
  // Breusch-Godfrey, lag 1, zero-filled: whitened residuals on the model's regressors and e_{t-1}.
  {
    const lagged = whitenedResiduals.map((_, t) => (t === 0 ? ZERO : whitenedResiduals[t - 1]));
    const regressors = intercept && !weights ? slopeColumns : whitenedDesign;
    const auxiliary = exactLeastSquares([...regressors, lagged], whitenedResiduals, { constant: intercept && !weights });
    const explained = squareTotal.sub(auxiliary.residualSumOfSquares);
    const lm = explained.mul(n).div(squareTotal);
    checks.breuschGodfreyLm = checkEntry(lm.toDecimal(), chiSquareSurvival(lm.toDecimal(), 1), 1);
    const denominatorDf = n - auxiliary.coefficientCount;
    const f = explained.div(auxiliary.residualSumOfSquares.div(denominatorDf));
    checks.breuschGodfreyF = checkEntry(f.toDecimal(), fisherSurvival(f.toDecimal(), 1, denominatorDf), 1, denominatorDf);
  }
  // Jarque-Bera with moment skewness and raw kurtosis of the whitened residuals (mean removed).
  {
    const mean = sumOf(whitenedResiduals).div(n);
    const deviations = whitenedResiduals.map((value) => value.sub(mean));
    const moment = (k) =>
      sumOf(
        deviations.map((value) => {
          let power = value;
          for (let j = 1; j < k; j++) power = power.mul(value);
          return power;
        }),
      ).div(n);
    const [m2, m3, m4] = [moment(2), moment(3), moment(4)];
    const skewSquared = m3.mul(m3).div(m2.mul(m2).mul(m2));
    const excess = m4.div(m2.mul(m2)).sub(3);
    const statistic = skewSquared.add(excess.mul(excess).div(4)).mul(n).div(6);
    checks.jarqueBera = checkEntry(statistic.toDecimal(), chiSquareSurvival(statistic.toDecimal(), 2), 2);
  }
  // VIF_j = 1 / (1 - R^2_j): x_j on the other predictors and a constant, with the fit's weights.
  const varianceInflation =
    xs.length < 2
      ? null
      : xs.map((column, j) => {
          const auxiliary = exactLeastSquares(
            xs.filter((_, k) => k !== j),
            column,
            { constant: true, weights },
          );
          return { term: predictors[j], value: decimalString(auxiliary.centredTotal.div(auxiliary.residualSumOfSquares)) };
        });

  return {
    coefficientCount: p,
    residualDegreesOfFreedom: residualDf,
    coefficients: b.map(decimalString),
    classicalStandardErrors: standardErrors(classical),
    residualSumOfSquares: decimalString(rss),
    residualVariance: decimalString(sigma2),
    rSquared: decimalString(rSquared),
    rSquaredDefinition: intercept ? 'centred' : 'uncentred',
    classicalInference: tTable(classical),
    hc3Inference: tTable(hc3),
    standardErrors: covariances,
    predictions: {
      studentCritical: decimalString(critical),
      classical: predictionsUnder(classical),
      hc3: predictionsUnder(hc3),
    },
    checks,
    varianceInflation,
  };
}

/** sqrt(w) as an exact rational; the weighted dataset uses squares of dyadic numbers so that it exists. */
function exactSquareRoot(weight, name) {
  const root = Math.sqrt(weight);
  if (root * root !== weight || !Rational.fromDouble(root).mul(Rational.fromDouble(root)).sub(Rational.fromDouble(weight)).isZero()) {
    throw new Error(`${name}: weight ${weight} is not the square of a double`);
  }
  return Rational.fromDouble(root);
}

// ------------------------------------------------------------------ the invented datasets

const range = (n) => Array.from({ length: n }, (_, i) => i);

function offsetSeries(name, offset, seed) {
  const random = splitmix64(seed);
  const n = 40;
  const x = range(n).map((i) => offset + (i * 0.37 + 0.05 * random.uniform()));
  // Heteroskedastic noise: its standard deviation grows from 0.3 to 0.9 along the series.
  const y = range(n).map((i) => 120 + 0.75 * (x[i] - offset) + 0.3 * (1 + (2 * i) / n) * random.normal());
  return {
    name,
    description: `Invented synthetic series: x = ${offset} + 0.37 i + a small uniform jitter, y = 120 + 0.75 (x - ${offset}) + heteroskedastic noise.`,
    columns: { y, x },
    response: 'y',
    predictors: ['x'],
    intercept: true,
    points: [[offset + 7.3], [offset + 25.5]],
  };
}

function epochSeries(name, start, step, slope, seed) {
  const random = splitmix64(seed);
  const n = 48;
  const x = range(n).map((i) => start + step * i);
  const y = range(n).map((i) => 25 + slope * (x[i] - start) + 0.4 * random.normal());
  return {
    name,
    description: `Invented synthetic series: timestamps x = ${start} + ${step} i, y = 25 + ${slope} (x - ${start}) + noise.`,
    columns: { y, x },
    response: 'y',
    predictors: ['x'],
    intercept: true,
    points: [[start + step * 20.5], [start + step * 60]],
  };
}

function priceLevel(intercept) {
  const random = splitmix64(0x5eed0003);
  const n = 56;
  const level = [];
  const other = [];
  const rate = [];
  let walk = 1e5;
  let second = 2e4;
  for (let i = 0; i < n; i++) {
    walk *= 1 + 1e-4 * random.normal();
    second *= 1 + 1e-4 * random.normal();
    other.push(second);
    rate.push(0.0325 + 0.0004 * random.normal());
    level.push(0.5 * walk + 2.5 * second + 4000 * (rate[i] - 0.0325));
  }
  return {
    name: intercept ? 'price-level' : 'price-level-no-intercept',
    description:
      'Invented synthetic series: a price level near 1e5 moving in steps of about 0.01 %, regressed on a second level near 2e4 and a small rate near 0.0325' +
      (intercept ? '.' : '; fitted without an intercept.'),
    columns: { price: level, reference_level: other, rate },
    response: 'price',
    predictors: ['reference_level', 'rate'],
    intercept,
    points: [
      [other[20], 0.0331],
      [2.05e4, 0.036],
    ],
  };
}

function polynomialFive() {
  const random = splitmix64(0x5eed0004);
  const n = 50;
  const x = range(n).map((i) => 1 + (i + 0.5 * random.uniform()) / n);
  // Powers by repeated multiplication in doubles: x2 = x*x, x3 = x2*x, x4 = x3*x, x5 = x4*x.
  const powers = (value) => {
    const x2 = value * value;
    const x3 = x2 * value;
    const x4 = x3 * value;
    return [value, x2, x3, x4, x4 * value];
  };
  const rows = x.map(powers);
  const y = rows.map(([x1, x2, x3, x4, x5]) => 1 + 0.5 * x1 - 0.3 * x2 + 0.2 * x3 - 0.05 * x4 + 0.004 * x5 + 0.01 * random.normal());
  const names = ['x', 'x2', 'x3', 'x4', 'x5'];
  const columns = { y };
  names.forEach((name, j) => (columns[name] = rows.map((row) => row[j])));
  return {
    name: 'polynomial-5',
    description:
      'Invented synthetic series: x on [1, 2], design columns x, x^2, ..., x^5 formed in doubles by repeated multiplication (x2 = x*x, x3 = x2*x, x4 = x3*x, x5 = x4*x), y a noisy quintic.',
    columns,
    response: 'y',
    predictors: names,
    intercept: true,
    points: [powers(1.5), powers(2.25)],
    whiteExcluded:
      'The squares and cross-products of x..x^5 repeat powers up to x^10 several times; as doubles some of these columns are exactly equal (x*x2 = x3) and others differ only by rounding (x2*x2 versus x3*x), so the auxiliary regression is exactly rank-deficient in a way that depends on rounding. No engine-independent exact value exists.',
  };
}

function longley() {
  const source = JSON.parse(readFileSync(LONGLEY_SOURCE, 'utf8'));
  const { data } = source;
  const columns = { y: data.y };
  const predictors = data.predictors;
  predictors.forEach((name) => (columns[name] = data[name]));
  const middle = predictors.map((name) => columns[name][7] * 1.01);
  const beyond = predictors.map((name) => columns[name][15] * 1.05);
  return {
    name: 'longley',
    description: 'NIST StRD Longley data (NIST Statistical Reference Datasets, linear least squares regression, Longley.dat; public domain).',
    source: source.source,
    columns,
    response: 'y',
    predictors,
    intercept: true,
    points: [middle, beyond],
  };
}

function weighted() {
  const random = splitmix64(0x5eed0006);
  const n = 44;
  // Weights are squares of multiples of 1/4, so sqrt(w) is an exact double and the whitened checks stay rational.
  const weight = range(n).map(() => (random.integer(2, 12) / 4) ** 2);
  const volume = range(n).map(() => 50 + 30 * random.uniform());
  const spread = range(n).map(() => 1.5 + random.uniform());
  const y = range(n).map((i) => 8 + 0.42 * volume[i] - 3.1 * spread[i] + (0.8 / Math.sqrt(weight[i])) * random.normal());
  return {
    name: 'weighted',
    description: 'Invented synthetic series: a weighted fit (weights (k/4)^2, k = 2..12) of a response on two predictors, noise standard deviation proportional to 1/sqrt(w).',
    columns: { y, volume, spread, weight },
    response: 'y',
    predictors: ['volume', 'spread'],
    intercept: true,
    weights: 'weight',
    points: [
      [62.5, 2.1],
      [95, 3.2],
    ],
  };
}

function clustered() {
  const random = splitmix64(0x5eed0007);
  const n = 42;
  const groupCount = 7;
  const effects = range(groupCount).map(() => 0.6 * random.normal());
  const group = range(n).map((i) => 101 + (i % groupCount));
  const amount = range(n).map(() => 10 + 5 * random.uniform());
  // A 0/1 indicator: its square equals itself, so the White regression drops one exactly dependent column.
  const flag = range(n).map(() => (random.uniform() < 0.4 ? 1 : 0));
  const y = range(n).map((i) => 3 + 0.9 * amount[i] + 1.7 * flag[i] + effects[group[i] - 101] + 0.5 * random.normal());
  return {
    name: 'clustered',
    description: 'Invented synthetic series: a response on an amount and a 0/1 flag, observations in 7 groups (labels 101..107) sharing a group effect.',
    columns: { y, amount, flag, group },
    response: 'y',
    predictors: ['amount', 'flag'],
    intercept: true,
    groups: 'group',
    points: [
      [12.5, 1],
      [21, 0],
    ],
  };
}

const DATASETS = [
  () => offsetSeries('offset-1e4', 1e4, 0x5eed0001),
  () => offsetSeries('offset-1e8', 1e8, 0x5eed0011),
  () => offsetSeries('offset-1e12', 1e12, 0x5eed0021),
  () => epochSeries('epoch-seconds', 1.7e9, 60, 0.002, 0x5eed0002),
  () => epochSeries('epoch-milliseconds', 1.7e12, 100, -0.0003, 0x5eed0012),
  () => priceLevel(true),
  () => priceLevel(false),
  polynomialFive,
  longley,
  weighted,
  clustered,
];

// ------------------------------------------------------------------ main

for (const build of DATASETS) {
  const dataset = build();
  const [first, ...others] = PRECISIONS.map((precision) => JSON.stringify(computeReference(dataset, precision)));
  if (others.some((other) => other !== first)) {
    throw new Error(`${dataset.name}: the ${PRINTED_DIGITS}-digit reference changes with the working precision`);
  }
  const { whiteExcluded, ...rest } = dataset;
  const fixture = {
    generatedBy: 'generate-exact-references.mjs (exact rational reference; regenerate, do not edit)',
    ...rest,
    source: dataset.source ?? 'invented synthetic series from the seeded splitmix64 generator in generate-exact-references.mjs',
    observationCount: dataset.columns[dataset.response].length,
    reference: JSON.parse(first),
  };
  writeFileSync(join(HERE, `${dataset.name}.json`), JSON.stringify(fixture, null, 1) + '\n');
  console.log(`${dataset.name}: written`);
}
