import { analyseModel } from './analyse-model';
import { DIAGNOSTIC_NAMES, diagnosticResultKey } from './analyse-model-diagnostics';
import { seededSource } from './diagnostics/seeded-series';
import { fittedModel, rowMatrix } from './diagnostics/test-support';
import { inverse, Matrix } from 'ml-matrix';

// Invented scenario: loan-servicing cost per account across 8 fictional branches, with volume and arrears.
function servicingData(seed: number, n: number) {
  const source = seededSource(seed);
  const accounts = Array.from({ length: n }, () => 100 + 900 * source.uniform());
  const arrears = Array.from({ length: n }, () => source.uniform() * 0.2);
  const branch = Array.from({ length: n }, (_, i) => i % 8);
  const cost = accounts.map((a, i) => 50 + 0.8 * a + 300 * arrears[i]! + 0.05 * a * source.normal());
  return { accounts, arrears, branch, cost };
}

describe('analyseModel: coefficient table under the chosen covariance plus assumption checks', () => {
  const columns = servicingData(42, 96);
  const base = { columns, response: 'cost', predictors: ['accounts', 'arrears'] };

  it('runs every check by default and reports which covariance was used', () => {
    const result = analyseModel({ ...base, covariance: { type: 'hc3' }, significanceLevel: 0.01 });
    expect(result.covariance.type).toBe('hc3');
    expect(Object.keys(result.diagnostics).sort()).toEqual(DIAGNOSTIC_NAMES.map(diagnosticResultKey).sort());
    for (const entry of Object.values(result.diagnostics)) expect(entry!.status).toBe('computed');
    const bp = result.diagnostics.breuschPagan!;
    if (bp.status !== 'computed') throw new Error('expected a result');
    expect(bp.significanceLevel).toBe(0.01);
    expect(bp.flagged).toBe(bp.pValue < 0.01);
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it('computes every check for a weighted fit (whitened residuals and regressors)', () => {
    const weights = columns.accounts.map((a) => 1 / a);
    const result = analyseModel({ ...base, columns: { ...columns, weights }, weights: 'weights' });
    for (const entry of Object.values(result.diagnostics)) expect(entry!.status).toBe('computed');
    const white = result.diagnostics.white!;
    if (white.status !== 'computed') throw new Error('expected a result');
    // Whitened regressors sqrt(w), sqrt(w) accounts, sqrt(w) arrears: 3 columns plus 6 squares/products; with
    // w = 1/accounts the product sqrt(w) * sqrt(w) accounts is 1, the constant itself, and is dropped: 8.
    expect(white.degreesOfFreedom).toBe(8);
    expect(white.regressors).not.toContain('sqrt(weight)*accounts');
  });

  it('HC3 standard errors equal sqrt of the direct (X\'X)^-1 X\' diag(e^2/(1-h)^2) X (X\'X)^-1 diagonal', () => {
    const result = analyseModel({ ...base, covariance: { type: 'hc3' }, diagnostics: [] });
    const model = fittedModel({ accounts: columns.accounts, arrears: columns.arrears }, columns.cost);
    const x = rowMatrix(model.design.columns);
    const bread = inverse(x.transpose().mmul(x));
    const hat = x.mmul(bread).mmul(x.transpose());
    const e = Array.from(model.solution.residuals);
    const omega = Matrix.diag(e.map((v, i) => (v * v) / (1 - hat.get(i, i)) ** 2));
    const expected = bread.mmul(x.transpose().mmul(omega).mmul(x)).mmul(bread);
    result.coefficients.forEach((row, j) => expect(row.standardError / Math.sqrt(expected.get(j, j))).toBeCloseTo(1, 8));
  });

  it('clusters by a group column named in columns, with G - 1 degrees of freedom', () => {
    const result = analyseModel({ ...base, covariance: { type: 'cluster', groups: 'branch' }, diagnostics: ['jarque-bera'] });
    expect(result.covariance.clusterCount).toBe(8);
    expect(result.covariance.inferenceDegreesOfFreedom).toBe(7);
    expect(result.waldTest!.denominatorDegreesOfFreedom).toBe(7);
  });

  it('rejects bad options with errors naming the field', () => {
    expect(() => analyseModel({ ...base, covariance: { type: 'cluster', groups: new Array(96).fill(1) } })).toThrow(
      expect.objectContaining({ reason: 'too-few-clusters', field: 'covariance.groups' }),
    );
    expect(() => analyseModel({ ...base, covariance: { type: 'newey-west', lag: 500 } })).toThrow(
      expect.objectContaining({ reason: 'lag-too-large', field: 'covariance.lag' }),
    );
    expect(() => analyseModel({ ...base, diagnosticOptions: { breuschGodfreyLag: 200 } })).toThrow(
      expect.objectContaining({ reason: 'lag-too-large', field: 'diagnosticOptions.breuschGodfreyLag' }),
    );
    expect(() => analyseModel({ ...base, significanceLevel: 1.5 })).toThrow(
      expect.objectContaining({ reason: 'invalid-significance-level', field: 'significanceLevel' }),
    );
    expect(() => analyseModel({ ...base, diagnostics: ['normality'] as never })).toThrow(
      expect.objectContaining({ reason: 'unknown-diagnostic', field: 'diagnostics/0' }),
    );
  });

  it('reports a check that is not defined for the model in place (RESET when yhat^2 is collinear)', () => {
    // A single 0/1 predictor: yhat takes two values, so yhat^2 and yhat^3 are exact combinations of it.
    const source = seededSource(8);
    const promoted = Array.from({ length: 40 }, (_, i) => i % 2);
    const uplift = promoted.map((d) => 1 + 2 * d + source.normal());
    const result = analyseModel({ columns: { promoted, uplift }, response: 'uplift', predictors: ['promoted'], diagnostics: ['reset', 'jarque-bera'] });
    expect(result.diagnostics.reset).toEqual(expect.objectContaining({ status: 'not-defined', reason: 'test-not-defined' }));
    expect(result.diagnostics.jarqueBera!.status).toBe('computed');
  });
});
