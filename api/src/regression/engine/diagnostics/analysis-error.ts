/**
 * Rejections specific to diagnostics, robust covariances, predictions, batch and rolling fits.
 *
 * errors.ts holds the engine's stable list of codes and is not extended from here; these failures use
 * the code `invalid-argument` (so every existing mapping keeps working) and add a `reason` that names
 * the exact problem. `field` always names the request field to change (for example
 * `covariance.lag`, `covariance.groups`, `window`, `points`).
 */

import { EngineError, EngineErrorDetails } from '../errors';

export const ANALYSIS_ERROR_REASONS = [
  'invalid-lag',
  'lag-too-large',
  'too-few-clusters',
  'invalid-cluster-groups',
  'invalid-window',
  'window-too-long',
  'predictor-count-mismatch',
  'unknown-diagnostic',
  'unknown-covariance',
  'invalid-significance-level',
  'leverage-of-one',
  'perfect-fit',
  'test-not-defined',
] as const;

export type AnalysisErrorReason = (typeof ANALYSIS_ERROR_REASONS)[number];

export class AnalysisError extends EngineError {
  readonly reason: AnalysisErrorReason;

  constructor(reason: AnalysisErrorReason, message: string, details: EngineErrorDetails = {}) {
    super('invalid-argument', message, details);
    this.name = 'AnalysisError';
    this.reason = reason;
  }

  override toJSON(): ReturnType<EngineError['toJSON']> & { reason: AnalysisErrorReason } {
    return { ...super.toJSON(), reason: this.reason };
  }
}
