import { coefficientCovariance } from './covariance';
import { coefficientInference } from './covariance-inference';
import { seededSource } from './diagnostics/seeded-series';
import { fittedModel, ones, normalEquationsFit } from './diagnostics/test-support';

// Invented scenario: interchange revenue against transaction count and average ticket, 23 days.
function revenueDays(seed: number, n: number) {
  const source = seededSource(seed);
  const count = Array.from({ length: n }, () => 100 + 50 * source.uniform());
  const ticket = Array.from({ length: n }, () => 20 + 10 * source.uniform());
  const revenue = count.map((c, i) => 5 + 0.2 * c + 0.5 * ticket[i]! + 3 * source.normal());
  return { count, ticket, revenue };
}

describe('coefficient table and Wald test under a chosen covariance', () => {
  it('classical: the Wald F for all slopes equals the direct overall F = ((TSS - RSS)/q) / (RSS/(n - p))', () => {
    const { count, ticket, revenue } = revenueDays(3, 23);
    const model = fittedModel({ count, ticket }, revenue);
    const inference = coefficientInference(model.design, model.solution.coefficients, coefficientCovariance(model), 0.95);
    const direct = normalEquationsFit([ones(23), count, ticket], revenue);
    const expectedF = ((direct.centredTotal - direct.rss) / 2) / (direct.rss / 20);
    expect(inference.waldTest!.statistic).toBeCloseTo(expectedF, 8);
    expect(inference.waldTest!.numeratorDegreesOfFreedom).toBe(2);
    expect(inference.waldTest!.denominatorDegreesOfFreedom).toBe(20);
  });

  it('intervals use the t quantile: t(0.975, 20) = 2.086 from published t tables', () => {
    const { count, ticket, revenue } = revenueDays(4, 23);
    const model = fittedModel({ count, ticket }, revenue);
    const inference = coefficientInference(model.design, model.solution.coefficients, coefficientCovariance(model, { type: 'hc1' }), 0.95);
    for (const row of inference.coefficients) {
      const halfWidth = (row.confidenceInterval.upper - row.confidenceInterval.lower) / 2;
      // Student t table (e.g. NIST/SEMATECH e-Handbook 1.3.6.7.2): 2.086 at 20 df, 0.975; 3 decimals.
      expect(halfWidth / row.standardError).toBeCloseTo(2.086, 3);
      expect(row.tStatistic).toBeCloseTo(row.estimate / row.standardError, 12);
    }
    expect(inference.covariance.type).toBe('hc1');
  });

  it('reports no Wald test when a cluster covariance cannot support q restrictions (q > G - 1)', () => {
    const { count, ticket, revenue } = revenueDays(5, 24);
    const model = fittedModel({ count, ticket }, revenue);
    const groups = Array.from({ length: 24 }, (_, i) => (i < 12 ? 'north' : 'south'));
    const covariance = coefficientCovariance(model, { type: 'cluster', groups });
    const inference = coefficientInference(model.design, model.solution.coefficients, covariance, 0.95);
    expect(inference.waldTest).toBeNull();
    expect(inference.covariance.inferenceDegreesOfFreedom).toBe(1);
  });
});
