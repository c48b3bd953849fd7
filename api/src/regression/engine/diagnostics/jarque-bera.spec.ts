import { jarqueBeraTest, momentShape } from './jarque-bera';
import { seededSource } from './seeded-series';
import { fittedModel } from './test-support';

describe('Jarque-Bera test (Jarque & Bera 1987) with moment skewness and kurtosis', () => {
  it('reproduces a hand computation: residual-like values -2, -1, 0, 1, 2', () => {
    // Hand-computed: m2 = 10/5 = 2, m3 = 0, m4 = 34/5 = 6.8; S = 0, K = 6.8 / 4 = 1.7.
    const shape = momentShape([-2, -1, 0, 1, 2]);
    expect(shape.skewness).toBeCloseTo(0, 14);
    expect(shape.kurtosis).toBeCloseTo(1.7, 14);
  });

  it('computes JB = n/6 (S^2 + (K-3)^2/4) and the chi-square(2) p-value exp(-JB/2)', () => {
    // Invented scenario: refund amounts against order size with a skewed error.
    const source = seededSource(31);
    const order = Array.from({ length: 50 }, () => 10 + 90 * source.uniform());
    const refund = order.map((x) => 2 + 0.1 * x + Math.exp(source.normal()));
    const model = fittedModel({ order }, refund);
    const result = jarqueBeraTest(model, 0.05);
    const e = Array.from(model.solution.residuals);
    const mean = e.reduce((s, v) => s + v, 0) / e.length;
    const moment = (k: number) => e.reduce((s, v) => s + (v - mean) ** k, 0) / e.length;
    const skewness = moment(3) / moment(2) ** 1.5;
    const kurtosis = moment(4) / moment(2) ** 2;
    const expected = (50 / 6) * (skewness ** 2 + (kurtosis - 3) ** 2 / 4);
    expect(result.statistic).toBeCloseTo(expected, 10);
    expect(result.skewness).toBeCloseTo(skewness, 12);
    // chi-square with 2 degrees of freedom has survival exp(-x/2) (closed form).
    expect(result.pValue).toBeCloseTo(Math.exp(-expected / 2), 12);
    expect(result.degreesOfFreedom).toBe(2);
  });

  it('flags log-normal errors and passes normal errors most of the time over 100 seeded runs', () => {
    let skewedFlags = 0;
    let normalFlags = 0;
    for (let run = 0; run < 100; run++) {
      const source = seededSource(2000 + run);
      const x = Array.from({ length: 200 }, () => source.uniform() * 5);
      const skewed = x.map((v) => v + Math.exp(source.normal()));
      const normal = x.map((v) => v + source.normal());
      if (jarqueBeraTest(fittedModel({ x }, skewed), 0.05).flagged) skewedFlags++;
      if (jarqueBeraTest(fittedModel({ x }, normal), 0.05).flagged) normalFlags++;
    }
    expect(skewedFlags).toBeGreaterThanOrEqual(95);
    expect(normalFlags).toBeLessThanOrEqual(12);
  });
});
