/**
 * fitModel: the engine's public entry point for one least-squares fit.
 *
 * Validates the input (fit-input.ts), applies the functional form (functional-forms.ts), solves
 * (least-squares.ts, or the straight-line fast path in simple-regression.ts for one predictor with an
 * intercept and no weights), and assembles the coefficient table, ANOVA, R², information criteria,
 * practitioner effects, and optionally per-observation arrays. All statistics are on the model's scale
 * (ln y for log-y forms); for log-y forms `originalScale` adds Duan's smearing factor and the
 * log-likelihood, AIC and BIC converted to the scale of y.
 *
 * The result is a plain JSON-serialisable object. Numbers that would be infinite or undefined (the
 * t-statistics of a perfect fit, for example) are null, never NaN or Infinity.
 */

import { assertRepresentable, assertResponseRepresentable } from './representable';
import { AnovaTable, goodnessOfFit, RSquaredDefinition, totalSumOfSquares } from './anova';
import { CoefficientEstimate, coefficientTable } from './coefficient-inference';
import { ensureFinite, FitInput, validateFitInput, ValidatedInput } from './fit-input';
import {
  CoefficientEffect,
  coefficientEffect,
  FunctionalForm,
  predictorTransformation,
  responseTransformation,
  Transformation,
  transformColumn,
} from './functional-forms';
import { influenceMeasures } from './influence';
import { InformationCriteria, informationCriteria, logJacobianOfLogResponse } from './information-criteria';
import { INTERCEPT_NAME, LeastSquaresMethod, LeastSquaresSolution, solveLeastSquares } from './least-squares';
import { fitSimpleLine, simpleLineObservations } from './simple-regression';
import { backTransform, smearingFactor } from './smearing';
import { ENGINE_VERSION } from './version';
import { AccuracyReport, coefficientAccuracy, standardErrorAccuracy } from './accuracy';

export interface ObservationResults {
  /** Fitted values on the model's scale. */
  fitted: number[];
  /** y - yhat on the model's scale (not multiplied by sqrt(w)). */
  residuals: number[];
  leverage: number[];
  standardisedResiduals: (number | null)[];
  studentisedResiduals: (number | null)[];
  cooksDistance: (number | null)[];
  /** Log-y forms only: exp(fitted), an estimate of the median of y. */
  fittedOriginalScaleNaive?: number[];
  /** Log-y forms only: exp(fitted) times Duan's smearing factor, an estimate of the mean of y. */
  fittedOriginalScaleSmeared?: number[];
}

export interface OriginalScaleSummary {
  /** Duan's smearing factor: mean of exp(residual) on the log scale. */
  smearingFactor: number;
  /** Log-likelihood, AIC and BIC of y itself (Jacobian-adjusted: log-likelihood - sum ln y). */
  logLikelihood: number | null;
  aic: number | null;
  bic: number | null;
}

export interface FitResult {
  engineVersion: string;
  form: FunctionalForm;
  transformations: { response: Transformation; predictors: Transformation };
  response: string;
  predictors: string[];
  intercept: boolean;
  /** Name of the weight column, or null for ordinary least squares. */
  weights: string | null;
  observationCount: number;
  coefficientCount: number;
  confidenceLevel: number;
  coefficients: CoefficientEstimate[];
  anova: AnovaTable;
  rSquared: number;
  adjustedRSquared: number;
  rSquaredDefinition: RSquaredDefinition;
  /** Residual standard deviation s = sqrt(RSS / (n - p)), on the model's scale. */
  residualStandardError: number;
  residualDegreesOfFreedom: number;
  informationCriteria: InformationCriteria;
  /** True when the residual sum of squares is exactly zero. */
  perfectFit: boolean;
  /** One entry per predictor: its coefficient read in the form's units. */
  effects: CoefficientEffect[];
  originalScale: OriginalScaleSummary | null;
  observations?: ObservationResults;
  numerics: {
    method: LeastSquaresMethod | 'straight-line';
    conditionNumber: number | null;
    refinementSteps: number;
    /** A-posteriori relative error bounds of the coefficients and classical standard errors (accuracy.ts). */
    accuracy: AccuracyReport | null;
  };
}

