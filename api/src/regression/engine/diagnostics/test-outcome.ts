/**
 * The common shape of an assumption check: statistic, reference distribution with its degrees of
 * freedom, p-value, and a plain flag (p-value below the requested significance level).
 */

import { chiSquareSurvival, fisherFSurvival } from '../distributions';
import { AnalysisError } from './analysis-error';
import { FittedModel } from './model-context';

export type ReferenceDistribution = 'chi-square' | 'fisher-f' | 'beta-approximation';

export interface TestOutcome {
  statistic: number;
  distribution: ReferenceDistribution;
  /** Chi-square degrees of freedom, or the numerator degrees of freedom of an F statistic. */
  degreesOfFreedom: number | null;
  /** Denominator degrees of freedom of an F statistic; null otherwise. */
  denominatorDegreesOfFreedom: number | null;
  pValue: number;
  significanceLevel: number;
  /** True when pValue < significanceLevel: the assumption is rejected at that level. */
  flagged: boolean;
}

export const DEFAULT_SIGNIFICANCE_LEVEL = 0.05;

export function validateSignificanceLevel(level: unknown): number {
  if (level === undefined) return DEFAULT_SIGNIFICANCE_LEVEL;
  if (typeof level !== 'number' || !(level > 0 && level < 1)) {
    throw new AnalysisError(
      'invalid-significance-level',
      `The significance level must be a number strictly between 0 and 1 (for example 0.05); got ${JSON.stringify(level)}.`,
      { field: 'significanceLevel' },
    );
  }
  return level;
}

export function chiSquareOutcome(statistic: number, degreesOfFreedom: number, significanceLevel: number): TestOutcome {
  const pValue = chiSquareSurvival(Math.max(0, statistic), degreesOfFreedom);
  return {
    statistic,
    distribution: 'chi-square',
    degreesOfFreedom,
    denominatorDegreesOfFreedom: null,
    pValue,
    significanceLevel,
    flagged: pValue < significanceLevel,
  };
}

export function fisherFOutcome(
  statistic: number,
  numeratorDegreesOfFreedom: number,
  denominatorDegreesOfFreedom: number,
  significanceLevel: number,
): TestOutcome {
  const pValue = fisherFSurvival(Math.max(0, statistic), numeratorDegreesOfFreedom, denominatorDegreesOfFreedom);
  return {
    statistic,
    distribution: 'fisher-f',
    degreesOfFreedom: numeratorDegreesOfFreedom,
    denominatorDegreesOfFreedom,
    pValue,
    significanceLevel,
    flagged: pValue < significanceLevel,
  };
}

/** A test needs a non-zero residual sum of squares; an exact fit leaves nothing to test. */
export function requireResidualVariation(residualSumOfSquares: number, test: string): void {
  if (!(residualSumOfSquares > 0)) {
    throw new AnalysisError('perfect-fit', `The model fits every observation exactly, so the ${test} is not defined.`, {
      field: 'diagnostics',
    });
  }
}

export function requireImperfectFit(model: FittedModel, test: string): void {
  // One rule for the whole answer (perfect-fit.ts): the solver decides, every check reads its flag.
  if (model.solution.perfectFit) {
    throw new AnalysisError(
      'perfect-fit',
      `The model fits every observation exactly (to within the rounding of the response), so the ${test} is not defined.`,
      { field: 'diagnostics' },
    );
  }
}
