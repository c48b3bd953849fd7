import * as fs from 'fs';
import * as path from 'path';
import { jStat } from 'jstat';
import {
  chiSquareCdf,
  chiSquareInverseSurvival,
  chiSquareQuantile,
  chiSquareSurvival,
  fisherFCdf,
  fisherFInverseSurvival,
  fisherFQuantile,
  fisherFSurvival,
  normalCdf,
  normalInverseSurvival,
  normalQuantile,
  normalSurvival,
  studentTCdf,
  studentTInverseSurvival,
  studentTQuantile,
  studentTSurvival,
  studentTTwoSidedPValue,
} from './distributions';

/**
 * Reference values: __fixtures__/distributions/reference.json, computed in 50-digit arithmetic with
 * mpmath 1.3.0 by __fixtures__/distributions/generate-reference.py (an independent arbitrary-precision
 * implementation; inputs are the same binary doubles the tests pass).
 */
interface Reference {
  source: string;
  studentTSurvival: { t: number; df: number; value: string }[];
  fisherFSurvival: { x: number; df1: number; df2: number; value: string }[];
  chiSquareSurvival: { x: number; df: number; value: string }[];
  normalSurvival: { z: number; value: string }[];
  studentTInverseSurvival: { q: number; df: number; value: string }[];
  fisherFInverseSurvival: { q: number; df1: number; df2: number; value: string }[];
  chiSquareInverseSurvival: { q: number; df: number; value: string }[];
  normalInverseSurvival: { q: number; value: string }[];
}

const reference = JSON.parse(
  fs.readFileSync(path.join(__dirname, '__fixtures__', 'distributions', 'reference.json'), 'utf8'),
) as Reference;

const relativeError = (computed: number, expected: number) => Math.abs(computed - expected) / Math.abs(expected);

describe('distribution functions against 50-digit reference values (mpmath 1.3.0)', () => {
  // Tolerance 1e-12 relative: the engine's aim is 1e-10 for quantiles and p-values.
  const TOLERANCE = 1e-12;

  it('Student t survival, including tails down to 1e-300', () => {
    for (const row of reference.studentTSurvival) {
      expect(relativeError(studentTSurvival(row.t, row.df), Number(row.value))).toBeLessThan(TOLERANCE);
    }
  });

  it('Fisher F survival', () => {
    for (const row of reference.fisherFSurvival) {
      expect(relativeError(fisherFSurvival(row.x, row.df1, row.df2), Number(row.value))).toBeLessThan(TOLERANCE);
    }
  });

  it('chi-square survival', () => {
    for (const row of reference.chiSquareSurvival) {
      expect(relativeError(chiSquareSurvival(row.x, row.df), Number(row.value))).toBeLessThan(TOLERANCE);
    }
  });

  it('standard normal survival, down to 5.7e-300 at z = 37', () => {
    for (const row of reference.normalSurvival) {
      expect(relativeError(normalSurvival(row.z), Number(row.value))).toBeLessThan(TOLERANCE);
    }
  });

  it('inverse survival functions (quantiles) for tail probabilities from 0.9 to 1e-300', () => {
    for (const row of reference.studentTInverseSurvival) {
      expect(relativeError(studentTInverseSurvival(row.q, row.df), Number(row.value))).toBeLessThan(TOLERANCE);
    }
    for (const row of reference.fisherFInverseSurvival) {
      expect(relativeError(fisherFInverseSurvival(row.q, row.df1, row.df2), Number(row.value))).toBeLessThan(TOLERANCE);
    }
    for (const row of reference.chiSquareInverseSurvival) {
      expect(relativeError(chiSquareInverseSurvival(row.q, row.df), Number(row.value))).toBeLessThan(TOLERANCE);
    }
    for (const row of reference.normalInverseSurvival) {
      expect(relativeError(normalInverseSurvival(row.q), Number(row.value))).toBeLessThan(TOLERANCE);
    }
  });
});