interface CoreSolution {
  coefficients: Float64Array;
  unscaledCovariance: Float64Array[];
  residualSumOfSquares: number;
  totalSumOfSquares: number;
  observations: (() => { fitted: Float64Array; residuals: Float64Array; leverage: Float64Array }) | null;
  residualsForSmearing: () => Float64Array;
  numerics: FitResult['numerics'];
}

/** Below this many rows a one-predictor fit goes through the refined solver (and states its accuracy). */
export const STRAIGHT_LINE_MIN_ROWS = 100_000;

export function fitModel(input: FitInput): FitResult {
  return fitValidated(validateFitInput(input, { deferFiniteCheck: true }));
}

/**
 * Fit with already-validated input (compare-forms.ts reuses one validation for all forms). `presolved`
 * is the least-squares solution of exactly this model's design (intercept first, then the predictors
 * after the form's transforms, with the input's weights), when the caller already has it: the fit then
 * reuses it instead of solving again (analyse-model.ts shares one solve between the fit and its checks).
 */
export function fitValidated(input: ValidatedInput, presolved?: LeastSquaresSolution): FitResult {
  const { n, form, intercept, confidenceLevel } = input;
  const responseTransform = responseTransformation(form);
  const predictorTransform = predictorTransformation(form);
  const weights = input.weights ? input.weights.values : null;
  const names = input.predictors.map((p) => p.name);
  const terms = intercept ? [INTERCEPT_NAME, ...names] : names;
  const p = terms.length;
  const lows = input.predictors.map((predictor) => predictor.lowPart ?? null);
  const hasLowParts = lows.some((low) => low !== null);
  // The single-pass straight line is kept for long series, where its speed matters; shorter ones take the
  // refined solver, whose answers carry an a-posteriori accuracy bound (accuracy.ts).
  const straightLine = names.length === 1 && intercept && !weights && presolved === undefined && !hasLowParts && n > STRAIGHT_LINE_MIN_ROWS;
  // The straight-line pass checks finiteness as it goes; every other route checks first.
  if (!straightLine) for (const column of [input.response, ...input.predictors]) ensureFinite(column);
  const y = transformColumn(input.response.name, input.response.values, responseTransform);
  const xs = input.predictors.map((column) => transformColumn(column.name, column.values, predictorTransform));

  const core =
    (straightLine &&
      solveStraightLine(xs[0] as Float64Array, y, names[0] as string, input.response.name, input.includeObservations)) ||
    solveGeneral(xs, names, y, intercept, weights, input.includeObservations, presolved, hasLowParts ? lows : undefined);

  assertResponseRepresentable(core.residualSumOfSquares, input.response.name);
  const fit = goodnessOfFit(n, p, intercept, core.residualSumOfSquares, core.totalSumOfSquares, input.response.name);
  const residualMeanSquare = fit.anova.residual.meanSquare;
  const residualDf = n - p;
  const coefficients = coefficientTable(
    terms,
    core.coefficients,
    core.unscaledCovariance,
    residualMeanSquare,
    residualDf,
    confidenceLevel,
  );
  assertRepresentable(coefficients.map((c) => c.standardError), terms);
  const criteria = informationCriteria(n, p, core.residualSumOfSquares, weights);
  const effects = coefficients
    .filter((c) => c.term !== INTERCEPT_NAME || !intercept)
    .map((c) => coefficientEffect(form, c.term, c.estimate, c.confidenceInterval));

  let originalScale: OriginalScaleSummary | null = null;
  let smearing = 1;
  if (responseTransform === 'natural-log') {
    smearing = smearingFactor(core.residualsForSmearing(), weights);
    const adjusted = informationCriteria(
      n,
      p,
      core.residualSumOfSquares,
      weights,
      logJacobianOfLogResponse(input.response.values),
    );
    originalScale = { smearingFactor: smearing, logLikelihood: adjusted.logLikelihood, aic: adjusted.aic, bic: adjusted.bic };
  }

  const result: FitResult = {
    engineVersion: ENGINE_VERSION,
    form,
    transformations: { response: responseTransform, predictors: predictorTransform },
    response: input.response.name,
    predictors: names,
    intercept,
    weights: input.weights ? input.weights.name : null,
    observationCount: n,
    coefficientCount: p,
    confidenceLevel,
    coefficients,
    anova: fit.anova,
    rSquared: fit.rSquared,
    adjustedRSquared: fit.adjustedRSquared,
    rSquaredDefinition: fit.rSquaredDefinition,
    residualStandardError: Math.sqrt(residualMeanSquare),
    residualDegreesOfFreedom: residualDf,
    informationCriteria: criteria,
    perfectFit: !(core.residualSumOfSquares > 0),
    effects,
    originalScale,
    numerics: core.numerics,
  };
  if (input.includeObservations && core.observations) {
    const { fitted, residuals, leverage } = core.observations();
    const influence = influenceMeasures(residuals, leverage, weights, core.residualSumOfSquares, p);
    const observations: ObservationResults = {
      fitted: Array.from(fitted),
      residuals: Array.from(residuals),
      leverage: Array.from(leverage),
      ...influence,
    };
    if (responseTransform === 'natural-log') {
      observations.fittedOriginalScaleNaive = Array.from(backTransform(fitted, 1));
      observations.fittedOriginalScaleSmeared = Array.from(backTransform(fitted, smearing));
    }
    result.observations = observations;
  }
  return result;
}

