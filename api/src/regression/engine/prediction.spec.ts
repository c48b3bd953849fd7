import { predict } from './analyse-model';
import { seededSource } from './diagnostics/seeded-series';

// Invented scenario: monthly subscription churn cost against active seats, 12 months, synthetic.
function seatData(seed: number, n: number, logScale: boolean) {
  const source = seededSource(seed);
  const seats = Array.from({ length: n }, () => 10 + 90 * source.uniform());
  const cost = seats.map((s) => (logScale ? Math.exp(0.5 + 0.8 * Math.log(s) + 0.1 * source.normal()) : 3 + 0.4 * s + 2 * source.normal()));
  return { seats, cost };
}

describe('predictions with confidence and prediction intervals', () => {
  it('straight line: direct intervals yhat -/+ t s sqrt(1/n + (x0 - mean)^2 / Sxx) and sqrt(1 + ...)', () => {
    const { seats, cost } = seatData(8, 12, false);
    const result = predict({ columns: { seats, cost }, response: 'cost', predictors: ['seats'], points: [[40], [95]] });
    // Direct straight-line formulas, written independently (two-pass sums).
    const n = 12;
    const meanX = seats.reduce((s, v) => s + v, 0) / n;
    const meanY = cost.reduce((s, v) => s + v, 0) / n;
    const sxx = seats.reduce((s, v) => s + (v - meanX) ** 2, 0);
    const sxy = seats.reduce((s, v, i) => s + (v - meanX) * (cost[i]! - meanY), 0);
    const slope = sxy / sxx;
    const intercept = meanY - slope * meanX;
    const rss = seats.reduce((s, v, i) => s + (cost[i]! - intercept - slope * v) ** 2, 0);
    const sigma = Math.sqrt(rss / (n - 2));
    // Student t table: t(0.975, 10) = 2.228 (NIST/SEMATECH e-Handbook 1.3.6.7.2), 3 decimals.
    const t = 2.228;
    [40, 95].forEach((x0, k) => {
      const entry = result.predictions[k]!.modelScale;
      const leverageTerm = 1 / n + (x0 - meanX) ** 2 / sxx;
      expect(entry.estimate).toBeCloseTo(intercept + slope * x0, 9);
      expect(entry.standardErrorOfMean).toBeCloseTo(sigma * Math.sqrt(leverageTerm), 9);
      expect(entry.standardErrorOfPrediction).toBeCloseTo(sigma * Math.sqrt(1 + leverageTerm), 9);
      const half = (entry.predictionInterval.upper - entry.predictionInterval.lower) / 2;
      expect(half / entry.standardErrorOfPrediction).toBeCloseTo(t, 3);
      expect(result.predictions[k]!.originalScale).toBeNull();
    });
  });

  it('log-log: original-scale values are exp of the log-scale estimate and interval ends', () => {
    const { seats, cost } = seatData(9, 30, true);
    const result = predict({ columns: { seats, cost }, response: 'cost', predictors: ['seats'], form: 'log-log', points: [[50]] });
    const entry = result.predictions[0]!;
    const s2 = entry.modelScale.standardErrorOfPrediction ** 2 - entry.modelScale.standardErrorOfMean ** 2;
    expect(entry.originalScale!.estimate).toBeCloseTo(Math.exp(entry.modelScale.estimate), 10);
    expect(entry.originalScale!.meanEstimate).toBeCloseTo(Math.exp(entry.modelScale.estimate + s2 / 2), 10);
    expect(entry.originalScale!.predictionInterval.lower).toBeCloseTo(Math.exp(entry.modelScale.predictionInterval.lower), 10);
    // The invented data were generated with cost = e^0.5 * seats^0.8 * noise: the median at 50 seats is about 37.
    expect(entry.originalScale!.estimate).toBeGreaterThan(33);
    expect(entry.originalScale!.estimate).toBeLessThan(41);
  });

  it('rejects points with the wrong number of predictors and non-positive values under a log form, naming points', () => {
    const { seats, cost } = seatData(10, 20, true);
    const base = { columns: { seats, cost }, response: 'cost', predictors: ['seats'] };
    expect(() => predict({ ...base, points: [[10, 2]] })).toThrow(
      expect.objectContaining({ reason: 'predictor-count-mismatch', field: 'points', row: 0 }),
    );
    expect(() => predict({ ...base, form: 'lin-log', points: [[10], [0]] })).toThrow(
      expect.objectContaining({ code: 'non-positive-log-argument', field: 'points', row: 1, column: 'seats' }),
    );
  });
});
