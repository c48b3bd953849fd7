import { seededRandom } from './__fixtures__/seeded-random';
import { EngineError } from './errors';
import { fitModel } from './fit-model';
import { DesignMatrix, INTERCEPT_NAME, solveLeastSquares } from './least-squares';
import { fitSimpleLine } from './simple-regression';

function design(columns: Record<string, Float64Array>, n: number, intercept = true): DesignMatrix {
  const names = Object.keys(columns);
  const list = Object.values(columns);
  return intercept
    ? { names: [INTERCEPT_NAME, ...names], columns: [new Float64Array(n).fill(1), ...list], n, hasIntercept: true }
    : { names, columns: list, n, hasIntercept: false };
}

function expectEngineError(action: () => unknown, code: string): EngineError {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineError);
    expect((error as EngineError).code).toBe(code);
    return error as EngineError;
  }
  throw new Error(`expected EngineError ${code}`);
}

describe('solveLeastSquares', () => {
  it('recovers exact coefficients from noiseless data with a large offset (x shifted by 1e10)', () => {
    // y = 3 + 2 (x - 1e10) exactly in binary: the true slope is 2 and the intercept 3 - 2e10.
    const n = 50;
    const x = Float64Array.from({ length: n }, (_, i) => 1e10 + i);
    const y = Float64Array.from({ length: n }, (_, i) => 3 + 2 * i);
    const solution = solveLeastSquares(design({ x }, n), y);
    expect(Math.abs(solution.coefficients[1]! - 2) / 2).toBeLessThan(1e-12);
    expect(Math.abs(solution.coefficients[0]! - (3 - 2e10)) / 2e10).toBeLessThan(1e-12);
    const line = fitSimpleLine(x, y)!;
    expect(Math.abs(line.slope - 2) / 2).toBeLessThan(1e-12);
  });

  it('straight-line fast path agrees with the refined QR path to 1e-12 relative', () => {
    for (const offset of [0, 1e3, 1e6, 1e10]) {
      const random = seededRandom(7 + offset);
      const n = 2000;
      const x = Float64Array.from({ length: n }, () => offset + 50 * random.uniform());
      const y = Float64Array.from(x, (v) => 12 - 0.8 * (v - offset) + random.normal());
      const line = fitSimpleLine(x, y)!;
      const qr = solveLeastSquares(design({ x }, n), y);
      const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
      expect(relative(line.slope, qr.coefficients[1]!)).toBeLessThan(1e-12);
      expect(relative(line.intercept, qr.coefficients[0]!)).toBeLessThan(1e-12);
      expect(relative(line.residualSumOfSquares, qr.residualSumOfSquares)).toBeLessThan(1e-12);
      expect(relative(line.unscaledCovariance[0]![0]!, qr.unscaledCovariance[0]![0]!)).toBeLessThan(1e-12);
      expect(relative(line.unscaledCovariance[1]![1]!, qr.unscaledCovariance[1]![1]!)).toBeLessThan(1e-12);
    }
  });

  it('leverage sums to the number of coefficients (trace of the hat matrix)', () => {
    const random = seededRandom(3);
    const n = 40;
    const a = Float64Array.from({ length: n }, () => random.normal());
    const b = Float64Array.from({ length: n }, () => random.uniform());
    const y = Float64Array.from(a, (v, i) => v + b[i]! + random.normal());
    const solution = solveLeastSquares(design({ a, b }, n), y, { computeLeverage: true });
    const trace = solution.leverage!.reduce((sum, h) => sum + h, 0);
    expect(Math.abs(trace - 3)).toBeLessThan(1e-12);
  });

  it('integer weights give the same coefficients and residual sum of squares as repeating rows', () => {
    const random = seededRandom(11);
    const n = 30;
    const x = Float64Array.from({ length: n }, () => random.uniform() * 10);
    const z = Float64Array.from({ length: n }, () => random.normal());
    const y = Float64Array.from(x, (v, i) => 2 + v - 3 * z[i]! + random.normal());
    const weights = Float64Array.from({ length: n }, () => 1 + Math.floor(random.uniform() * 4));
    const repeated: number[][] = [[], [], []];
    for (let i = 0; i < n; i++) {
      for (let k = 0; k < weights[i]!; k++) {
        repeated[0]!.push(x[i]!);
        repeated[1]!.push(z[i]!);
        repeated[2]!.push(y[i]!);
      }
    }
    const m = repeated[0]!.length;
    const weighted = solveLeastSquares(design({ x, z }, n), y, { weights });
    const expanded = solveLeastSquares(
      design({ x: Float64Array.from(repeated[0]!), z: Float64Array.from(repeated[1]!) }, m),
      Float64Array.from(repeated[2]!),
    );
    for (let j = 0; j < 3; j++) {
      expect(Math.abs(weighted.coefficients[j]! - expanded.coefficients[j]!)).toBeLessThan(1e-12 * Math.max(1, Math.abs(expanded.coefficients[j]!)));
    }
    expect(Math.abs(weighted.residualSumOfSquares - expanded.residualSumOfSquares) / expanded.residualSumOfSquares).toBeLessThan(1e-12);
  });

  it('names both columns when one predictor is an exact multiple of another', () => {
    const n = 20;
    const count = Float64Array.from({ length: n }, (_, i) => (i * 7) % 11);
    const total = Float64Array.from(count, (v) => 2.5 * v);
    const y = Float64Array.from({ length: n }, (_, i) => i);
    const error = expectEngineError(() => solveLeastSquares(design({ feeCount: count, feeTotal: total }, n), y), 'collinear-columns');
    expect(error.column).toBe('feeTotal');
    expect(error.columns).toEqual(['feeCount', 'feeTotal']);
  });

  it('detects collinearity hidden behind a large offset', () => {
    const n = 25;
    const base = Float64Array.from({ length: n }, (_, i) => 1e10 + ((i * 3) % 7));
    const scaled = Float64Array.from(base, (v) => 2.5 * v);
    const y = Float64Array.from({ length: n }, (_, i) => Math.sin(i));
    expectEngineError(() => solveLeastSquares(design({ base, scaled }, n), y), 'collinear-columns');
  });

  it('names a three-way linear dependency', () => {
    const random = seededRandom(5);
    const n = 30;
    const a = Float64Array.from({ length: n }, () => random.normal());
    const b = Float64Array.from({ length: n }, () => random.normal());
    const c = Float64Array.from(a, (v, i) => v - 2 * b[i]!);
    const y = Float64Array.from({ length: n }, () => random.normal());
    const error = expectEngineError(() => solveLeastSquares(design({ a, b, c }, n), y), 'collinear-columns');
    expect(error.columns).toEqual(['a', 'b', 'c']);
  });

  it('keeps nearly (but not exactly) collinear columns', () => {
    const random = seededRandom(8);
    const n = 200;
    const a = Float64Array.from({ length: n }, () => random.normal());
    const b = Float64Array.from(a, (v) => v + 1e-6 * random.normal());
    const y = Float64Array.from(a, (v) => v + random.normal());
    expect(solveLeastSquares(design({ a, b }, n), y).rank).toBe(3);
  });

  it('rejects a constant predictor with an intercept, and a zero column without one', () => {
    const n = 10;
    const flat = new Float64Array(n).fill(4.2);
    const y = Float64Array.from({ length: n }, (_, i) => i);
    expect(expectEngineError(() => solveLeastSquares(design({ flat }, n), y), 'constant-column').column).toBe('flat');
    const zero = new Float64Array(n);
    expect(expectEngineError(() => solveLeastSquares(design({ zero }, n, false), y), 'zero-column').column).toBe('zero');
    // Without an intercept a constant column is legitimate (it plays the intercept's part).
    expect(solveLeastSquares(design({ flat }, n, false), y).rank).toBe(1);
  });

  it('rejects fewer observations than parameters', () => {
    const x = Float64Array.of(1, 2);
    expectEngineError(() => solveLeastSquares(design({ x }, 2), Float64Array.of(1, 3)), 'too-few-observations');
  });

  it('the tall-skinny path agrees with the refined Householder path', () => {
    const random = seededRandom(21);
    const n = 8000;
    const p = 8;
    const columns: Record<string, Float64Array> = {};
    for (let j = 0; j < p; j++) columns[`x${j}`] = Float64Array.from({ length: n }, () => 1000 + random.normal() * (j + 1));
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let value = random.normal();
      for (let j = 0; j < p; j++) value += (j - 4) * 0.1 * columns[`x${j}`]![i]!;
      y[i] = value;
    }
    const weights = Float64Array.from({ length: n }, () => 0.5 + random.uniform());
    for (const options of [{}, { weights }]) {
      const tall = solveLeastSquares(design(columns, n), y, { ...options, method: 'tall-skinny', computeLeverage: true });
      expect(tall.method).toBe('tall-skinny');
      const householder = solveLeastSquares(design(columns, n), y, { ...options, method: 'householder-refined', computeLeverage: true });
      for (let j = 0; j <= p; j++) {
        const standardError = Math.sqrt((householder.unscaledCovariance[j]![j]! * householder.residualSumOfSquares) / (n - p - 1));
        const difference = Math.abs(tall.coefficients[j]! - householder.coefficients[j]!);
        expect(difference).toBeLessThan(1e-12 * (Math.abs(householder.coefficients[j]!) + standardError));
        expect(Math.abs(tall.unscaledCovariance[j]![j]! / householder.unscaledCovariance[j]![j]! - 1)).toBeLessThan(1e-12);
      }
      expect(Math.abs(tall.residualSumOfSquares / householder.residualSumOfSquares - 1)).toBeLessThan(1e-12);
      for (const i of [0, 17, n - 1]) expect(Math.abs(tall.leverage![i]! - householder.leverage![i]!)).toBeLessThan(1e-12);
    }
  });

  it('the tall path keeps agreeing when correlated predictors send it from the Gram factor to the Householder fold', () => {
    const random = seededRandom(4242);
    const n = 6000;
    const base = Float64Array.from({ length: n }, () => random.normal());
    // hedged_exposure is exposure plus 0.5% noise: the scaled design's condition number is in the hundreds,
    // beyond the Gram path's limit of 1e2, so the Householder fold does the work.
    const columns: Record<string, Float64Array> = {
      exposure: base,
      hedged_exposure: Float64Array.from(base, (value) => value + 0.005 * random.normal()),
      fee: Float64Array.from({ length: n }, () => random.normal()),
    };
    const y = Float64Array.from({ length: n }, (_, i) => 2 * base[i]! - columns.fee![i]! + random.normal());
    const tall = solveLeastSquares(design(columns, n), y, { method: 'tall-skinny' });
    const householder = solveLeastSquares(design(columns, n), y, { method: 'householder-refined' });
    expect(tall.conditionNumber).toBeGreaterThan(100);
    for (let j = 0; j < 4; j++) {
      const standardError = Math.sqrt((householder.unscaledCovariance[j]![j]! * householder.residualSumOfSquares) / (n - 4));
      expect(Math.abs(tall.coefficients[j]! - householder.coefficients[j]!)).toBeLessThan(1e-11 * (Math.abs(householder.coefficients[j]!) + standardError));
      expect(Math.abs(tall.unscaledCovariance[j]![j]! / householder.unscaledCovariance[j]![j]! - 1)).toBeLessThan(1e-10);
    }
  });

  it('chooses the tall-skinny path for large designs', () => {
    const n = 600000; // n * p = 2.4e6 design entries, above TALL_SKINNY_THRESHOLD
    const a = new Float64Array(n);
    const b = new Float64Array(n);
    const c = new Float64Array(n);
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      a[i] = Math.sin(i);
      b[i] = Math.cos(1.3 * i);
      c[i] = ((i * 7919) % 1000) / 1000;
      y[i] = a[i]! - b[i]! + 0.1 * Math.sin(0.7 * i + 1);
    }
    const solution = solveLeastSquares(design({ a, b, c }, n), y);
    expect(solution.method).toBe('tall-skinny');
    expect(Math.abs(solution.coefficients[1]! - 1)).toBeLessThan(0.01);
  });
});

