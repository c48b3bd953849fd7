import { whiteTest } from './white-test';
import { seededSource } from './seeded-series';
import { fittedModel, ones, normalEquationsFit } from './test-support';

// Invented scenario: loan loss amount against exposure and tenor, synthetic seeded data.
function lossData(seed: number, n: number) {
  const source = seededSource(seed);
  const exposure: number[] = [];
  const tenor: number[] = [];
  const secured: number[] = [];
  const loss: number[] = [];
  for (let i = 0; i < n; i++) {
    const e = 1 + 9 * source.uniform();
    const t = 1 + 4 * source.uniform();
    const s = source.uniform() < 0.5 ? 1 : 0;
    exposure.push(e);
    tenor.push(t);
    secured.push(s);
    loss.push(1 + 0.4 * e + 0.2 * t - 0.5 * s + 0.1 * e * source.normal());
  }
  return { exposure, tenor, secured, loss };
}

describe("White's test (White 1980): n R^2 on regressors, squares and cross-products", () => {
  it('matches a direct auxiliary regression with 5 regressors for two predictors (df = 5)', () => {
    const { exposure, tenor, loss } = lossData(21, 60);
    const model = fittedModel({ exposure, tenor }, loss);
    const result = whiteTest(model, 0.05);
    const base = normalEquationsFit([ones(60), exposure, tenor], loss);
    const squares = base.residuals.map((e) => e * e);
    const auxiliary = normalEquationsFit(
      [ones(60), exposure, tenor, exposure.map((v) => v * v), exposure.map((v, i) => v * tenor[i]!), tenor.map((v) => v * v)],
      squares,
    );
    expect(result.degreesOfFreedom).toBe(5);
    expect(result.statistic).toBeCloseTo(60 * (1 - auxiliary.rss / auxiliary.centredTotal), 7);
  });

  it("drops a dummy's square (identical to the dummy) and counts only the kept columns", () => {
    const { exposure, secured, loss } = lossData(22, 60);
    const result = whiteTest(fittedModel({ exposure, secured }, loss), 0.05);
    // exposure, secured, exposure^2, exposure*secured; secured^2 duplicates secured.
    expect(result.degreesOfFreedom).toBe(4);
    expect(result.regressors).not.toContain('secured^2');
  });
});