function solveStraightLine(
  x: Float64Array,
  y: Float64Array,
  xName: string,
  yName: string,
  includeObservations: boolean,
): CoreSolution | null {
  const line = fitSimpleLine(x, y, xName, yName);
  if (!line) return null;
  const observations = () => simpleLineObservations(x, y, line);
  return {
    coefficients: Float64Array.of(line.intercept, line.slope),
    unscaledCovariance: line.unscaledCovariance,
    residualSumOfSquares: line.residualSumOfSquares,
    totalSumOfSquares: line.totalSumOfSquares,
    observations: includeObservations ? observations : null,
    residualsForSmearing: () => observations().residuals,
    numerics: { method: 'straight-line', conditionNumber: null, refinementSteps: 0, accuracy: null },
  };
}

function solveGeneral(
  xs: Float64Array[],
  names: string[],
  y: Float64Array,
  intercept: boolean,
  weights: Float64Array | null,
  includeObservations: boolean,
  presolved?: LeastSquaresSolution,
  lowParts?: (Float64Array | null)[],
): CoreSolution {
  const n = y.length;
  const columns = intercept ? [new Float64Array(n).fill(1), ...xs] : xs;
  const columnNames = intercept ? [INTERCEPT_NAME, ...names] : names;
  const designLowParts = lowParts ? (intercept ? [null, ...lowParts] : lowParts) : undefined;
  const solution =
    presolved ??
    solveLeastSquares({ names: columnNames, columns, n, hasIntercept: intercept, ...(designLowParts ? { lowParts: designLowParts } : {}) }, y, {
      ...(weights ? { weights } : {}),
      computeLeverage: includeObservations,
    });
  const leverage = solution.leverage;
  return {
    coefficients: solution.coefficients,
    unscaledCovariance: solution.unscaledCovariance,
    residualSumOfSquares: solution.residualSumOfSquares,
    totalSumOfSquares: totalSumOfSquares(y, weights, intercept),
    observations:
      includeObservations && leverage
        ? () => ({ fitted: solution.fitted, residuals: solution.residuals, leverage })
        : null,
    residualsForSmearing: () => solution.residuals,
    numerics: {
      method: solution.method,
      conditionNumber: solution.conditionNumber,
      refinementSteps: solution.refinementSteps,
      accuracy: {
        coefficients: coefficientAccuracy(solution, y, weights ?? undefined),
        standardErrors: standardErrorAccuracy(solution, new Float64Array(columns.length).fill(1), 'none'),
      },
    },
  };
}

/**
 * A variance beyond the double range (a predictor near 1e-160 has a slope near 1e160 whose variance is
 * 1e320) cannot be reported: the column must be rescaled. Raised instead of answering Infinity or NaN.
 */
