import { inverse, Matrix, SingularValueDecomposition } from 'ml-matrix';
import { sampleCorrelation } from 'simple-statistics';
import { collinearityMeasures } from './collinearity';
import { seededSource } from './seeded-series';
import { fittedModel, ones, rowMatrix } from './test-support';

// Invented scenario: merchant revenue against card volume, wallet volume and fee income (correlated).
function revenueData(seed: number, n: number) {
  const source = seededSource(seed);
  const card = Array.from({ length: n }, () => 50 + 20 * source.normal());
  const wallet = card.map((c) => 0.6 * c + 5 * source.normal());
  const fees = card.map((c, i) => 0.02 * c + 0.01 * wallet[i]! + 0.2 * source.normal());
  const revenue = card.map((c, i) => 10 + c + 0.5 * wallet[i]! + 3 * fees[i]! + source.normal());
  return { card, wallet, fees, revenue };
}

describe('Variance inflation factors (Marquardt 1970) and scaled condition number (Belsley, Kuh & Welsch 1980)', () => {
  it('two predictors: VIF = 1 / (1 - r^2) with r the Pearson correlation (simple-statistics)', () => {
    const { card, wallet, revenue } = revenueData(1, 80);
    const result = collinearityMeasures(fittedModel({ card, wallet }, revenue));
    const r = sampleCorrelation(card, wallet);
    for (const entry of result.varianceInflation) expect(entry.varianceInflationFactor).toBeCloseTo(1 / (1 - r * r), 9);
  });

  it('three predictors: VIFs are the diagonal of the inverse correlation matrix', () => {
    const { card, wallet, fees, revenue } = revenueData(2, 120);
    const result = collinearityMeasures(fittedModel({ card, wallet, fees }, revenue));
    const columns = [card, wallet, fees];
    const correlation = new Matrix(columns.map((a) => columns.map((b) => sampleCorrelation(a, b))));
    const diagonal = inverse(correlation).diagonal();
    result.varianceInflation.forEach((entry, j) => expect(entry.varianceInflationFactor).toBeCloseTo(diagonal[j]!, 7));
  });

  it('condition number equals the singular-value ratio of the unit-length-scaled design, intercept included', () => {
    const { card, wallet, revenue } = revenueData(3, 60);
    const result = collinearityMeasures(fittedModel({ card, wallet }, revenue));
    const scaled = [ones(60), card, wallet].map((column) => {
      const norm = Math.sqrt(Array.from(column).reduce((s, v) => s + v * v, 0));
      return Array.from(column).map((v) => v / norm);
    });
    const values = new SingularValueDecomposition(rowMatrix(scaled)).diagonal;
    expect(result.conditionNumber).toBeCloseTo(Math.max(...values) / Math.min(...values), 8);
    expect(result.interceptIncluded).toBe(true);
  });
});

describe('condition number on offset data', () => {
  it('epoch-millisecond timestamps: the condition number of [1, x] matches the closed form sqrt((1 + c) / (1 - c)) to 1e-10, with 1 - c from centred sums (closed form for two unit-length columns)', () => {
    const n = 48;
    const x = Float64Array.from({ length: n }, (_, i) => 1.7e12 + 100 * i);
    const y = Float64Array.from({ length: n }, (_, i) => 25 + 0.01 * i + Math.sin(i));
    const model = fittedModel({ x }, y);
    const measured = collinearityMeasures(model).conditionNumber;
    // Exact sums of this grid in decimal: sum x = n 1.7e12 + 100 n (n-1)/2, centred Sxx = 100^2 n (n^2 - 1) / 12.
    const sumX = n * 1.7e12 + (100 * n * (n - 1)) / 2;
    const centred = (100 * 100 * n * (n * n - 1)) / 12;
    const rawSquares = centred + (sumX * sumX) / n;
    const cosine = sumX / Math.sqrt(n * rawSquares);
    const oneMinusCosine = centred / rawSquares / (1 + cosine);
    const expected = Math.sqrt((1 + cosine) / oneMinusCosine);
    expect(Math.abs(measured - expected) / expected).toBeLessThanOrEqual(1e-10);
  });
});
