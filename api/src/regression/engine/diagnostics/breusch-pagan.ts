/**
 * Breusch-Pagan test of constant error variance against variance depending on the regressors.
 *
 * Auxiliary regressors Z: a constant plus the model's non-constant regressors (whitened for a weighted
 * fit, see model-context.ts); df = number of columns of Z besides the constant.
 *
 * - 'studentised' (default; Koenker 1981, Journal of Econometrics 17(1), 107-112):
 *     LM = n R^2 of the regression of e_i^2 on Z (R^2 centred), LM ~ chi-square(df).
 * - 'original' (Breusch & Pagan 1979, Econometrica 47(5), 1287-1294):
 *     g_i = e_i^2 / sigma2, sigma2 = sum e_i^2 / n (the maximum-likelihood variance),
 *     LM = ESS / 2 with ESS the explained sum of squares of the regression of g on Z
 *     (ESS = sum (g_i - mean g)^2 - RSS_aux), LM ~ chi-square(df). Valid under normal errors only.
 *
 * Errors: AnalysisError `perfect-fit` when every residual is 0; `test-not-defined` when the model has
 * no non-constant regressor or the squared residuals do not vary.
 */

import { AnalysisError } from './analysis-error';
import { fitAuxiliary } from './auxiliary-regression';
import { FittedModel, nonConstantRegressors, scaledWhitenedResiduals } from './model-context';
import { chiSquareOutcome, requireImperfectFit, TestOutcome } from './test-outcome';

export type BreuschPaganVariant = 'studentised' | 'original';

export interface BreuschPaganResult extends TestOutcome {
  variant: BreuschPaganVariant;
  /** The auxiliary regressors kept (without the constant). */
  regressors: string[];
}

export function breuschPaganTest(
  model: FittedModel,
  significanceLevel: number,
  variant: BreuschPaganVariant = 'studentised',
): BreuschPaganResult {
  const residuals = scaledWhitenedResiduals(model);
  const n = residuals.length;
  const squares = residuals.map((value) => value * value);
  let residualSquareTotal = 0;
  for (let i = 0; i < n; i++) residualSquareTotal += squares[i]!;
  requireImperfectFit(model, 'Breusch-Pagan test');
  const regressors = nonConstantRegressors(model);
  const target = variant === 'original' ? squares.map((value) => (value * n) / residualSquareTotal) : squares;
  const auxiliary = fitAuxiliary(regressors.names, regressors.columns, target, { constant: true });
  const degreesOfFreedom = auxiliary.coefficientCount - 1;
  if (degreesOfFreedom < 1 || !(auxiliary.centredTotalSumOfSquares > 0)) {
    throw new AnalysisError(
      'test-not-defined',
      'The Breusch-Pagan test needs a non-constant regressor and squared residuals that vary.',
      { field: 'diagnostics' },
    );
  }
  const explained = Math.max(0, auxiliary.centredTotalSumOfSquares - auxiliary.residualSumOfSquares);
  const statistic =
    variant === 'original' ? explained / 2 : (n * explained) / auxiliary.centredTotalSumOfSquares;
  return {
    variant,
    regressors: auxiliary.keptNames,
    ...chiSquareOutcome(statistic, degreesOfFreedom, significanceLevel),
  };
}