describe('distribution functions against closed forms (exact identities)', () => {
  const TOLERANCE = 1e-13;

  it('t with 1 degree of freedom (Cauchy): P(T > t) = atan(1/t) / pi, quantile -cot(pi p)', () => {
    for (const t of [0.3, 1, 4, 1e3, 1e10, 1e100, 1e250]) {
      expect(relativeError(studentTSurvival(t, 1), Math.atan(1 / t) / Math.PI)).toBeLessThan(TOLERANCE);
    }
    for (const p of [0.01, 0.2, 1e-10, 1e-300]) {
      expect(relativeError(studentTQuantile(p, 1), -1 / Math.tan(Math.PI * p))).toBeLessThan(TOLERANCE);
    }
  });

  it('t with 2 degrees of freedom: P(T > t) = 1 / (s (s + t)), s = sqrt(2 + t^2); quantile (2p - 1) / sqrt(2p(1 - p))', () => {
    for (const t of [0.5, 2, 10, 1e3, 1e10, 1e150]) {
      const s = Math.sqrt(2 + t * t);
      expect(relativeError(studentTSurvival(t, 2), 1 / (s * (s + t)))).toBeLessThan(TOLERANCE);
    }
    for (const p of [0.975, 0.995, 0.9995, 0.3, 1e-300]) {
      expect(relativeError(studentTQuantile(p, 2), (2 * p - 1) / Math.sqrt(2 * p * (1 - p)))).toBeLessThan(TOLERANCE);
    }
  });

  it('F(2, d): P(F > x) = (1 + 2x/d)^(-d/2), inverse d/2 (q^(-2/d) - 1)', () => {
    for (const x of [0.1, 1, 10, 100, 1000, 1e5]) {
      expect(relativeError(fisherFSurvival(x, 2, 10), Math.pow(1 + x / 5, -5))).toBeLessThan(TOLERANCE);
    }
    for (const q of [0.05, 1e-10, 1e-300]) {
      expect(relativeError(fisherFInverseSurvival(q, 2, 10), 5 * (Math.pow(q, -0.2) - 1))).toBeLessThan(TOLERANCE);
    }
  });

  it('chi-square(2): P(X > x) = exp(-x/2), inverse -2 ln q', () => {
    for (const x of [1, 10, 100, 600, 1380]) {
      expect(relativeError(chiSquareSurvival(x, 2), Math.exp(-x / 2))).toBeLessThan(TOLERANCE);
    }
    for (const q of [0.5, 1e-5, 1e-300]) {
      expect(relativeError(chiSquareInverseSurvival(q, 2), -2 * Math.log(q))).toBeLessThan(TOLERANCE);
    }
  });

  it('cdf and survival are complementary and quantiles invert the cdf', () => {
    for (const p of [0.001, 0.05, 0.5, 0.9, 0.999]) {
      expect(relativeError(studentTCdf(studentTQuantile(p, 7), 7), p)).toBeLessThan(TOLERANCE);
      expect(relativeError(fisherFCdf(fisherFQuantile(p, 4, 17), 4, 17), p)).toBeLessThan(TOLERANCE);
      expect(relativeError(chiSquareCdf(chiSquareQuantile(p, 9), 9), p)).toBeLessThan(TOLERANCE);
      expect(relativeError(normalCdf(normalQuantile(p)), p)).toBeLessThan(TOLERANCE);
    }
    expect(studentTTwoSidedPValue(-2.5, 12)).toBeCloseTo(2 * studentTSurvival(2.5, 12), 15);
  });
});

describe('distribution functions against printed statistical tables', () => {
  // Abramowitz & Stegun (1964), Handbook of Mathematical Functions: Table 26.10 (t), 26.9 (F),
  // 26.8 (chi-square), 26.1 (normal). Printed values as quoted in standard tables (value from memory);
  // compared to half a unit in the last printed digit.
  const cases: [string, number, number, number][] = [
    ['t 0.975, df 10', studentTQuantile(0.975, 10), 2.228, 3],
    ['t 0.975, df 30', studentTQuantile(0.975, 30), 2.042, 3],
    ['t 0.995, df 5', studentTQuantile(0.995, 5), 4.032, 3],
    ['F 0.95, (3, 20)', fisherFQuantile(0.95, 3, 20), 3.1, 2],
    ['F 0.99, (5, 10)', fisherFQuantile(0.99, 5, 10), 5.64, 2],
    ['chi-square 0.95, df 10', chiSquareQuantile(0.95, 10), 18.307, 3],
    ['chi-square 0.99, df 5', chiSquareQuantile(0.99, 5), 15.086, 3],
    ['normal 0.975', normalQuantile(0.975), 1.96, 2],
    ['normal 0.995', normalQuantile(0.995), 2.576, 3],
  ];
  it.each(cases)('%s', (_label, computed, printed, decimals) => {
    expect(Math.abs(computed - printed)).toBeLessThanOrEqual(0.5 * Math.pow(10, -decimals) + 1e-12);
  });
});

describe('jStat accuracy (why the engine computes its own tails)', () => {
  it('agrees with jStat to 1e-6 in the centre, where jStat only seeds the quantile search', () => {
    for (const [t, df] of [
      [1.5, 5],
      [2.2, 30],
      [0.4, 100],
    ] as const) {
      expect(relativeError(studentTCdf(t, df), jStat.studentt.cdf(t, df))).toBeLessThan(1e-6);
    }
    expect(relativeError(fisherFQuantile(0.95, 3, 20), jStat.centralF.inv(0.95, 3, 20))).toBeLessThan(1e-6);
  });

  it('reports jStat\'s relative error against the reference values (printed)', () => {
    const rows: string[] = [];
    let worstEngine = 0;
    let worstJStat = 0;
    for (const row of reference.studentTSurvival) {
      const expected = Number(row.value);
      const engine = relativeError(studentTSurvival(row.t, row.df), expected);
      const viaJStat = relativeError(1 - jStat.studentt.cdf(row.t, row.df), expected);
      worstEngine = Math.max(worstEngine, engine);
      worstJStat = Math.max(worstJStat, Number.isFinite(viaJStat) ? viaJStat : 1);
      if (viaJStat > 1e-10) rows.push(`t=${row.t} df=${row.df}: jStat ${viaJStat.toExponential(1)}, engine ${engine.toExponential(1)}`);
    }
    console.log(
      `t upper tail, worst relative error: engine ${worstEngine.toExponential(1)}, jStat (1 - cdf) ${worstJStat.toExponential(1)}\n` +
        rows.slice(0, 12).join('\n'),
    );
    expect(worstEngine).toBeLessThan(1e-12);
  });
});
