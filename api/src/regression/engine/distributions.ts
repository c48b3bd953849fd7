/**
 * Distribution functions used for inference: Student t, Fisher F, chi-square and the standard normal.
 * Every function takes and returns plain numbers; survival functions compute the upper tail directly,
 * so tiny p-values keep their relative accuracy down to the smallest normal double (about 1e-308)
 * instead of collapsing to 0 as 1 - cdf would.
 *
 * Probabilities come from special-functions.ts (relative accuracy about 1e-14 in both tails). jStat
 * supplies the starting point of each quantile search (its inverses are good to about 1e-7..1e-10); a
 * safeguarded Newton iteration on our own, more accurate survival function then takes the quantile to
 * full double precision (about 1e-15 relative). Why not jStat alone: see special-functions.ts and the
 * measurements in distributions.spec.ts.
 *
 * Conventions: degrees of freedom may be any positive real; invalid arguments return NaN (callers in
 * the engine validate first, so no NaN reaches a result).
 */

import { jStat } from 'jstat';
import { incompleteBetaOfRatio, incompleteGamma, logBeta, logGamma } from './special-functions';

const LOG_SQRT_TWO_PI = 0.91893853320467274178;

// ---------------------------------------------------------------- standard normal

/** P(Z > z) for a standard normal Z, from erfc(z / sqrt 2) = Q(1/2, z^2 / 2). */
export function normalSurvival(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  if (z < 0) return 1 - normalSurvival(-z);
  const half = 0.5 * z * z;
  // z^2 / 2 rounds; the rounding error (exact via Dekker's product) rescales the tail by exp(-error).
  const t = 134217729 * z;
  const zHi = t - (t - z);
  const zLo = z - zHi;
  const error = 0.5 * (zHi * zHi - z * z + 2 * zHi * zLo + zLo * zLo);
  return 0.5 * incompleteGamma(0.5, half).upper * Math.exp(-error);
}

/** P(Z <= z). */
export function normalCdf(z: number): number {
  return normalSurvival(-z);
}

export function normalDensity(z: number): number {
  return Math.exp(-0.5 * z * z - LOG_SQRT_TWO_PI);
}

/** z with P(Z <= z) = p, 0 < p < 1. */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) return p === 0 ? -Infinity : p === 1 ? Infinity : Number.NaN;
  if (p === 0.5) return 0;
  return p > 0.5 ? normalUpperQuantile(1 - p) : -normalUpperQuantile(p); // 1 - p is exact for p >= 0.5
}

/** z with P(Z > z) = q: the inverse survival function, accurate for q down to 1e-308. */
export function normalInverseSurvival(q: number): number {
  return -normalQuantile(q);
}

function normalUpperQuantile(q: number): number {
  const start = -jStatStart(() => jStat.normal.inv(q, 0, 1), -1);
  return invertUpperTail(q, start, normalSurvival, (x) => -0.5 * x * x - LOG_SQRT_TWO_PI);
}

// ---------------------------------------------------------------- Student t

export function studentTLogDensity(t: number, df: number): number {
  return -logBeta(0.5 * df, 0.5) - 0.5 * Math.log(df) - 0.5 * (df + 1) * Math.log1p((t * t) / df);
}

export function studentTDensity(t: number, df: number): number {
  return Math.exp(studentTLogDensity(t, df));
}

/** P(T > t) with df degrees of freedom: I_{df/(df+t^2)}(df/2, 1/2) / 2 for t > 0. */
export function studentTSurvival(t: number, df: number): number {
  if (Number.isNaN(t) || !(df > 0)) return Number.NaN;
  if (t === Infinity) return 0;
  if (t === -Infinity) return 1;
  if (t < 0) return 1 - studentTSurvival(-t, df);
  const square = t * t;
  if (square === Infinity) {
    // t^2 overflows: use the power-law tail through logs, x = df / (df + t^2) ~ df / t^2.
    const logX = Math.log(df) - 2 * Math.log(t);
    return 0.5 * Math.exp(0.5 * df * logX - logBeta(0.5 * df, 0.5) - Math.log(0.5 * df));
  }
  return 0.5 * incompleteBetaOfRatio(square / df, 0.5 * df, 0.5).lower;
}

export function studentTCdf(t: number, df: number): number {
  return studentTSurvival(-t, df);
}

/** Two-sided p-value P(|T| >= |t|), computed as one tail times two (never 1 - cdf). */
export function studentTTwoSidedPValue(t: number, df: number): number {
  const tail = studentTSurvival(Math.abs(t), df);
  return Math.min(1, 2 * tail);
}

/** t with P(T <= t) = p. */
export function studentTQuantile(p: number, df: number): number {
  if (!(df > 0)) return Number.NaN;
  if (!(p > 0 && p < 1)) return p === 0 ? -Infinity : p === 1 ? Infinity : Number.NaN;
  if (p === 0.5) return 0;
  return p > 0.5 ? studentTUpperQuantile(1 - p, df) : -studentTUpperQuantile(p, df);
}

