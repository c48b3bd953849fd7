/**
 * Observation measures checked against their definitions by brute force (Cook & Weisberg, 1982,
 * "Residuals and Influence in Regression", ch. 2): the externally studentised residual equals the
 * t-statistic of observation i's prediction error when the model is refitted without it, and Cook's
 * distance equals sum_j (yhat_j - yhat_j(i))^2 / (p s^2) with yhat(i) from that refit. Anscombe's
 * set IV (Anscombe, 1973) has one point with leverage 1, whose measures are undefined (null).
 */
import { seededRandom } from './__fixtures__/seeded-random';
import { fitModel } from './fit-model';

describe('influence measures', () => {
  const random = seededRandom(17);
  const n = 15;
  const a = Array.from({ length: n }, () => random.uniform() * 10);
  const b = Array.from({ length: n }, () => random.normal());
  const y = a.map((v, i) => 1 + 0.5 * v - 2 * b[i]! + random.normal());

  it.each([
    ['straight line', ['a']],
    ['two predictors', ['a', 'b']],
  ])('%s: studentised residuals and Cook\'s distance match leave-one-out refits', (_label, predictors) => {
    const full = fitModel({ columns: { a, b, y }, response: 'y', predictors, includeObservations: true });
    const p = full.coefficientCount;
    const s2 = full.residualStandardError ** 2;
    for (const i of [0, 4, 9]) {
      const keep = (values: number[]) => values.filter((_, k) => k !== i);
      const reduced = fitModel({ columns: { a: keep(a), b: keep(b), y: keep(y) }, response: 'y', predictors });
      const coefficients = reduced.coefficients.map((c) => c.estimate);
      const predict = (k: number) =>
        coefficients[0]! + coefficients[1]! * a[k]! + (predictors.length > 1 ? coefficients[2]! * b[k]! : 0);
      // prediction error of the left-out point and its standard error from the reduced fit
      const h = full.observations!.leverage[i]!;
      const predictionError = y[i]! - predict(i);
      const expectedStudentised = (predictionError * Math.sqrt(1 - h)) / reduced.residualStandardError;
      expect(Math.abs(full.observations!.studentisedResiduals[i]! - expectedStudentised)).toBeLessThan(1e-9);
      let shift = 0;
      for (let k = 0; k < n; k++) shift += (full.observations!.fitted[k]! - predict(k)) ** 2;
      expect(Math.abs(full.observations!.cooksDistance[i]! - shift / (p * s2))).toBeLessThan(1e-9);
    }
    const leverageSum = full.observations!.leverage.reduce((s, h) => s + h, 0);
    expect(Math.abs(leverageSum - p)).toBeLessThan(1e-10);
  });

  it("Anscombe's set IV: the point with leverage 1 has undefined (null) influence measures", () => {
    const x = [8, 8, 8, 8, 8, 8, 8, 19, 8, 8, 8];
    const yIV = [6.58, 5.76, 7.71, 8.84, 8.47, 7.04, 5.25, 12.5, 5.56, 7.91, 6.89];
    const result = fitModel({ columns: { x, y: yIV }, response: 'y', predictors: ['x'], includeObservations: true });
    expect(Math.abs(result.observations!.leverage[7]! - 1)).toBeLessThan(1e-12);
    expect(result.observations!.cooksDistance[7]).toBeNull();
    expect(result.observations!.studentisedResiduals[7]).toBeNull();
    expect(result.observations!.standardisedResiduals[0]).not.toBeNull();
  });
});
