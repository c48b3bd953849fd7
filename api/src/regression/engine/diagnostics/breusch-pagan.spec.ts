import { chiSquareSurvival } from '../distributions';
import { breuschPaganTest } from './breusch-pagan';
import { seededSource } from './seeded-series';
import { fittedModel, ones, normalEquationsFit } from './test-support';

// Invented scenario: daily settlement amount against merchant count, synthetic seeded data.
function settlementData(seed: number, n: number, growingVariance: boolean) {
  const source = seededSource(seed);
  const merchants: number[] = [];
  const amount: number[] = [];
  const region: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = 1 + 19 * source.uniform();
    const sd = growingVariance ? 0.3 * x : 3;
    merchants.push(x);
    region.push(source.uniform());
    amount.push(5 + 2 * x + sd * source.normal());
  }
  return { merchants, amount, region };
}

describe('Breusch-Pagan test', () => {
  it('studentised (Koenker 1981): equals n R^2 of e^2 on the regressors, recomputed by direct OLS', () => {
    const { merchants, amount, region } = settlementData(7, 50, true);
    const model = fittedModel({ merchants, region }, amount);
    const result = breuschPaganTest(model, 0.05);
    const base = normalEquationsFit([ones(50), merchants, region], amount);
    const squares = base.residuals.map((e) => e * e);
    const auxiliary = normalEquationsFit([ones(50), merchants, region], squares);
    const expected = 50 * (1 - auxiliary.rss / auxiliary.centredTotal);
    expect(result.statistic).toBeCloseTo(expected, 8);
    expect(result.degreesOfFreedom).toBe(2);
    expect(result.variant).toBe('studentised');
    expect(result.pValue).toBeCloseTo(chiSquareSurvival(expected, 2), 10);
  });

  it('original (Breusch & Pagan 1979): equals half the explained sum of squares of e^2 / sigma2_ML', () => {
    const { merchants, amount } = settlementData(8, 40, true);
    const model = fittedModel({ merchants }, amount);
    const result = breuschPaganTest(model, 0.05, 'original');
    const base = normalEquationsFit([ones(40), merchants], amount);
    const sigma2 = base.rss / 40;
    const g = base.residuals.map((e) => (e * e) / sigma2);
    const auxiliary = normalEquationsFit([ones(40), merchants], g);
    expect(result.statistic).toBeCloseTo((auxiliary.centredTotal - auxiliary.rss) / 2, 8);
    expect(result.degreesOfFreedom).toBe(1);
  });

  it('chi-square reference: the published 5% point 3.841 of chi-square(1) gives p close to 0.05', () => {
    // chi-square(1) upper 5% point 3.841 (standard chi-square tables, e.g. NIST/SEMATECH e-Handbook 1.3.6.7.4).
    expect(chiSquareSurvival(3.841, 1)).toBeCloseTo(0.05, 3);
  });

  it('separates variance growing with x from constant variance over 200 seeded runs', () => {
    let growingFlags = 0;
    let constantFlags = 0;
    for (let run = 0; run < 200; run++) {
      const growing = settlementData(100 + run, 100, true);
      const constant = settlementData(900 + run, 100, false);
      if (breuschPaganTest(fittedModel({ merchants: growing.merchants }, growing.amount), 0.05).flagged) growingFlags++;
      if (breuschPaganTest(fittedModel({ merchants: constant.merchants }, constant.amount), 0.05).flagged) constantFlags++;
    }
    // Stated power target: at least 0.9 at n = 100 with sd proportional to x.
    expect(growingFlags / 200).toBeGreaterThanOrEqual(0.9);
    // Size 0.05: binomial(200, 0.05) count within 4..18 with probability above 0.99.
    expect(constantFlags).toBeGreaterThanOrEqual(4);
    expect(constantFlags).toBeLessThanOrEqual(18);
  });

  it('refuses a perfect fit instead of dividing by zero', () => {
    const x = [1, 2, 3, 4, 5, 6];
    expect(() => breuschPaganTest(fittedModel({ x }, x.map((v) => 2 * v + 1)), 0.05)).toThrow(
      expect.objectContaining({ reason: 'perfect-fit' }),
    );
  });
});
