/**
 * White's test of constant error variance (White 1980, Econometrica 48(4), 817-838, section 5).
 *
 * LM = n R^2 (centred) of the regression of e_i^2 on a constant, the model's non-constant regressors,
 * their squares and all their pairwise cross-products; columns that repeat or combine others exactly
 * (a dummy's square, a constant) are dropped. LM ~ chi-square(df), df = number of auxiliary regressors
 * kept, the constant excluded. For a weighted fit the whitened residuals and regressors are used.
 *
 * Errors: AnalysisError `perfect-fit`; `test-not-defined` when no auxiliary regressor remains or
 * n <= number of auxiliary coefficients (raised by the solver as `too-few-observations`).
 */

import { AnalysisError } from './analysis-error';
import { fitAuxiliary } from './auxiliary-regression';
import { FittedModel, nonConstantRegressors, scaledWhitenedResiduals } from './model-context';
import { chiSquareOutcome, requireImperfectFit, TestOutcome } from './test-outcome';

export interface WhiteResult extends TestOutcome {
  variant: 'squares-and-cross-products';
  regressors: string[];
}

export function whiteTest(model: FittedModel, significanceLevel: number): WhiteResult {
  const residuals = scaledWhitenedResiduals(model);
  const n = residuals.length;
  const squares = residuals.map((value) => value * value);
  requireImperfectFit(model, 'White test');
  const base = nonConstantRegressors(model);
  const names = [...base.names];
  const columns = [...base.columns];
  for (let j = 0; j < base.columns.length; j++) {
    for (let k = j; k < base.columns.length; k++) {
      const left = base.columns[j] as Float64Array;
      const right = base.columns[k] as Float64Array;
      names.push(j === k ? `${base.names[j]}^2` : `${base.names[j]}*${base.names[k]}`);
      columns.push(left.map((value, i) => value * right[i]!));
    }
  }
  const auxiliary = fitAuxiliary(names, columns, squares, { constant: true });
  const degreesOfFreedom = auxiliary.coefficientCount - 1;
  if (degreesOfFreedom < 1 || !(auxiliary.centredTotalSumOfSquares > 0)) {
    throw new AnalysisError('test-not-defined', 'The White test needs at least one auxiliary regressor and squared residuals that vary.', {
      field: 'diagnostics',
    });
  }
  const explained = Math.max(0, auxiliary.centredTotalSumOfSquares - auxiliary.residualSumOfSquares);
  const statistic = (n * explained) / auxiliary.centredTotalSumOfSquares;
  return {
    variant: 'squares-and-cross-products',
    regressors: auxiliary.keptNames,
    ...chiSquareOutcome(statistic, degreesOfFreedom, significanceLevel),
  };
}