/** t with P(T > t) = q: the inverse survival function, accurate for q down to 1e-308. */
export function studentTInverseSurvival(q: number, df: number): number {
  return -studentTQuantile(q, df);
}

/**
 * For many degrees of freedom the Cornish-Fisher expansion of t in powers of 1/df around the normal
 * quantile z (Abramowitz & Stegun 26.7.5; coefficients g1..g4 as printed there) is exact to double
 * precision once its last term is below 1e-17 of t; otherwise it only seeds Newton's method.
 */
function cornishFisherT(z: number, df: number): { value: number; lastTerm: number } {
  const z2 = z * z;
  const g1 = (z * (z2 + 1)) / 4;
  const g2 = (z * ((5 * z2 + 16) * z2 + 3)) / 96;
  const g3 = (z * (((3 * z2 + 19) * z2 + 17) * z2 - 15)) / 384;
  const g4 = (z * ((((79 * z2 + 776) * z2 + 1482) * z2 - 1920) * z2 - 945)) / 92160;
  const inverse = 1 / df;
  const lastTerm = g4 * inverse * inverse * inverse * inverse;
  return { value: z + inverse * (g1 + inverse * (g2 + inverse * g3)) + lastTerm, lastTerm };
}

function studentTUpperQuantile(q: number, df: number): number {
  if (df >= 1000) {
    const expansion = cornishFisherT(normalUpperQuantile(q), df);
    // The omitted next term is about z^2 / df times the last one.
    if (Math.abs(expansion.lastTerm) <= 1e-17 * expansion.value) return expansion.value;
  }
  const fallback = Math.exp((logTailConstant(df) - Math.log(q)) / df);
  const start = -jStatStart(() => jStat.studentt.inv(q, df), -fallback);
  return invertUpperTail(
    q,
    start,
    (x) => studentTSurvival(x, df),
    (x) => studentTLogDensity(x, df),
  );
}

/** ln K where P(T > t) ~ K t^-df for large t. */
function logTailConstant(df: number): number {
  return 0.5 * df * Math.log(df) - Math.log(df) - logBeta(0.5 * df, 0.5);
}

// ---------------------------------------------------------------- Fisher F

export function fisherFLogDensity(x: number, df1: number, df2: number): number {
  if (x <= 0) return -Infinity;
  const denominator = df1 * x + df2;
  return (
    0.5 * df1 * Math.log((df1 * x) / denominator) +
    0.5 * df2 * Math.log(df2 / denominator) -
    Math.log(x) -
    logBeta(0.5 * df1, 0.5 * df2)
  );
}

/** P(F > x) = I_{df2/(df2 + df1 x)}(df2/2, df1/2). */
export function fisherFSurvival(x: number, df1: number, df2: number): number {
  if (Number.isNaN(x) || !(df1 > 0 && df2 > 0)) return Number.NaN;
  if (x <= 0) return 1;
  if (x === Infinity) return 0;
  const ratio = (df1 * x) / df2;
  if (ratio === Infinity) return 0;
  return incompleteBetaOfRatio(ratio, 0.5 * df2, 0.5 * df1).lower;
}

export function fisherFCdf(x: number, df1: number, df2: number): number {
  if (Number.isNaN(x) || !(df1 > 0 && df2 > 0)) return Number.NaN;
  if (x <= 0) return 0;
  if (x === Infinity) return 1;
  const ratio = (df1 * x) / df2;
  if (ratio === Infinity) return 1;
  return incompleteBetaOfRatio(ratio, 0.5 * df2, 0.5 * df1).upper;
}

/** x with P(F <= x) = p. */
export function fisherFQuantile(p: number, df1: number, df2: number): number {
  return fisherFInvert(p, false, df1, df2);
}

/** x with P(F > x) = q: the inverse survival function, accurate for q down to 1e-308. */
export function fisherFInverseSurvival(q: number, df1: number, df2: number): number {
  return fisherFInvert(q, true, df1, df2);
}

function fisherFInvert(probability: number, upperTail: boolean, df1: number, df2: number): number {
  if (!(df1 > 0 && df2 > 0)) return Number.NaN;
  if (!(probability > 0 && probability < 1)) {
    if (probability === 0) return upperTail ? Infinity : 0;
    if (probability === 1) return upperTail ? 0 : Infinity;
    return Number.NaN;
  }
  const p = upperTail ? 1 - probability : probability;
  const start = jStatStart(() => jStat.centralF.inv(p, df1, df2), 1);
  return invertPositive(
    probability,
    upperTail,
    start,
    (x) => fisherFCdf(x, df1, df2),
    (x) => fisherFSurvival(x, df1, df2),
    (x) => fisherFLogDensity(x, df1, df2),
  );
}

// ---------------------------------------------------------------- chi-square

export function chiSquareLogDensity(x: number, df: number): number {
  if (x <= 0) return -Infinity;
  const k = 0.5 * df;
  return (k - 1) * Math.log(x) - 0.5 * x - k * Math.LN2 - logGamma(k);
}

