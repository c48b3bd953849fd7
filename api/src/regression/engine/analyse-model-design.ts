/**
 * From a fit input (columns by name, response, predictors, intercept, weights, form) to the fitted model
 * the analyses work on: validated columns, the form's log transforms, the design matrix with the
 * intercept first, and the least-squares solution with leverages.
 *
 * Errors: those of validateFitInput (fit-input.ts), transformColumn (functional-forms.ts) and
 * solveLeastSquares (least-squares.ts), unchanged.
 */

import { FitInput, validateFitInput, ValidatedInput } from './fit-input';
import { predictorTransformation, responseTransformation, transformColumn } from './functional-forms';
import { DesignMatrix, INTERCEPT_NAME, solveLeastSquares } from './least-squares';
import { FittedModel } from './diagnostics/model-context';
import { assertResponseRepresentable } from './representable';

export interface PreparedModel {
  input: ValidatedInput;
  model: FittedModel;
}

export function buildDesign(input: ValidatedInput): { design: DesignMatrix; response: Float64Array } {
  const response = transformColumn(input.response.name, input.response.values, responseTransformation(input.form));
  const predictorScale = predictorTransformation(input.form);
  const columns = input.predictors.map((predictor) => transformColumn(predictor.name, predictor.values, predictorScale));
  const names = input.predictors.map((predictor) => predictor.name);
  const lows = input.predictors.map((predictor) => predictor.lowPart ?? null);
  const lowParts = lows.some((low) => low !== null) ? (input.intercept ? [null, ...lows] : lows) : undefined;
  const design: DesignMatrix = input.intercept
    ? { names: [INTERCEPT_NAME, ...names], columns: [new Float64Array(input.n).fill(1), ...columns], n: input.n, hasIntercept: true }
    : { names, columns, n: input.n, hasIntercept: false };
  if (lowParts) design.lowParts = lowParts;
  return { design, response };
}

export function prepareModel(fitInput: FitInput): PreparedModel {
  const input = validateFitInput(fitInput);
  const { design, response } = buildDesign(input);
  const weights = input.weights?.values;
  const solution = solveLeastSquares(design, response, { ...(weights ? { weights } : {}), computeLeverage: true });
  assertResponseRepresentable(solution.residualSumOfSquares, input.response.name);
  return { input, model: { design, response, solution, ...(weights ? { weights } : {}) } };
}
