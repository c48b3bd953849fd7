import { Matrix, inverse } from 'ml-matrix';
import { readFileSync } from 'fs';
import { join } from 'path';
import { fitModel } from './fit-model';
import { fitRolling } from './rolling-fit';
import { seededSource } from './diagnostics/seeded-series';

// Invented scenario: a fictional fintech stock's daily price level against a drifting benchmark level.
function drifting(seed: number, n: number) {
  const source = seededSource(seed);
  let level = 5000;
  const benchmark: number[] = [];
  const volume: number[] = [];
  const stock: number[] = [];
  for (let t = 0; t < n; t++) {
    level += 3 + 10 * source.normal(); // large offset and drift: stresses updating sums
    benchmark.push(level);
    volume.push(source.uniform() * 100);
    stock.push(12 + 0.02 * level - 0.05 * volume[t]! + 2 * source.normal());
  }
  return { benchmark, volume, stock };
}

function directWindow(columns: number[][], y: number[]) {
  const x = new Matrix(y.map((_, i) => [1, ...columns.map((c) => c[i]!)]));
  const bread = inverse(x.transpose().mmul(x));
  const b = bread.mmul(x.transpose()).mmul(Matrix.columnVector(y));
  const residual = Matrix.columnVector(y).sub(x.mmul(b)).to1DArray();
  const rss = residual.reduce((s, v) => s + v * v, 0);
  const s2 = rss / (y.length - columns.length - 1);
  return { b: b.to1DArray(), se: b.to1DArray().map((_, j) => Math.sqrt(s2 * bread.get(j, j))) };
}

describe('rolling-window fits with updating sums', () => {
  it('every window matches a direct refit of that window (two predictors, window 40, step 3)', () => {
    const { benchmark, volume, stock } = drifting(1, 400);
    const result = fitRolling({ columns: { benchmark, volume, stock }, response: 'stock', predictors: ['benchmark', 'volume'], window: 40, step: 3 });
    expect(result.windowCount).toBe(Math.floor((400 - 40) / 3) + 1);
    for (let w = 0; w < result.windowCount; w += 7) {
      const start = result.windowStart[w]!;
      const slice = (values: number[]) => values.slice(start, start + 40);
      const reference = directWindow([slice(benchmark), slice(volume)], slice(stock));
      result.coefficientPath.forEach((path, j) => {
        // Normal equations on both sides; 1e-6 relative.
        expect(path.estimates[w]! / reference.b[j]!).toBeCloseTo(1, 6);
        expect(path.standardErrors[w]! / reference.se[j]!).toBeCloseTo(1, 6);
      });
    }
  });

  it('one predictor, step 1: slope path equals the two-pass Sxy / Sxx of each window over a long drifting series', () => {
    const { benchmark, stock } = drifting(2, 3000);
    const result = fitRolling({ columns: { benchmark, stock }, response: 'stock', predictors: ['benchmark'], window: 250 });
    for (let w = 0; w < result.windowCount; w += 97) {
      const x = benchmark.slice(w, w + 250);
      const y = stock.slice(w, w + 250);
      const mx = x.reduce((s, v) => s + v, 0) / 250;
      const my = y.reduce((s, v) => s + v, 0) / 250;
      const sxx = x.reduce((s, v) => s + (v - mx) ** 2, 0);
      const sxy = x.reduce((s, v, i) => s + (v - mx) * (y[i]! - my), 0);
      expect(result.coefficientPath[1]!.estimates[w]).toBeCloseTo(sxy / sxx, 9);
      expect(result.coefficientPath[0]!.estimates[w]).toBeCloseTo(my - (sxy / sxx) * mx, 6);
    }
  });

  it('rejects a window longer than the series, a window too short for the coefficients and a bad step', () => {
    const { benchmark, stock } = drifting(3, 50);
    const base = { columns: { benchmark, stock }, response: 'stock', predictors: ['benchmark'] };
    expect(() => fitRolling({ ...base, window: 51 })).toThrow(expect.objectContaining({ reason: 'window-too-long', field: 'window' }));
    expect(() => fitRolling({ ...base, window: 2 })).toThrow(expect.objectContaining({ reason: 'invalid-window', field: 'window' }));
    expect(() => fitRolling({ ...base, window: 10, step: 0 })).toThrow(expect.objectContaining({ reason: 'invalid-window', field: 'step' }));
  });

  it('names the window where a predictor stops varying', () => {
    const benchmark = [1, 2, 3, 4, 5, 6, 6, 6, 6, 6, 6, 7];
    const stock = benchmark.map((v, i) => v + (i % 3));
    expect(() => fitRolling({ columns: { benchmark, stock }, response: 'stock', predictors: ['benchmark'], window: 5 })).toThrow(
      expect.objectContaining({ code: 'constant-column', column: 'benchmark', row: 5, field: 'window' }),
    );
  });
});

describe('rolling fits on the data users send (offsets, price levels, near-collinear designs)', () => {
  const load = (name: string) => {
    const fixture = JSON.parse(readFileSync(join(__dirname, '__fixtures__', 'exact', `${name}.json`), 'utf8')) as {
      columns: Record<string, number[]>;
      response: string;
      predictors: string[];
      intercept: boolean;
      observationCount: number;
      reference: { coefficients: string[]; classicalStandardErrors: string[] };
    };
    const columns = Object.fromEntries(Object.entries(fixture.columns).map(([key, values]) => [key, Float64Array.from(values)]));
    return { fixture, columns };
  };

  it.each(['epoch-milliseconds', 'offset-1e12', 'price-level', 'polynomial-5', 'longley'])(
    '%s: a window over the whole series equals the exact rational reference to 1e-10 (source: generate-exact-references.mjs)',
    (name) => {
      const { fixture, columns } = load(name);
      const result = fitRolling({ columns, response: fixture.response, predictors: fixture.predictors, intercept: fixture.intercept, window: fixture.observationCount });
      result.coefficientPath.forEach((path, j) => {
        const estimate = Number(fixture.reference.coefficients[j]);
        const standardError = Number(fixture.reference.classicalStandardErrors[j]);
        expect(Math.abs(path.estimates[0]! - estimate) / Math.abs(estimate)).toBeLessThanOrEqual(1e-10);
        expect(Math.abs(path.standardErrors[0]! - standardError) / standardError).toBeLessThanOrEqual(1e-10);
      });
    },
  );

  it.each(['epoch-milliseconds', 'price-level', 'polynomial-5', 'longley'])(
    '%s: every window of 20 rows equals the single fit of the same rows to 1e-10 (consistency check against the exactly tested single-fit path)',
    (name) => {
      const { fixture, columns } = load(name);
      const window = Math.min(20, fixture.observationCount - 2);
      const result = fitRolling({ columns, response: fixture.response, predictors: fixture.predictors, intercept: fixture.intercept, window });
      let worst = 0;
      for (let start = 0; start < result.windowCount; start++) {
        const rows = Object.fromEntries(Object.entries(columns).map(([key, values]) => [key, values.slice(start, start + window)]));
        const single = fitModel({ columns: rows, response: fixture.response, predictors: fixture.predictors, intercept: fixture.intercept });
        single.coefficients.forEach((row, j) => {
          worst = Math.max(worst, Math.abs(result.coefficientPath[j]!.estimates[start]! - row.estimate) / Math.abs(row.estimate));
          worst = Math.max(worst, Math.abs(result.coefficientPath[j]!.standardErrors[start]! - row.standardError) / row.standardError);
        });
      }
      expect(worst).toBeLessThanOrEqual(1e-10);
    },
  );
});
