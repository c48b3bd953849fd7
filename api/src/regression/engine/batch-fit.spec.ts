import { Matrix, inverse } from 'ml-matrix';
import { linearRegression } from 'simple-statistics';
import { fitBatch } from './batch-fit';
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

  it('standard errors and R^2 match the direct formulas (X\'X)^-1 s^2 with two shared predictors', () => {
    const source = seededSource(2);
    const n = 60;
    const rate = Array.from({ length: n }, () => 1000 + 10 * source.normal()); // large offset on purpose
    const spread = Array.from({ length: n }, () => source.normal());
    const columns: Record<string, number[]> = { rate, spread };
    columns.margin = rate.map((r, i) => 0.3 * r - 2 * spread[i]! + source.normal());
    const result = fitBatch({ columns, predictors: ['rate', 'spread'], responses: ['margin'] });
    const fit = result.fits[0]!;
    if (fit.status !== 'fitted') throw new Error('expected a fit');
    const x = new Matrix(rate.map((r, i) => [1, r, spread[i]!]));
    const y = Matrix.columnVector(columns.margin);
    const bread = inverse(x.transpose().mmul(x));
    const b = bread.mmul(x.transpose()).mmul(y);
    const residual = y.clone().sub(x.mmul(b)).to1DArray();
    const rss = residual.reduce((s, v) => s + v * v, 0);
    const meanY = columns.margin.reduce((s, v) => s + v, 0) / n;
    const tss = columns.margin.reduce((s, v) => s + (v - meanY) ** 2, 0);
    fit.coefficients.forEach((row, j) => {
      expect(row.estimate).toBeCloseTo(b.get(j, 0), 7);
      expect(row.standardError / Math.sqrt((bread.get(j, j) * rss) / (n - 3))).toBeCloseTo(1, 7);
    });
    expect(fit.rSquared).toBeCloseTo(1 - rss / tss, 9);
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
