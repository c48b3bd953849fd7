import { describe, expect, it } from 'vitest';
import { normalQuantile, normalQuantilePoints } from '@/features/playground/model/normal-quantile';

// Source: NIST/SEMATECH e-Handbook of Statistical Methods, section 1.3.6.7.1, "Cumulative Distribution
// Function of the Standard Normal Distribution": the printed area under the standard normal curve
// from 0 to z, to five decimals. So Φ(z) = 0.5 + area, and Φ⁻¹(0.5 + area) must give z back.
// Tolerance: the table rounds the area to ±0.000005, which moves the quantile by at most
// 0.000005 / φ(z) (φ the normal density); a small allowance is added for the approximation itself.
const tableRows: Array<{ z: number; area: number }> = [
  { z: 0.5, area: 0.19146 },
  { z: 1.0, area: 0.34134 },
  { z: 1.64, area: 0.4495 },
  { z: 1.96, area: 0.475 },
  { z: 2.33, area: 0.4901 },
  { z: 2.5, area: 0.49379 },
  { z: 3.0, area: 0.49865 },
];

function density(z: number): number {
  return Math.exp((-z * z) / 2) / Math.sqrt(2 * Math.PI);
}

describe('normalQuantile', () => {
  it.each(tableRows)('returns z = $z for the tabled upper area 0.5 + $area', ({ z, area }) => {
    const tolerance = 0.000005 / density(z) + 1e-8;
    expect(Math.abs(normalQuantile(0.5 + area) - z)).toBeLessThanOrEqual(tolerance);
  });

  it.each(tableRows)('returns −$z for the lower tail 0.5 − $area (the table is symmetric)', ({ z, area }) => {
    const tolerance = 0.000005 / density(z) + 1e-8;
    expect(Math.abs(normalQuantile(0.5 - area) + z)).toBeLessThanOrEqual(tolerance);
  });

  it('gives the median at one half', () => {
    expect(Math.abs(normalQuantile(0.5))).toBeLessThan(1e-12);
  });

  it('refuses probabilities outside the open unit interval', () => {
    expect(() => normalQuantile(0)).toThrow(RangeError);
    expect(() => normalQuantile(1)).toThrow(RangeError);
    expect(() => normalQuantile(Number.NaN)).toThrow(RangeError);
  });
});

describe('normalQuantilePoints', () => {
  it('pairs the sorted sample with Blom plotting positions and drops missing values', () => {
    const points = normalQuantilePoints([0.4, null, -1.2, 2.5]);
    expect(points.map((point) => point.sample)).toEqual([-1.2, 0.4, 2.5]);
    // Blom positions for n = 3: (i − 0.375) / 3.25 → 0.19231, 0.5, 0.80769; the middle one is the median.
    expect(Math.abs(points[1]!.theoretical)).toBeLessThan(1e-12);
    expect(points[0]!.theoretical).toBeCloseTo(-points[2]!.theoretical, 12);
    expect(points[0]!.theoretical).toBeLessThan(0);
  });
});
