import { Matrix } from 'ml-matrix';
import { durbinWatsonLowerTail, durbinWatsonNullMoments, durbinWatsonStatistic, durbinWatsonTest } from './durbin-watson';
import { seededSource } from './seeded-series';
import { fittedModel, ones, rowMatrix, normalEquationsFit } from './test-support';

// Invented scenario: monthly chargeback rate against a month index, synthetic seeded data.
function trendDesign(n: number) {
  const month = Array.from({ length: n }, (_, t) => t + 1);
  return { month };
}

function autocorrelatedSeries(seed: number, n: number, rho: number) {
  const source = seededSource(seed);
  const { month } = trendDesign(n);
  let previous = 0;
  const rate = month.map((t) => {
    previous = rho * previous + source.normal();
    return 2 + 0.05 * t + previous;
  });
  return { month, rate };
}

describe('Durbin-Watson statistic and its null distribution', () => {
  it('computes d from its definition on a hand-checked residual vector', () => {
    // e = (1, -1, 2, 0): differences -2, 3, -2 -> 4 + 9 + 4 = 17; sum of squares 1 + 1 + 4 + 0 = 6.
    expect(durbinWatsonStatistic([1, -1, 2, 0])).toBeCloseTo(17 / 6, 14);
  });

  it('gives the exact null mean and variance, checked against explicit n x n traces of MA and (MA)^2', () => {
    const n = 25;
    const source = seededSource(5);
    const spread = Array.from({ length: n }, () => source.uniform());
    const columns = [ones(n), trendDesign(n).month.map(Number), spread];
    const base = normalEquationsFit(columns, spread.map((v, i) => v + i));
    const moments = durbinWatsonNullMoments(
      columns.map((c) => Float64Array.from(c)),
      base.inverseGram.to2DArray().map((row) => Float64Array.from(row)),
      n,
    );
    // Direct construction: M = I - X (X'X)^-1 X', A tridiagonal (1, 2, ..., 2, 1; -1 off the diagonal).
    const x = rowMatrix(columns);
    const m = Matrix.eye(n).sub(x.mmul(base.inverseGram).mmul(x.transpose()));
    const a = Matrix.zeros(n, n);
    for (let t = 0; t < n; t++) {
      a.set(t, t, t === 0 || t === n - 1 ? 1 : 2);
      if (t > 0) {
        a.set(t, t - 1, -1);
        a.set(t - 1, t, -1);
      }
    }
    const ma = m.mmul(a);
    const p = ma.trace();
    const q = ma.mmul(ma).trace();
    const nu = n - 3;
    expect(moments.mean).toBeCloseTo(p / nu, 10);
    expect(moments.variance).toBeCloseTo((2 * (q - (p * p) / nu)) / (nu * (nu + 2)), 10);
  });

  it('places the 5% point between the published bounds dL = 1.20 and dU = 1.41 (n = 20, one regressor)', () => {
    // Savin & White 1977 (Econometrica 45(8)) table, n = 20, k' = 1, 5%: dL = 1.201, dU = 1.411 (value from memory).
    // Any design's exact 5% point lies in [dL, dU]; the beta approximation should respect that up to 0.01 in p.
    const { month } = trendDesign(20);
    const source = seededSource(9);
    const model = fittedModel({ month }, month.map((t) => 1 + 0.1 * t + source.normal()));
    const columns = model.design.columns;
    const { mean, variance } = durbinWatsonNullMoments(columns, model.solution.unscaledCovariance, 20);
    expect(durbinWatsonLowerTail(1.201, mean, variance)).toBeLessThan(0.06);
    expect(durbinWatsonLowerTail(1.411, mean, variance)).toBeGreaterThan(0.04);
  });

  it('agrees with a seeded Monte Carlo of d under independent normal errors to within 0.015', () => {
    const n = 30;
    const { month } = trendDesign(n);
    const model = fittedModel({ month }, month.map((t) => 0.5 * t + Math.sin(t)));
    const { mean, variance } = durbinWatsonNullMoments(model.design.columns, model.solution.unscaledCovariance, n);
    const source = seededSource(77);
    const draws: number[] = [];
    for (let r = 0; r < 4000; r++) {
      const y = month.map(() => source.normal());
      draws.push(durbinWatsonStatistic(normalEquationsFit([ones(n), month], y).residuals));
    }
    for (const point of [1.4, 1.7, 2.0, 2.4]) {
      const empirical = draws.filter((d) => d <= point).length / draws.length;
      // Monte Carlo standard error at most 0.008 with 4000 draws.
      expect(Math.abs(durbinWatsonLowerTail(point, mean, variance) - empirical)).toBeLessThan(0.025);
    }
  });

  it('flags positive AR(1) errors (rho = 0.6, n = 60) in at least 90% of 100 seeded runs', () => {
    let flags = 0;
    for (let run = 0; run < 100; run++) {
      const { month, rate } = autocorrelatedSeries(300 + run, 60, 0.6);
      if (durbinWatsonTest(fittedModel({ month }, rate), 0.05).flagged) flags++;
    }
    expect(flags).toBeGreaterThanOrEqual(90);
  });
});
