/**
 * analyseModel: one fit with the coefficient table and Wald test under a chosen covariance, plus the
 * assumption checks. Also the entry points for predictions (predict), batch fits (fitBatch) and
 * rolling-window fits (fitRolling).
 *
 * The fit input is the engine's FitInput (columns by name, response, predictors, intercept, weights,
 * form, confidenceLevel). Extra options:
 *   covariance: { type, lag?, smallSampleCorrection?, groups? }  (covariance.ts); `groups` is either the
 *     name of a column of numeric group ids in `columns` or one label per observation;
 *   diagnostics: a list of check names or 'all' (default 'all');
 *   significanceLevel: for every check's flag (default 0.05);
 *   diagnosticOptions: RESET power, Breusch-Pagan variant, Breusch-Godfrey lag and variant,
 *     Durbin-Watson alternative (analyse-model-diagnostics.ts).
 *
 * Errors: every EngineError of the fit itself, AnalysisError for bad options (field named), and the
 * covariance errors (lag, groups, leverage). Checks that are not defined for this model are reported
 * inside the diagnostics block instead of failing the call.
 */

import { FitInput } from './fit-input';
import { PreparedModel, prepareModel } from './analyse-model-design';
import { FitResult, fitValidated } from './fit-model';
import {
  DiagnosticOptions,
  DiagnosticsBlock,
  DiagnosticName,
  runDiagnostics,
  validateDiagnosticNames,
  validateDiagnosticOptions,
} from './analyse-model-diagnostics';
import { GroupLabel } from './covariance-cluster';
import { coefficientCovariance, CovarianceRequest, CovarianceType, validateCovarianceType } from './covariance';
import { coefficientInference, CoefficientInference } from './covariance-inference';
import { AnalysisError } from './diagnostics/analysis-error';
import { FittedModel } from './diagnostics/model-context';
import { validateSignificanceLevel } from './diagnostics/test-outcome';
import { predictAt, PredictionModel, PredictionResult } from './prediction';
export { predictAt } from './prediction';
export type { PredictionModel } from './prediction';
import { responseTransformation } from './functional-forms';
import { smearingFactor } from './smearing';
import { workingPredictionModel } from './working-coordinates';

export { fitBatch } from './batch-fit';
export type { BatchFitInput, BatchFitResult } from './batch-fit';
export { fitRolling } from './rolling-fit';
export type { RollingFitInput, RollingFitResult } from './rolling-fit';

export interface CovarianceOption {
  type: CovarianceType;
  lag?: number | 'automatic';
  smallSampleCorrection?: boolean;
  /** A column name in `columns` holding numeric group ids, or one label per observation. */
  groups?: string | ArrayLike<GroupLabel>;
}

export interface AnalysisInput extends FitInput {
  covariance?: CovarianceOption;
  diagnostics?: DiagnosticName[] | 'all';
  significanceLevel?: number;
  diagnosticOptions?: DiagnosticOptions;
}

export interface AnalysisResult extends CoefficientInference {
  observationCount: number;
  residualDegreesOfFreedom: number;
  significanceLevel: number;
  diagnostics: DiagnosticsBlock;
}

export interface PredictionInput extends FitInput {
  /** One list of predictor values per point, in the order of `predictors`, on the original scale. */
  points: number[][];
  covariance?: CovarianceOption;
}

export function analyseModel(input: AnalysisInput): AnalysisResult {
  return analyse(input).analysis;
}

export interface PredictionSnapshot {
  model: PredictionModel;
  covariance: CoefficientInference['covariance'];
  confidenceLevel: number;
}

/**
 * The fit (classical table, ANOVA, goodness of fit, forms), the analysis under the chosen covariance with
 * the checks, and the prediction snapshot, all from one least-squares solve.
 */
export function fitAndAnalyse(input: AnalysisInput): { fit: FitResult; analysis: AnalysisResult; snapshot: PredictionSnapshot } {
  const { analysis, snapshot, prepared } = analyse(input);
  return { fit: fitValidated({ ...prepared.input, includeObservations: input.includeObservations ?? false }, prepared.model.solution), analysis, snapshot };
}

