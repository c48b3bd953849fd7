import { fitAndAnalyse } from './analyse-model';
import { seededRandom } from './__fixtures__/seeded-random';
import { fitModel } from './fit-model';

/**
 * fitAndAnalyse shares one solve between the fit and its checks; its fit must be the fit that fitModel
 * computes on its own (the straight line takes fitModel's single-pass path, which agrees with QR to 1e-12).
 */
describe('fitAndAnalyse', () => {
  const random = seededRandom(99);
  const n = 200;
  const ticket = Array.from({ length: n }, () => 20 + 80 * random.uniform());
  const merchants = Array.from({ length: n }, () => 1 + Math.floor(30 * random.uniform()));
  const chargebacks = ticket.map((t, i) => 0.5 + 0.03 * t + 0.02 * merchants[i]! + 0.4 * random.normal());
  const columns = { ticket, merchants, chargebacks };

  const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

  it.each([
    [['ticket', 'merchants'], 1e-13],
    [['ticket'], 1e-12],
  ] as const)('returns fitModel’s coefficients, ANOVA and R² for predictors %j (relative tolerance %d)', (predictors, tolerance) => {
    const input = { columns, response: 'chargebacks', predictors: [...predictors], includeObservations: true };
    const alone = fitModel(input);
    const { fit, analysis } = fitAndAnalyse({ ...input, diagnostics: ['jarque-bera'] });
    fit.coefficients.forEach((row, j) => {
      expect(relative(row.estimate, alone.coefficients[j]!.estimate)).toBeLessThan(tolerance);
      expect(relative(row.standardError, alone.coefficients[j]!.standardError)).toBeLessThan(tolerance);
    });
    expect(relative(fit.anova.residual.sumOfSquares, alone.anova.residual.sumOfSquares)).toBeLessThan(tolerance);
    expect(relative(fit.rSquared, alone.rSquared)).toBeLessThan(tolerance);
    expect(fit.observations?.residuals).toHaveLength(n);
    expect(analysis.coefficients[0]!.estimate).toBe(fit.coefficients[0]!.estimate);
  });
});
