import { inverse, Matrix } from 'ml-matrix';
import { coefficientCovariance } from './covariance';
import { automaticNeweyWestLag } from './covariance-newey-west';
import { seededSource } from './diagnostics/seeded-series';
import { fittedModel, ones, rowMatrix } from './diagnostics/test-support';

// Invented scenario: basis-point spread of a payment corridor against volume and a volatility index.
function corridorData(seed: number, n: number) {
  const source = seededSource(seed);
  const volume = Array.from({ length: n }, () => 1 + 9 * source.uniform());
  const volatility = Array.from({ length: n }, () => source.normal());
  const spread = volume.map((v, i) => 4 + 0.3 * v - 0.8 * volatility[i]! + 0.2 * v * source.normal());
  return { volume, volatility, spread };
}

/** Direct sandwich (X'X)^-1 X' Omega X (X'X)^-1 with Omega = diag(omega), written with ml-matrix. */
function directSandwich(x: Matrix, omega: number[]): Matrix {
  const bread = inverse(x.transpose().mmul(x));
  const meat = x.transpose().mmul(Matrix.diag(omega)).mmul(x);
  return bread.mmul(meat).mmul(bread);
}

function expectMatrixClose(actual: Float64Array[], expected: Matrix, digits: number) {
  for (let i = 0; i < expected.rows; i++) {
    for (let j = 0; j < expected.columns; j++) {
      const scaleOf = Math.sqrt(Math.abs(expected.get(i, i) * expected.get(j, j)));
      expect(Math.abs(actual[i]![j]! - expected.get(i, j)) / scaleOf).toBeLessThan(10 ** -digits);
    }
  }
}

describe('coefficient covariance: classical and heteroskedasticity-robust HC0-HC3', () => {
  const n = 40;
  const { volume, volatility, spread } = corridorData(12, n);
  const model = fittedModel({ volume, volatility }, spread);
  const x = rowMatrix([ones(n), volume, volatility]);
  const e = Array.from(model.solution.residuals);
  const hat = x.mmul(inverse(x.transpose().mmul(x))).mmul(x.transpose());
  const h = e.map((_, i) => hat.get(i, i));

  it('classical: s^2 (X\'X)^-1 with s^2 = RSS / (n - p)', () => {
    const s2 = e.reduce((s, v) => s + v * v, 0) / (n - 3);
    expectMatrixClose(coefficientCovariance(model, { type: 'classical' }).matrix, inverse(x.transpose().mmul(x)).mul(s2), 9);
  });

  it('HC0 (White 1980): (X\'X)^-1 X\' diag(e^2) X (X\'X)^-1', () => {
    expectMatrixClose(coefficientCovariance(model, { type: 'hc0' }).matrix, directSandwich(x, e.map((v) => v * v)), 9);
  });

  it('HC1 (MacKinnon & White 1985): HC0 times n / (n - p)', () => {
    const expected = directSandwich(x, e.map((v) => v * v)).mul(n / (n - 3));
    const result = coefficientCovariance(model, { type: 'hc1' });
    expectMatrixClose(result.matrix, expected, 9);
    expect(result.description.smallSampleFactor).toBeCloseTo(40 / 37, 14);
  });

  it('HC2 and HC3 (MacKinnon & White 1985): e^2 / (1 - h) and e^2 / (1 - h)^2 with h from the explicit hat matrix', () => {
    expectMatrixClose(coefficientCovariance(model, { type: 'hc2' }).matrix, directSandwich(x, e.map((v, i) => (v * v) / (1 - h[i]!))), 8);
    expectMatrixClose(
      coefficientCovariance(model, { type: 'hc3' }).matrix,
      directSandwich(x, e.map((v, i) => (v * v) / (1 - h[i]!) ** 2)),
      8,
    );
  });

  it('weighted HC0: scores w_i e_i x_i, bread (X\'WX)^-1', () => {
    const weights = volume.map((v) => 1 / v);
    const weighted = fittedModel({ volume, volatility }, spread, { weights });
    const we = Array.from(weighted.solution.residuals).map((v, i) => weights[i]! * v);
    const bread = inverse(x.transpose().mmul(Matrix.diag(weights)).mmul(x));
    const meat = x.transpose().mmul(Matrix.diag(we.map((v) => v * v))).mmul(x);
    expectMatrixClose(coefficientCovariance(weighted, { type: 'hc0' }).matrix, bread.mmul(meat).mmul(bread), 8);
  });

  it('rejects HC3 when an observation has leverage 1', () => {
    // A dummy that is 1 in one row only gives that row leverage 1.
    const flag = Array.from({ length: 12 }, (_, i) => (i === 4 ? 1 : 0));
    const level = Array.from({ length: 12 }, (_, i) => i + ((i * 7) % 3));
    const y = level.map((v, i) => 2 * v + ((i * 5) % 4));
    expect(() => coefficientCovariance(fittedModel({ level, flag }, y), { type: 'hc3' })).toThrow(
      expect.objectContaining({ reason: 'leverage-of-one', row: 4, field: 'covariance.type' }),
    );
  });
});

