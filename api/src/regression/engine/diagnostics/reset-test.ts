/**
 * Ramsey's RESET test of functional form (Ramsey 1969, Journal of the Royal Statistical Society B
 * 31(2), 350-371), F-test variant with powers of the fitted values.
 *
 * The model is refitted with yhat^2, ..., yhat^maxPower added (yhat on the model's scale; the same
 * weights for a weighted fit) and
 *   F = ((RSS_restricted - RSS_augmented) / q) / (RSS_augmented / (n - p - q)),   F ~ F(q, n - p - q),
 * where q is the number of powers kept (a power exactly collinear with the design is dropped) and p the
 * model's coefficient count. Default maxPower = 3 (yhat^2 and yhat^3).
 *
 * Errors (AnalysisError reasons): `test-not-defined` when maxPower is not an integer >= 2, when every
 * power is collinear with the design, or when n - p - q < 1; `perfect-fit` when the model's RSS, or the
 * augmented model's RSS, is 0.
 */

import { AnalysisError } from './analysis-error';
import { fitAuxiliary } from './auxiliary-regression';
import { FittedModel, workingColumns } from './model-context';
import { fisherFOutcome, requireImperfectFit, requireResidualVariation, TestOutcome } from './test-outcome';

export interface ResetResult extends TestOutcome {
  variant: 'fitted-powers-f-test';
  /** The powers of the fitted values kept in the augmented regression. */
  powers: number[];
}

export const DEFAULT_RESET_MAX_POWER = 3;

export function resetTest(
  model: FittedModel,
  significanceLevel: number,
  maxPower: number = DEFAULT_RESET_MAX_POWER,
): ResetResult {
  if (!Number.isInteger(maxPower) || maxPower < 2) {
    throw new AnalysisError('test-not-defined', 'The highest power of the fitted values must be an integer of at least 2.', {
      field: 'diagnosticOptions.resetMaxPower',
    });
  }
  const { design, solution, weights } = model;
  requireImperfectFit(model, 'RESET test');
  const n = design.n;
  const p = design.columns.length;
  const powerNames: string[] = [];
  const powerColumns: Float64Array[] = [];
  const base = fittedForPowers(model);
  for (let power = 2; power <= maxPower; power++) {
    powerNames.push(`fitted^${power}`);
    powerColumns.push(base.map((value) => Math.pow(value, power)));
  }
  // The model's own residuals as the response: y = X b + e, so the residuals of e on [X, powers] are those
  // of y on [X, powers], without the response's level entering the auxiliary solve.
  const columns = workingColumns(model);
  const slopeNames = design.hasIntercept ? design.names.slice(1) : design.names;
  const slopeColumns = design.hasIntercept ? columns.slice(1) : columns;
  const augmented = fitAuxiliary([...slopeNames, ...powerNames], [...slopeColumns, ...powerColumns], solution.residuals, {
    constant: design.hasIntercept,
    ...(weights ? { weights } : {}),
  });
  const powers = powerNames.filter((name) => augmented.keptNames.includes(name)).map((name) => Number(name.slice(7)));
  const q = powers.length;
  const denominatorDegreesOfFreedom = n - p - q;
  if (q === 0 || augmented.coefficientCount !== p + q || denominatorDegreesOfFreedom < 1) {
    throw new AnalysisError(
      'test-not-defined',
      'The RESET test needs at least one power of the fitted values that is not collinear with the design and n - p - q >= 1.',
      { field: 'diagnostics' },
    );
  }
  const restricted = solution.residualSumOfSquares;
  const unrestricted = augmented.residualSumOfSquares;
  requireResidualVariation(unrestricted, 'RESET test (augmented regression)');
  const statistic = Math.max(0, (restricted - unrestricted) / q) / (unrestricted / denominatorDegreesOfFreedom);
  return {
    variant: 'fitted-powers-f-test',
    powers,
    ...fisherFOutcome(statistic, q, denominatorDegreesOfFreedom, significanceLevel),
  };
}

/**
 * The fitted values to raise to powers, shifted and scaled: with an intercept, yhat - g_0/c_0 computed in
 * working coordinates as sum_{j >= 1} g_j z_ij (no cancellation against the response's level), then
 * divided by a power of two near its largest magnitude. Shifting yhat by a constant and scaling it do not
 * change the span of {1, X, yhat^2, ..., yhat^k} when X contains the constant, so the statistic is the
 * one defined on yhat itself. Without an intercept no shift is allowed, only the scaling.
 */
function fittedForPowers(model: FittedModel): Float64Array {
  const { design, solution } = model;
  let values: Float64Array;
  if (design.hasIntercept) {
    const columns = workingColumns(model);
    const g = solution.working.coefficients;
    values = new Float64Array(design.n);
    for (let j = 1; j < columns.length; j++) {
      const column = columns[j] as Float64Array;
      const coefficient = g[j]!;
      for (let i = 0; i < design.n; i++) values[i]! += coefficient * column[i]!;
    }
  } else values = Float64Array.from(solution.fitted);
  let largest = 0;
  for (let i = 0; i < values.length; i++) largest = Math.max(largest, Math.abs(values[i]!));
  if (largest > 0 && Number.isFinite(largest)) {
    const inverse = Math.pow(2, -Math.round(Math.log2(largest)));
    for (let i = 0; i < values.length; i++) values[i]! *= inverse;
  }
  return values;
}
