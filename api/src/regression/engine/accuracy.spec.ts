/**
 * The a-posteriori accuracy bounds (accuracy.ts) against the exact rational references of
 * `__fixtures__/exact/` (source: generate-exact-references.mjs): on every dataset, for every coefficient and
 * every standard error under every covariance type, the bound the answer states is never below the error
 * actually made, and it is informative (at most 1e-12) wherever it is claimed.
 */

import { readFileSync } from 'fs';
import { join } from 'path';
import { analyseModel, fitModel } from './index';
import type { CovarianceOption, FitInput } from './index';

const FOLDER = join(__dirname, '__fixtures__', 'exact');
const DATASETS = ['offset-1e4', 'offset-1e8', 'offset-1e12', 'epoch-seconds', 'epoch-milliseconds', 'price-level', 'price-level-no-intercept', 'polynomial-5', 'longley', 'weighted', 'clustered'];

interface Fixture {
  columns: Record<string, number[]>;
  response: string;
  predictors: string[];
  intercept: boolean;
  weights?: string;
  groups?: string;
  reference: {
    coefficients: string[];
    classicalStandardErrors: string[];
    standardErrors: Record<string, string[] | { standardErrors: string[] }>;
  };
}

const relative = (value: number, reference: string) => {
  const exact = Number(reference);
  return exact === 0 ? Math.abs(value) : Math.abs(value - exact) / Math.abs(exact);
};

function expectBoundHolds(errors: number[], bounds: (number | null)[], label: string) {
  const failures = errors
    .map((error, j) => ({ j, error, bound: bounds[j] }))
    .filter(({ error, bound }) => bound === null || bound === undefined || !(error <= bound) || !(bound <= 1e-12));
  expect(failures.map((failure) => `${label}[${failure.j}]: error ${failure.error}, bound ${failure.bound}`)).toEqual([]);
}

describe.each(DATASETS)('accuracy bounds against the exact reference: %s', (name) => {
  const fixture = JSON.parse(readFileSync(join(FOLDER, `${name}.json`), 'utf8')) as Fixture;
  const columns = Object.fromEntries(Object.entries(fixture.columns).map(([key, values]) => [key, Float64Array.from(values)]));
  const input: FitInput = {
    columns,
    response: fixture.response,
    predictors: fixture.predictors,
    intercept: fixture.intercept,
    ...(fixture.weights ? { weights: fixture.weights } : {}),
  };

  it('coefficients and classical standard errors stay within the stated bound', () => {
    const fit = fitModel(input);
    const accuracy = fit.numerics.accuracy;
    expect(accuracy).not.toBeNull();
    expectBoundHolds(fit.coefficients.map((row, j) => relative(row.estimate, fixture.reference.coefficients[j]!)), accuracy!.coefficients, 'coefficient');
    expectBoundHolds(
      fit.coefficients.map((row, j) => relative(row.standardError, fixture.reference.classicalStandardErrors[j]!)),
      accuracy!.standardErrors,
      'classical standard error',
    );
  });

  const robust: [string, CovarianceOption, string[] | undefined][] = [
    ['hc0', { type: 'hc0' }, fixture.reference.standardErrors.hc0 as string[]],
    ['hc1', { type: 'hc1' }, fixture.reference.standardErrors.hc1 as string[]],
    ['hc2', { type: 'hc2' }, fixture.reference.standardErrors.hc2 as string[]],
    ['hc3', { type: 'hc3' }, fixture.reference.standardErrors.hc3 as string[]],
    ['newey-west, lag 2', { type: 'newey-west', lag: 2 }, (fixture.reference.standardErrors.neweyWestLag2 as { standardErrors: string[] }).standardErrors],
  ];
  if (fixture.groups) robust.push(['cluster', { type: 'cluster', groups: fixture.groups }, (fixture.reference.standardErrors.cluster as { standardErrors: string[] }).standardErrors]);

  it.each(robust)('%s standard errors stay within the stated bound', (_label, covariance, reference) => {
    expect(reference).toBeDefined();
    const analysis = analyseModel({ ...input, covariance, diagnostics: [] });
    expect(analysis.standardErrorAccuracy).toBeDefined();
    expectBoundHolds(
      analysis.coefficients.map((row, j) => relative(row.standardError, reference![j]!)),
      analysis.standardErrorAccuracy!,
      `${covariance.type} standard error`,
    );
  });
});