function analyse(input: AnalysisInput): { analysis: AnalysisResult; snapshot: PredictionSnapshot; prepared: PreparedModel } {
  const significanceLevel = validateSignificanceLevel(input.significanceLevel);
  const names = validateDiagnosticNames(input.diagnostics);
  const diagnosticOptions = validateDiagnosticOptions(input.diagnosticOptions);
  const prepared = prepareModel(input);
  const { input: validated, model } = prepared;
  const covariance = coefficientCovariance(model, resolveCovariance(input, model));
  const inference = coefficientInference(model.design, model.solution.coefficients, covariance, validated.confidenceLevel);
  return {
    prepared,
    analysis: {
      ...inference,
      observationCount: model.design.n,
      residualDegreesOfFreedom: model.design.n - model.design.columns.length,
      significanceLevel,
      diagnostics: runDiagnostics(model, names, significanceLevel, diagnosticOptions),
    },
    snapshot: snapshotOf(validated, model, covariance),
  };
}

/**
 * Everything a later prediction needs from a fit (coefficients, their covariance under the chosen
 * choice, sigma², degrees of freedom, smearing factor), as plain data that can be stored and used again.
 */
export function predictionModelFor(input: FitInput & { covariance?: CovarianceOption }): PredictionSnapshot {
  const { input: validated, model } = prepareModel(input);
  return snapshotOf(validated, model, coefficientCovariance(model, resolveCovariance(input, model)));
}

function snapshotOf(
  validated: ReturnType<typeof prepareModel>['input'],
  model: FittedModel,
  covariance: ReturnType<typeof coefficientCovariance>,
): PredictionSnapshot {
  const n = model.design.n;
  const p = model.design.columns.length;
  const smearing =
    responseTransformation(validated.form) === 'natural-log'
      ? smearingFactor(model.solution.residuals, model.weights ?? null)
      : null;
  return {
    model: {
      ...pointLayout(validated.predictors),
      hasIntercept: validated.intercept,
      coefficients: model.solution.coefficients,
      covariance: covariance.matrix,
      ...(covariance.workingMatrix ? { working: workingPredictionModel(model.solution, covariance.workingMatrix, covariance.workingMatrixLow) } : {}),
      residualVariance: model.solution.residualSumOfSquares / (n - p),
      degreesOfFreedom: covariance.description.inferenceDegreesOfFreedom,
      form: validated.form,
      smearingFactor: smearing,
    },
    covariance: covariance.description,
    confidenceLevel: validated.confidenceLevel,
  };
}

/**
 * The values a point gives: one per predictor; with power terms, one per distinct column (in order of
 * first appearance), each design entry then being that value raised to its term's power.
 */
function pointLayout(predictors: ReturnType<typeof prepareModel>['input']['predictors']): Pick<PredictionModel, 'predictorNames' | 'terms'> {
  if (!predictors.some((predictor) => predictor.term)) return { predictorNames: predictors.map((predictor) => predictor.name) };
  const columns: string[] = [];
  const terms = predictors.map((predictor) => {
    const column = predictor.term ? predictor.term.column : predictor.name;
    if (!columns.includes(column)) columns.push(column);
    return { column: columns.indexOf(column), power: predictor.term ? predictor.term.power : 1 };
  });
  return { predictorNames: columns, terms };
}

export function predict(input: PredictionInput): PredictionResult & { covariance: CoefficientInference['covariance'] } {
  const { model, covariance, confidenceLevel } = predictionModelFor(input);
  return { ...predictAt(model, input.points, confidenceLevel), covariance };
}

function resolveCovariance(input: { columns: FitInput['columns']; covariance?: CovarianceOption }, model: FittedModel): CovarianceRequest {
  const option = input.covariance;
  if (option === undefined) return { type: 'classical' };
  if (option === null || typeof option !== 'object') {
    throw new AnalysisError('unknown-covariance', '"covariance" must be an object with a "type".', { field: 'covariance' });
  }
  const type = validateCovarianceType(option.type);
  const request: CovarianceRequest = { type };
  if (option.lag !== undefined) request.lag = option.lag;
  if (option.smallSampleCorrection !== undefined) request.smallSampleCorrection = option.smallSampleCorrection;
  if (type === 'cluster') {
    const groups = option.groups;
    if (typeof groups === 'string') {
      const column = Object.prototype.hasOwnProperty.call(input.columns, groups) ? input.columns[groups] : undefined;
      if (column === undefined || column === null) {
        throw new AnalysisError('invalid-cluster-groups', `The group column "${groups}" is not among the supplied columns.`, {
          field: 'covariance.groups',
          column: groups,
        });
      }
      request.groups = column as ArrayLike<GroupLabel>;
    } else if (groups !== undefined) {
      request.groups = groups;
    }
    if (request.groups !== undefined && request.groups.length !== model.design.n) {
      throw new AnalysisError(
        'invalid-cluster-groups',
        `The group labels have ${request.groups.length} entries; the fit has ${model.design.n} observations.`,
        { field: 'covariance.groups' },
      );
    }
  }
  return request;
}
