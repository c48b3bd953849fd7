/**
 * The four functional forms on noiseless data generated from known parameters: the fit must recover
 * the generating coefficient, and each effect must equal its defining formula evaluated at that known
 * coefficient (log-lin: 100(e^b - 1); lin-log: b ln 1.01; log-log: elasticity b and 100(1.01^b - 1)).
 * Duan's smearing factor is checked on data whose residuals are exactly +-d, where it equals cosh(d)
 * (Duan, 1983, JASA 78: the factor is the mean of exp(residual)).
 */
import { fitModel } from './fit-model';

const x = Array.from({ length: 24 }, (_, i) => 1 + i * 0.75);

describe('functional forms recover known coefficients and report their effects', () => {
  it('log-lin: exact percentage change per unit beside the approximation', () => {
    const b = 0.03;
    const y = x.map((v) => Math.exp(0.4 + b * v));
    const result = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'], form: 'log-lin' });
    expect(Math.abs(result.coefficients[1]!.estimate - b)).toBeLessThan(1e-12);
    const effect = result.effects[0]!;
    expect(effect.unit).toBe('percent-per-predictor-unit');
    expect(Math.abs(effect.value - 100 * (Math.exp(b) - 1))).toBeLessThan(1e-9);
    expect(Math.abs(effect.approximation - 100 * b)).toBeLessThan(1e-9);
    expect(result.transformations).toEqual({ response: 'natural-log', predictors: 'none' });
  });

  it('lin-log: change in y for a 1% rise in x', () => {
    const b = 5;
    const y = x.map((v) => 2 + b * Math.log(v));
    const result = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'], form: 'lin-log' });
    expect(Math.abs(result.coefficients[1]!.estimate - b)).toBeLessThan(1e-12);
    expect(Math.abs(result.effects[0]!.value - b * Math.log(1.01))).toBeLessThan(1e-12);
    expect(Math.abs(result.effects[0]!.approximation - b / 100)).toBeLessThan(1e-12);
  });

  it('log-log: the elasticity, and the exact change for a 1% rise', () => {
    const b = 0.7;
    const y = x.map((v) => 3 * Math.pow(v, b));
    const result = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'], form: 'log-log' });
    const effect = result.effects[0]!;
    expect(Math.abs(effect.elasticity! - b)).toBeLessThan(1e-12);
    expect(Math.abs(effect.value - 100 * (Math.pow(1.01, b) - 1))).toBeLessThan(1e-10);
    expect(effect.confidenceInterval.lower).toBeLessThanOrEqual(effect.value);
  });

  it('effects are reported for every predictor of a multi-predictor model', () => {
    const z = x.map((v, i) => 2 + ((i * 5) % 7));
    const y = x.map((v, i) => Math.exp(1 + 0.02 * v - 0.1 * z[i]!));
    const result = fitModel({ columns: { x, z, y }, response: 'y', predictors: ['x', 'z'], form: 'log-lin' });
    expect(result.effects.map((e) => e.term)).toEqual(['x', 'z']);
    expect(Math.abs(result.effects[1]!.value - 100 * Math.expm1(-0.1))).toBeLessThan(1e-9);
  });

  it("Duan's smearing factor equals cosh(d) when the log-scale residuals are exactly +-d", () => {
    const d = 0.2;
    const xs: number[] = [];
    const ys: number[] = [];
    for (const v of [1, 2, 3, 4, 5, 6]) {
      xs.push(v, v);
      ys.push(Math.exp(1 + 0.5 * v + d), Math.exp(1 + 0.5 * v - d));
    }
    const result = fitModel({ columns: { x: xs, y: ys }, response: 'y', predictors: ['x'], form: 'log-lin', includeObservations: true });
    expect(Math.abs(result.originalScale!.smearingFactor - Math.cosh(d))).toBeLessThan(1e-12);
    const naive = result.observations!.fittedOriginalScaleNaive!;
    const smeared = result.observations!.fittedOriginalScaleSmeared!;
    expect(Math.abs(naive[0]! - Math.exp(1.5)) / Math.exp(1.5)).toBeLessThan(1e-12);
    expect(Math.abs(smeared[0]! - Math.exp(1.5) * Math.cosh(d)) / Math.exp(1.5)).toBeLessThan(1e-12);
  });

  it('log-y forms report criteria on the scale of y with the Jacobian term -sum ln y', () => {
    const y = x.map((v, i) => Math.exp(0.3 + 0.05 * v + 0.1 * Math.sin(i * 1.7)));
    const result = fitModel({ columns: { x, y }, response: 'y', predictors: ['x'], form: 'log-lin' });
    const logSum = y.reduce((sum, v) => sum + Math.log(v), 0);
    expect(Math.abs(result.originalScale!.logLikelihood! - (result.informationCriteria.logLikelihood! - logSum))).toBeLessThan(1e-9);
    expect(Math.abs(result.originalScale!.aic! - (result.informationCriteria.aic! + 2 * logSum))).toBeLessThan(1e-9);
  });
});
