/** Checks for NaN, +-Infinity and missing values, naming the column and the 0-based row. */

import { EngineError } from './errors';

export function nonFiniteError(name: string, row: number, value: unknown): EngineError {
  const what = value === null || value === undefined ? 'a missing value' : `the non-finite value ${String(value)}`;
  return new EngineError('non-finite-value', `Column "${name}" has ${what} at row ${row} (0-based).`, {
    column: name,
    row,
  });
}

/** Raises `non-finite-value` for the first row (0-based) holding NaN or +-Infinity. */
export function assertFinite(name: string, values: Float64Array): void {
  for (let i = 0; i < values.length; i++) if (!Number.isFinite(values[i]!)) throw nonFiniteError(name, i, values[i]!);
}

/**
 * Index of the first NaN or +-Infinity, or -1. The common all-finite case costs one multiply-add per
 * element (x * 0 is NaN exactly when x is not finite); only a non-finite total triggers the scan.
 */
export function firstNonFinite(values: Float64Array): number {
  let probe = 0;
  for (let i = 0; i < values.length; i++) probe += values[i]! * 0;
  if (probe === 0) return -1;
  for (let i = 0; i < values.length; i++) if (!Number.isFinite(values[i]!)) return i;
  return -1;
}
