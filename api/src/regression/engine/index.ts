/** Public surface of the regression engine (framework-free; see "The regression engine" in DEVELOPERS.md). */

export { ENGINE_VERSION } from './version';
export { EngineError, ENGINE_ERROR_CODES, isEngineError } from './errors';
export type { EngineErrorCode, EngineErrorDetails } from './errors';
export { fitModel } from './fit-model';
export type { FitResult, ObservationResults, OriginalScaleSummary } from './fit-model';
export type { FitInput, ColumnValues } from './fit-input';
export { DEFAULT_CONFIDENCE_LEVEL } from './fit-input';
export { compareForms } from './compare-forms';
export type { CompareFormsInput, FormComparison, FormCriteria, SkippedForm } from './compare-forms';
export { FUNCTIONAL_FORMS, effectValue } from './functional-forms';
export type { FunctionalForm, CoefficientEffect, EffectUnit, Transformation } from './functional-forms';
export type { CoefficientEstimate } from './coefficient-inference';
export type { AnovaTable, AnovaLine, RSquaredDefinition } from './anova';
export type { InformationCriteria } from './information-criteria';
export { solveLeastSquares, INTERCEPT_NAME } from './least-squares';
export type { DesignMatrix, LeastSquaresSolution, LeastSquaresOptions, LeastSquaresMethod } from './least-squares';
export { powerTerms } from './polynomial-terms';
export * as distributions from './distributions';
export { analyseModel, fitAndAnalyse, predict, fitBatch, fitRolling } from './analyse-model';
export type {
  AnalysisInput,
  AnalysisResult,
  CovarianceOption,
  PredictionInput,
  BatchFitInput,
  BatchFitResult,
  RollingFitInput,
  RollingFitResult,
} from './analyse-model';
export { AnalysisError } from './diagnostics/analysis-error';
