/**
 * One perfect-fit rule for the whole answer (perfect-fit.ts), and checks whose defaults do not fit a
 * tiny sample. Expected values here are exact by construction (a response that is an exact linear function
 * of the predictor up to the rounding of each y to double), not taken from the engine's output.
 */

import { analyseModel, fitAndAnalyse } from './analyse-model';
import { AnalysisError } from './diagnostics/analysis-error';

describe('perfect fits', () => {
  // y = 0.1 + 0.3 x, each y rounded to the nearest double: the exact least-squares residuals are rounding noise.
  const x = Float64Array.from({ length: 25 }, (_, i) => 1.7e9 + 60 * i);
  const y = x.map((value) => 0.1 + 0.3 * (value - 1.7e9));

  it('are reported as perfect in the table, the ANOVA, the inference block and every check, with no t, p or F', () => {
    const { fit, analysis } = fitAndAnalyse({ columns: { x, y }, response: 'y', predictors: ['x'], covariance: { type: 'hc3' } });
    expect(fit.perfectFit).toBe(true);
    expect(fit.anova.residual.sumOfSquares).toBe(0);
    expect(fit.rSquared).toBe(1);
    expect(fit.anova.fStatistic).toBeNull();
    for (const row of [...fit.coefficients, ...analysis.coefficients]) {
      expect(row.standardError).toBe(0);
      expect(row.tStatistic).toBeNull();
      expect(row.pValue).toBeNull();
    }
    for (const entry of Object.values(analysis.diagnostics).filter((value) => value?.status !== 'computed' || !('conditionNumber' in value))) {
      expect(entry).toMatchObject({ status: 'not-defined', reason: 'perfect-fit' });
    }
  });

  it('noise at 1e-12 of the response level is not a perfect fit', () => {
    const noisy = y.map((value, i) => value + (i % 2 === 0 ? 1 : -1) * 1e-12 * Math.abs(value));
    const { fit } = fitAndAnalyse({ columns: { x, y: noisy }, response: 'y', predictors: ['x'] });
    expect(fit.perfectFit).toBe(false);
    expect(fit.coefficients[1]!.tStatistic).not.toBeNull();
  });
});

describe('checks whose defaults do not fit the sample', () => {
  // Invented: four daily settlement amounts against a fee rate, two coefficients, n = p + 2 = 4 rows.
  const columns = { rate: [0.011, 0.014, 0.019, 0.023], amount: [118.2, 121.9, 131.5, 135.1] };

  it('n = p + 1 with default checks answers, reporting the default Breusch-Godfrey lag as not defined with its reason', () => {
    const three = { rate: columns.rate.slice(0, 3), amount: columns.amount.slice(0, 3) };
    const result = analyseModel({ columns: three, response: 'amount', predictors: ['rate'] });
    expect(result.diagnostics.breuschGodfrey).toMatchObject({ status: 'not-defined', reason: 'lag-too-large' });
  });

  it('an explicitly chosen lag that does not fit is refused, naming the option', () => {
    const three = { rate: columns.rate.slice(0, 3), amount: columns.amount.slice(0, 3) };
    expect(() => analyseModel({ columns: three, response: 'amount', predictors: ['rate'], diagnosticOptions: { breuschGodfreyLag: 1 } })).toThrow(
      expect.objectContaining({ field: 'diagnosticOptions.breuschGodfreyLag' }) as AnalysisError,
    );
  });
});
