import { mean, sampleStandardDeviation, min, max } from 'simple-statistics';
import { summariseNumeric } from './column-summary';

describe('summariseNumeric', () => {
  it('agrees with simple-statistics (an npm reference library) on invented settlement amounts', () => {
    const present = [12.5, 40.25, 7.75, 99.5, 61, 3.125];
    const summary = summariseNumeric(Float64Array.from([...present, Number.NaN]));
    expect(summary.count).toBe(6);
    expect(summary.missing).toBe(1);
    expect(summary.mean).toBeCloseTo(mean(present), 12);
    expect(summary.standardDeviation).toBeCloseTo(sampleStandardDeviation(present), 12);
    expect(summary.min).toBe(min(present));
    expect(summary.max).toBe(max(present));
  });

  it('keeps the standard deviation exact under a large offset (values 1e9 + 1, 2, 3: sd = 1)', () => {
    const summary = summariseNumeric(Float64Array.from([1e9 + 1, 1e9 + 2, 1e9 + 3]));
    expect(summary.standardDeviation).toBe(1);
  });

  it('reports nulls, not NaN, for an all-missing column', () => {
    expect(summariseNumeric(Float64Array.from([Number.NaN]))).toEqual({
      count: 0, missing: 1, mean: null, standardDeviation: null, min: null, max: null,
    });
  });
});
