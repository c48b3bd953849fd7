import { chiSquareSurvival } from '../distributions';
import { breuschGodfreyTest } from './breusch-godfrey';
import { seededSource } from './seeded-series';
import { fittedModel, ones, normalEquationsFit } from './test-support';

// Invented scenario: weekly payment volume against a promotion index, synthetic seeded data.
function volumeSeries(seed: number, n: number, rho: number) {
  const source = seededSource(seed);
  const promotion: number[] = [];
  const volume: number[] = [];
  let noise = 0;
  for (let t = 0; t < n; t++) {
    noise = rho * noise + source.normal();
    const x = source.uniform() * 10;
    promotion.push(x);
    volume.push(3 + 0.7 * x + noise);
  }
  return { promotion, volume };
}

describe('Breusch-Godfrey test (Breusch 1978; Godfrey 1978)', () => {
  it('equals n R^2 of e_t on X and zero-filled lagged residuals, recomputed by direct OLS (lag 2)', () => {
    const { promotion, volume } = volumeSeries(4, 40, 0.3);
    const result = breuschGodfreyTest(fittedModel({ promotion }, volume), 0.05, 2);
    const base = normalEquationsFit([ones(40), promotion], volume);
    const e = base.residuals;
    const lag1 = e.map((_, t) => (t >= 1 ? e[t - 1]! : 0));
    const lag2 = e.map((_, t) => (t >= 2 ? e[t - 2]! : 0));
    const auxiliary = normalEquationsFit([ones(40), promotion, lag1, lag2], e);
    const total = e.reduce((sum, v) => sum + v * v, 0);
    const expected = 40 * (1 - auxiliary.rss / total);
    expect(result.statistic).toBeCloseTo(expected, 8);
    expect(result.degreesOfFreedom).toBe(2);
    expect(result.pValue).toBeCloseTo(chiSquareSurvival(expected, 2), 10);
    const f = breuschGodfreyTest(fittedModel({ promotion }, volume), 0.05, 2, 'f');
    expect(f.statistic).toBeCloseTo((total - auxiliary.rss) / 2 / (auxiliary.rss / (40 - 2 - 2)), 8);
    expect(f.denominatorDegreesOfFreedom).toBe(36);
  });

  it('flags AR(1) errors with rho = 0.5 (n = 100) in at least 90% of 100 seeded runs', () => {
    let flags = 0;
    for (let run = 0; run < 100; run++) {
      const { promotion, volume } = volumeSeries(700 + run, 100, 0.5);
      if (breuschGodfreyTest(fittedModel({ promotion }, volume), 0.05, 1).flagged) flags++;
    }
    expect(flags).toBeGreaterThanOrEqual(90);
  });

  it('rejects a lag the sample cannot support, naming the field', () => {
    const { promotion, volume } = volumeSeries(5, 10, 0);
    expect(() => breuschGodfreyTest(fittedModel({ promotion }, volume), 0.05, 8)).toThrow(
      expect.objectContaining({ code: 'invalid-argument', reason: 'lag-too-large', field: 'diagnosticOptions.breuschGodfreyLag' }),
    );
    expect(() => breuschGodfreyTest(fittedModel({ promotion }, volume), 0.05, 0)).toThrow(
      expect.objectContaining({ reason: 'invalid-lag' }),
    );
  });
});