describe('Newey-West HAC covariance (Newey & West 1987), Bartlett weights', () => {
  const n = 30;
  const { volume, volatility, spread } = corridorData(13, n);
  const model = fittedModel({ volume, volatility }, spread);
  const x = rowMatrix([ones(n), volume, volatility]);
  const e = Array.from(model.solution.residuals);

  it('matches the double sum over all pairs |t - s| <= L with weight 1 - |t - s| / (L + 1)', () => {
    const lag = 3;
    const omega = Matrix.zeros(n, n);
    for (let t = 0; t < n; t++) {
      for (let s = 0; s < n; s++) {
        const distance = Math.abs(t - s);
        if (distance <= lag) omega.set(t, s, (1 - distance / (lag + 1)) * e[t]! * e[s]!);
      }
    }
    const bread = inverse(x.transpose().mmul(x));
    const expected = bread.mmul(x.transpose().mmul(omega).mmul(x)).mmul(bread);
    const result = coefficientCovariance(model, { type: 'newey-west', lag });
    expectMatrixClose(result.matrix, expected, 9);
    expect(result.description).toEqual(expect.objectContaining({ lag: 3, lagRule: 'fixed', kernel: 'bartlett', smallSampleFactor: 1 }));
  });

  it('lag 0 reduces to HC0', () => {
    expectMatrixClose(coefficientCovariance(model, { type: 'newey-west', lag: 0 }).matrix, directSandwich(x, e.map((v) => v * v)), 9);
  });

  it('automatic lag floor(4 (n/100)^(2/9)): 4 at n = 100 and 6 at n = 1000 (hand-computed)', () => {
    // (10)^(2/9) = 1.668 -> 4 * 1.668 = 6.67 -> 6.
    expect(automaticNeweyWestLag(100)).toBe(4);
    expect(automaticNeweyWestLag(1000)).toBe(6);
    expect(coefficientCovariance(model, { type: 'newey-west' }).description).toEqual(
      expect.objectContaining({ lag: automaticNeweyWestLag(30), lagRule: 'automatic' }),
    );
  });

  it('rejects a lag the sample cannot support, naming covariance.lag', () => {
    expect(() => coefficientCovariance(model, { type: 'newey-west', lag: 30 })).toThrow(
      expect.objectContaining({ reason: 'lag-too-large', field: 'covariance.lag' }),
    );
    expect(() => coefficientCovariance(model, { type: 'newey-west', lag: -1 })).toThrow(expect.objectContaining({ reason: 'invalid-lag' }));
  });
});

describe('cluster-robust covariance CR1 (Liang & Zeger 1986; Cameron & Miller 2015)', () => {
  const n = 36;
  const { volume, volatility, spread } = corridorData(14, n);
  const model = fittedModel({ volume, volatility }, spread);
  const x = rowMatrix([ones(n), volume, volatility]);
  const e = Array.from(model.solution.residuals);
  const groups = Array.from({ length: n }, (_, i) => `merchant-${i % 6}`);

  it('matches G/(G-1) (n-1)/(n-p) (X\'X)^-1 [sum_g X_g\' e_g e_g\' X_g] (X\'X)^-1 and uses G - 1 degrees of freedom', () => {
    const omega = Matrix.zeros(n, n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (groups[i] === groups[j]) omega.set(i, j, e[i]! * e[j]!);
    const bread = inverse(x.transpose().mmul(x));
    const factor = (6 / 5) * ((n - 1) / (n - 3));
    const expected = bread.mmul(x.transpose().mmul(omega).mmul(x)).mmul(bread).mul(factor);
    const result = coefficientCovariance(model, { type: 'cluster', groups });
    expectMatrixClose(result.matrix, expected, 9);
    expect(result.description.clusterCount).toBe(6);
    expect(result.description.inferenceDegreesOfFreedom).toBe(5);
  });

  it('rejects a single group and a label list of the wrong length, naming covariance.groups', () => {
    expect(() => coefficientCovariance(model, { type: 'cluster', groups: new Array(n).fill('only') })).toThrow(
      expect.objectContaining({ reason: 'too-few-clusters', field: 'covariance.groups' }),
    );
    expect(() => coefficientCovariance(model, { type: 'cluster', groups: ['a', 'b'] })).toThrow(
      expect.objectContaining({ reason: 'invalid-cluster-groups', field: 'covariance.groups' }),
    );
  });
});
