import { linearRegression } from 'simple-statistics';
import { fitBatch } from './batch-fit';
import { EngineError } from './errors';
import { fitModel } from './fit-model';
import polynomial5 from './__fixtures__/exact/polynomial-5.json';
import { seededSource } from './diagnostics/seeded-series';

// Invented scenario: daily returns of 20 fictional instruments against one benchmark index return.
function returnsPanel(seed: number, n: number, instruments: number) {
  const source = seededSource(seed);
  const benchmark = Array.from({ length: n }, () => 0.01 * source.normal());
  const columns: Record<string, number[]> = { benchmark };
  const names: string[] = [];
  for (let k = 0; k < instruments; k++) {
    const beta = 0.5 + source.uniform();
    const name = `instrument-${k}`;
    columns[name] = benchmark.map((b) => 0.0002 + beta * b + 0.005 * source.normal());
    names.push(name);
  }
  return { columns, names };
}

describe('batch fits against one shared factorisation', () => {
  it('matches simple-statistics linearRegression slope and intercept for every response', () => {
    const { columns, names } = returnsPanel(1, 250, 20);
    const result = fitBatch({ columns, predictors: ['benchmark'], responses: names });
    names.forEach((name, k) => {
      const fit = result.fits[k]!;
      if (fit.status !== 'fitted') throw new Error('expected a fit');
      const reference = linearRegression(columns.benchmark!.map((x, i) => [x, columns[name]![i]!]));
      expect(fit.coefficients[1]!.estimate).toBeCloseTo(reference.m, 10);
      expect(fit.coefficients[0]!.estimate).toBeCloseTo(reference.b, 12);
    });
  });

  it('a degree-5 polynomial design reaches the exact rational reference to 1e-10 for coefficients and standard errors, as a single fit does (source: generate-exact-references.mjs)', () => {
    const fixture = polynomial5;
    const columns = Object.fromEntries(Object.entries(fixture.columns).map(([name, values]) => [name, Float64Array.from(values)]));
    const result = fitBatch({ columns, predictors: fixture.predictors, responses: [fixture.response] });
    const fit = result.fits[0]!;
    if (fit.status !== 'fitted') throw new Error(`expected a fit, got ${fit.code}`);
    fit.coefficients.forEach((row, j) => {
      const estimate = Number(fixture.reference.coefficients[j]);
      const standardError = Number(fixture.reference.classicalStandardErrors[j]);
      expect(Math.abs(row.estimate - estimate) / Math.abs(estimate)).toBeLessThanOrEqual(1e-10);
      expect(Math.abs(row.standardError - standardError) / standardError).toBeLessThanOrEqual(1e-10);
    });
    expect(Math.abs(fit.rSquared - Number(fixture.reference.rSquared))).toBeLessThanOrEqual(1e-12);
  });

  it('refuses a near-constant predictor with the same rule and code as a single fit', () => {
    const n = 40;
    const level = Float64Array.from({ length: n }, (_, i) => 1e9 + (i % 2) * 1e-7); // variation below rounding of the level
    const y = Float64Array.from({ length: n }, (_, i) => Math.sin(i));
    let single: unknown;
    try {
      fitModel({ columns: { level, y }, response: 'y', predictors: ['level'] });
    } catch (error) {
      single = error;
    }
    expect(single).toBeInstanceOf(EngineError);
    expect(() => fitBatch({ columns: { level, y }, predictors: ['level'], responses: ['y'] })).toThrow(
      expect.objectContaining({ code: (single as EngineError).code, column: 'level' }),
    );
  });

  it('reports a constant response in its own entry and still fits the others', () => {
    const { columns, names } = returnsPanel(3, 50, 2);
    columns.flat = new Array(50).fill(0.001);
    const result = fitBatch({ columns, predictors: ['benchmark'], responses: [names[0]!, 'flat', names[1]!] });
    expect(result.fits.map((fit) => fit.status)).toEqual(['fitted', 'failed', 'fitted']);
    expect(result.fits[1]).toEqual(expect.objectContaining({ code: 'constant-response' }));
  });

  it('fails the whole batch on a constant shared predictor, naming the column', () => {
    const { columns, names } = returnsPanel(4, 30, 1);
    columns.benchmark = new Array(30).fill(0.002);
    expect(() => fitBatch({ columns, predictors: ['benchmark'], responses: names })).toThrow(
      expect.objectContaining({ code: 'constant-column', column: 'benchmark' }),
    );
  });
});