describe('fitModel numerical behaviour', () => {
  it('keeps the slope to 1e-9 relative on noisy data shifted by 1e6 and 1e10', () => {
    const random = seededRandom(42);
    const n = 500;
    const u = Float64Array.from({ length: n }, () => random.uniform() * 100);
    const y = Float64Array.from(u, (v) => 5 + 0.3 * v + random.normal());
    const base = fitModel({ columns: { x: u, y }, response: 'y', predictors: ['x'] }).coefficients[1]!.estimate;
    for (const offset of [1e6, 1e10]) {
      const shifted = Float64Array.from(u, (v) => v + offset);
      // the shift itself rounds x (by up to offset * 1.1e-16): compare against the fit of the rounded data
      const unshifted = Float64Array.from(shifted, (v) => v - offset);
      const reference = fitModel({ columns: { x: unshifted, y }, response: 'y', predictors: ['x'] }).coefficients[1]!.estimate;
      const slope = fitModel({ columns: { x: shifted, y }, response: 'y', predictors: ['x'] }).coefficients[1]!.estimate;
      expect(Math.abs(slope - reference) / Math.abs(reference)).toBeLessThan(1e-9);
      expect(Math.abs(reference - base) / Math.abs(base)).toBeLessThan(1e-3);
    }
  });
});
