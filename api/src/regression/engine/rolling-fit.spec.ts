import { Matrix, inverse } from 'ml-matrix';
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
