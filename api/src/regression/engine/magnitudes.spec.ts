/**
 * Extreme magnitudes: columns are scaled by powers of two inside the engine, so a fit of x * 2^k and
 * y * 2^m is the fit of x and y with every coefficient and standard error scaled exactly by powers of two
 * (a consistency check: power-of-two scaling is exact in binary floating point). Where a reported number
 * itself cannot be represented (a variance beyond 1e308), the engine names the column to rescale.
 */

import { analyseModel } from './analyse-model';
import { EngineError } from './errors';
import { fitModel } from './fit-model';

const n = 30;
const x = Float64Array.from({ length: n }, (_, i) => i + Math.sin(i));
const y = Float64Array.from({ length: n }, (_, i) => 2 + 0.5 * i + Math.cos(3 * i));
const scaled = (values: Float64Array, power: number) => values.map((value) => value * Math.pow(2, power));

describe('extreme magnitudes', () => {
  it.each([
    [-460, 0], // x near 1e-138: raw squares would underflow to subnormals
    [460, 0], // x near 1e138
    [0, 480], // y near 1e144
    [0, -480],
    [-200, 200], // slope near 1e120: its variance, near 1e240, is still a double
  ])('x * 2^%i and y * 2^%i give exactly power-of-two-scaled coefficients, standard errors (classical and HC3) and the same checks (consistency check)', (xPower, yPower) => {
    const base = analyseModel({ columns: { x, y }, response: 'y', predictors: ['x'], covariance: { type: 'hc3' } });
    const baseFit = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'] });
    const columns = { x: scaled(x, xPower), y: scaled(y, yPower) };
    const other = analyseModel({ columns, response: 'y', predictors: ['x'], covariance: { type: 'hc3' } });
    const otherFit = fitModel({ columns, response: 'y', predictors: ['x'] });
    const factors = [Math.pow(2, yPower), Math.pow(2, yPower - xPower)];
    const close = (a: number, b: number) => Math.abs(a - b) <= 1e-13 * Math.abs(b);
    factors.forEach((factor, j) => {
      expect(close(otherFit.coefficients[j]!.estimate, baseFit.coefficients[j]!.estimate * factor)).toBe(true);
      expect(close(otherFit.coefficients[j]!.standardError, baseFit.coefficients[j]!.standardError * factor)).toBe(true);
      expect(close(other.coefficients[j]!.standardError, base.coefficients[j]!.standardError * factor)).toBe(true);
    });
    expect(close(otherFit.rSquared, baseFit.rSquared)).toBe(true);
    const statistic = (result: typeof base, key: 'breuschPagan' | 'reset' | 'white') => {
      const entry = result.diagnostics[key];
      return entry?.status === 'computed' ? entry.statistic : NaN;
    };
    for (const key of ['breuschPagan', 'reset', 'white'] as const) expect(close(statistic(other, key), statistic(base, key))).toBe(true);
  });

  it('a predictor near 1e-160 is not taken for a zero or constant column; its slope variance (1e320) is refused by name', () => {
    const tiny = scaled(x, -532);
    const attempt = () => fitModel({ columns: { x: tiny, y }, response: 'y', predictors: ['x'] });
    expect(attempt).toThrow(EngineError);
    expect(attempt).toThrow(expect.objectContaining({ code: 'magnitude-out-of-range', column: 'x' }));
  });

  it('a response near 1e160 is not taken for a constant one; it is refused by name as out of range', () => {
    const huge = scaled(y, 532);
    const attempt = () => analyseModel({ columns: { x, y: huge }, response: 'y', predictors: ['x'] });
    expect(attempt).toThrow(expect.objectContaining({ code: 'magnitude-out-of-range', column: 'y' }));
  });
});