export function chiSquareSurvival(x: number, df: number): number {
  if (Number.isNaN(x) || !(df > 0)) return Number.NaN;
  if (x <= 0) return 1;
  return incompleteGamma(0.5 * df, 0.5 * x).upper;
}

export function chiSquareCdf(x: number, df: number): number {
  if (Number.isNaN(x) || !(df > 0)) return Number.NaN;
  if (x <= 0) return 0;
  return incompleteGamma(0.5 * df, 0.5 * x).lower;
}

/** x with P(X <= x) = p. */
export function chiSquareQuantile(p: number, df: number): number {
  return chiSquareInvert(p, false, df);
}

/** x with P(X > x) = q: the inverse survival function, accurate for q down to 1e-308. */
export function chiSquareInverseSurvival(q: number, df: number): number {
  return chiSquareInvert(q, true, df);
}

function chiSquareInvert(probability: number, upperTail: boolean, df: number): number {
  if (!(df > 0)) return Number.NaN;
  if (!(probability > 0 && probability < 1)) {
    if (probability === 0) return upperTail ? Infinity : 0;
    if (probability === 1) return upperTail ? 0 : Infinity;
    return Number.NaN;
  }
  const p = upperTail ? 1 - probability : probability;
  const start = jStatStart(() => jStat.chisquare.inv(p, df), df);
  return invertPositive(
    probability,
    upperTail,
    start,
    (x) => chiSquareCdf(x, df),
    (x) => chiSquareSurvival(x, df),
    (x) => chiSquareLogDensity(x, df),
  );
}

// ---------------------------------------------------------------- root finding

function jStatStart(compute: () => number, fallback: number): number {
  try {
    const value = compute();
    return Number.isFinite(value) && value !== 0 ? value : fallback;
  } catch {
    return fallback;
  }
}

/**
 * Solves survival(x) = q for x > 0 (0 < q < 1/2 for the symmetric laws). Newton's method on
 * ln survival(x) - ln q in the variable u = ln x, where power-law and Gaussian tails are both close to
 * linear or concave, with a bracket kept so that any step leaving it becomes a bisection.
 */
function invertUpperTail(
  q: number,
  start: number,
  survival: (x: number) => number,
  logDensity: (x: number) => number,
): number {
  return solveInLog(
    start > 0 ? start : 1,
    (x) => {
      const tail = survival(x);
      return { logResidual: Math.log(tail) - Math.log(q), logSlope: logDensity(x) + Math.log(x) - Math.log(tail), sign: -1 };
    },
  );
}

/**
 * Solves cdf(x) = probability (or survival(x) = probability when `upperTail`) for x > 0, working on
 * whichever tail is the smaller probability.
 */
function invertPositive(
  probability: number,
  upperTail: boolean,
  start: number,
  cdf: (x: number) => number,
  survival: (x: number) => number,
  logDensity: (x: number) => number,
): number {
  const lowerProbability = upperTail ? 1 - probability : probability;
  const useLower = upperTail ? probability > 0.5 : probability <= 0.5;
  const target = useLower ? lowerProbability : upperTail ? probability : 1 - probability;
  return solveInLog(start > 0 ? start : 1, (x) => {
    const tail = useLower ? cdf(x) : survival(x);
    return {
      logResidual: Math.log(tail) - Math.log(target),
      logSlope: logDensity(x) + Math.log(x) - Math.log(tail),
      sign: useLower ? 1 : -1,
    };
  });
}

interface LogStep {
  /** ln tail(x) - ln target. */
  logResidual: number;
  /** ln |d ln tail / d ln x|. */
  logSlope: number;
  /** +1 when the tail grows with x, -1 when it shrinks. */
  sign: number;
}

function solveInLog(start: number, evaluate: (x: number) => LogStep): number {
  let x = start;
  let low = 0; // bracket in x
  let high = Infinity;
  for (let iteration = 0; iteration < 300; iteration++) {
    const step = evaluate(x);
    if (step.logResidual === 0) return x;
    let next = Number.NaN;
    if (!Number.isNaN(step.logResidual)) {
      // residual > 0: the tail is too large, so move x in the direction that shrinks it.
      const increase = step.logResidual * step.sign < 0;
      if (increase) low = Math.max(low, x);
      else high = Math.min(high, x);
      const delta = -step.logResidual / (Math.exp(step.logSlope) * step.sign);
      next = Math.abs(delta) < 1e-3 ? x + x * Math.expm1(delta) : x * Math.exp(delta);
      if (!(Number.isFinite(next) && next > low && next < high)) {
        next = high < Infinity && low > 0 ? Math.sqrt(low * high) : increase ? x * 16 : x / 16;
      }
    } else {
      next = high < Infinity && low > 0 ? Math.sqrt(low * high) : x / 16;
    }
    // Newton converges quadratically: after a step below 1e-8 (relative) the error left is ~1e-16.
    if (Math.abs(next - x) <= 1e-8 * x) return next;
    if (high < Infinity && low > 0 && high - low <= 4 * Number.EPSILON * high) return next;
    x = next;
  }
  return x;
}
