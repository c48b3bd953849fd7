/**
 * Magnitudes a double cannot carry: the engine scales columns internally, but a reported variance or sum of
 * squares beyond about 1e308 cannot be represented, so the caller is asked to rescale the named column.
 */

import { EngineError } from './errors';
import { INTERCEPT_NAME } from './least-squares';

/** A response whose residual sum of squares overflows (|y| near 1e154 or above) must be rescaled. */
export function assertResponseRepresentable(residualSumOfSquares: number, responseName: string): void {
  if (Number.isFinite(residualSumOfSquares)) return;
  throw new EngineError(
    'magnitude-out-of-range',
    `The response "${responseName}" is so large (near 1e154 or above) that its sums of squares exceed the double range; ` +
      'rescale it (for example to thousands or millions) and fit again.',
    { column: responseName },
  );
}

/** A standard error that is not finite (its variance overflowed) names the coefficient whose column to rescale. */
export function assertRepresentable(standardErrors: number[], terms: string[]): void {
  const index = standardErrors.findIndex((value) => !Number.isFinite(value));
  if (index < 0) return;
  const term = terms[index] ?? `#${index}`;
  throw new EngineError(
    'magnitude-out-of-range',
    `The variance of the coefficient of "${term}" is beyond the double range (its column is tiny or huge in magnitude, ` +
      'beyond about 1e±150); rescale that column and fit again.',
    { column: term === INTERCEPT_NAME ? undefined : term },
  );
}
