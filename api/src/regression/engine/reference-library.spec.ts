/**
 * Agreement with an npm reference library, simple-statistics 7.x (linearRegression,
 * weightedLinearRegression, rSquared, sampleCorrelation), on random data from a seeded
 * generator. simple-statistics uses centred two-pass sums, so on these well-conditioned data both
 * should agree to about 1e-12 relative; the tolerance is 1e-10.
 */
import * as ss from 'simple-statistics';
import { seededRandom } from './__fixtures__/seeded-random';
import { fitModel } from './fit-model';

const TOLERANCE = 1e-10;
const close = (a: number, b: number) => Math.abs(a - b) <= TOLERANCE * Math.max(1, Math.abs(b));

describe('agreement with simple-statistics on random data', () => {
  it.each([1, 2, 3, 4, 5])('seed %i: line, R² and correlation match', (seed) => {
    const random = seededRandom(seed);
    const n = 20 + Math.floor(random.uniform() * 500);
    const x = Array.from({ length: n }, () => 100 * random.uniform() - 30);
    const slope = 4 * random.normal();
    const y = x.map((v) => 7 + slope * v + 25 * random.normal());
    const pairs = x.map((v, i) => [v, y[i]!]);
    const reference = ss.linearRegression(pairs);
    const result = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'] });
    expect(close(result.coefficients[1]!.estimate, reference.m)).toBe(true);
    expect(close(result.coefficients[0]!.estimate, reference.b)).toBe(true);
    const r2 = ss.rSquared(pairs, ss.linearRegressionLine(reference));
    expect(close(result.rSquared, r2)).toBe(true);
    expect(close(Math.sqrt(result.rSquared), Math.abs(ss.sampleCorrelation(x, y)))).toBe(true);
  });

  it('weighted line matches weightedLinearRegression', () => {
    const random = seededRandom(99);
    const n = 300;
    const x = Array.from({ length: n }, () => 10 * random.uniform());
    const y = x.map((v) => 1.5 - 0.7 * v + random.normal());
    const w = x.map(() => 0.2 + 3 * random.uniform());
    const reference = ss.weightedLinearRegression(
      x.map((v, i) => [v, y[i]!]),
      w,
    );
    const result = fitModel({ columns: { x, y, w }, response: 'y', predictors: ['x'], weights: 'w' });
    expect(close(result.coefficients[1]!.estimate, reference.m)).toBe(true);
    expect(close(result.coefficients[0]!.estimate, reference.b)).toBe(true);
  });
});
