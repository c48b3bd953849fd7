import type { components } from '@/lib/api-schema';

type Schemas = components['schemas'];

/**
 * Every regression answer (fit, comparison, prediction, batch, rolling, or a stored result read back)
 * shares this envelope; `kind` says which of the optional sections is present.
 */
export type ResultPayload = Schemas['StoredResultResponseDto'] & {
  usage?: Schemas['UsageChargeDto'];
  covariance?: Schemas['CovarianceDescriptionDto'];
};

export type FitResult = Schemas['FitResultDto'];
export type InferenceResult = Schemas['InferenceResultDto'];
export type Diagnostics = Schemas['DiagnosticsDto'];
export type ComparisonResult = Schemas['FormComparisonResultDto'];
export type PredictionResult = Schemas['PredictionResultDto'];
export type BatchResult = Schemas['BatchFitResultDto'];
export type RollingResult = Schemas['RollingFitResultDto'];
