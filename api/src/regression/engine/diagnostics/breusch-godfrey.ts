/**
 * Breusch-Godfrey test for serial correlation of the errors up to order `lag`, rows in time order
 * (Breusch 1978, Australian Economic Papers 17(31), 334-355; Godfrey 1978, Econometrica 46(6),
 * 1293-1301).
 *
 * Auxiliary regression of e_t on the model's regressors and e_{t-1}, ..., e_{t-lag}, with the lagged
 * residuals before the start of the sample set to 0 (so all n rows are used). With RSS_aux its residual
 * sum of squares:
 *   LM = n (1 - RSS_aux / sum e_t^2)  ~ chi-square(lag)          (variant 'lm', the default)
 *   F  = ((sum e_t^2 - RSS_aux) / lag) / (RSS_aux / (n - p - lag)) ~ F(lag, n - p - lag)  (variant 'f')
 * For an intercept model the residuals have mean 0, so 1 - RSS_aux / sum e^2 is the usual R^2. For a
 * weighted fit, whitened residuals and regressors are used. Default lag: 1.
 *
 * Errors: AnalysisError `invalid-lag` (not a positive integer), `lag-too-large` (n - p - lag < 1),
 * `perfect-fit`; field `diagnosticOptions.breuschGodfreyLag`.
 */

import { AnalysisError } from './analysis-error';
import { fitAuxiliary } from './auxiliary-regression';
import { FittedModel, modelRegressors, scaledWhitenedResiduals } from './model-context';
import { chiSquareOutcome, fisherFOutcome, requireImperfectFit, requireResidualVariation, TestOutcome } from './test-outcome';

export type BreuschGodfreyVariant = 'lm' | 'f';

export interface BreuschGodfreyResult extends TestOutcome {
  variant: BreuschGodfreyVariant;
  lag: number;
}

export const DEFAULT_BREUSCH_GODFREY_LAG = 1;

export function breuschGodfreyTest(
  model: FittedModel,
  significanceLevel: number,
  lag: number = DEFAULT_BREUSCH_GODFREY_LAG,
  variant: BreuschGodfreyVariant = 'lm',
): BreuschGodfreyResult {
  const residuals = scaledWhitenedResiduals(model);
  const n = residuals.length;
  const p = model.design.columns.length;
  if (!Number.isInteger(lag) || lag < 1) {
    throw new AnalysisError('invalid-lag', `The Breusch-Godfrey lag must be a positive integer; got ${lag}.`, {
      field: 'diagnosticOptions.breuschGodfreyLag',
    });
  }
  if (n - p - lag < 1) {
    throw new AnalysisError(
      'lag-too-large',
      `A Breusch-Godfrey lag of ${lag} leaves no residual degrees of freedom with ${n} observations and ${p} coefficients; use at most ${n - p - 1}.`,
      { field: 'diagnosticOptions.breuschGodfreyLag' },
    );
  }
  let residualSquareTotal = 0;
  for (let i = 0; i < n; i++) residualSquareTotal += residuals[i]! * residuals[i]!;
  requireImperfectFit(model, 'Breusch-Godfrey test');
  const regressors = modelRegressors(model);
  const lagNames: string[] = [];
  const lagColumns: Float64Array[] = [];
  for (let l = 1; l <= lag; l++) {
    const column = new Float64Array(n);
    for (let t = l; t < n; t++) column[t] = residuals[t - l]!;
    lagNames.push(`residual lag ${l}`);
    lagColumns.push(column);
  }
  const auxiliary = fitAuxiliary([...regressors.names, ...lagNames], [...regressors.columns, ...lagColumns], residuals, {
    constant: regressors.constant,
  });
  const keptLags = lagNames.filter((name) => auxiliary.keptNames.includes(name)).length;
  if (keptLags < 1) {
    throw new AnalysisError('test-not-defined', 'Every lagged residual is collinear with the regressors.', {
      field: 'diagnostics',
    });
  }
  const explained = Math.max(0, residualSquareTotal - auxiliary.residualSumOfSquares);
  if (variant === 'f') {
    const denominatorDegreesOfFreedom = n - auxiliary.coefficientCount;
    requireResidualVariation(auxiliary.residualSumOfSquares, 'Breusch-Godfrey F test');
    const statistic = explained / keptLags / (auxiliary.residualSumOfSquares / denominatorDegreesOfFreedom);
    return { variant, lag, ...fisherFOutcome(statistic, keptLags, denominatorDegreesOfFreedom, significanceLevel) };
  }
  const statistic = (n * explained) / residualSquareTotal;
  return { variant, lag, ...chiSquareOutcome(statistic, keptLags, significanceLevel) };
}
