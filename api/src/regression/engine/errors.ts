/**
 * Typed failures of the regression engine.
 *
 * The engine never answers degenerate input with NaN: every rejected input raises an EngineError whose
 * `code` is stable (the API maps each code to its own problem type) and which names what to change:
 * `column` (a column name as given in the request), `row` (0-based row index), `field` (a request
 * field such as `confidenceLevel`) or `columns` (several columns, e.g. a collinear group).
 */

export const ENGINE_ERROR_CODES = [
  'empty-input',
  'length-mismatch',
  'missing-column',
  'duplicate-column',
  'non-finite-value',
  'too-few-observations',
  'constant-column',
  'constant-response',
  'zero-column',
  'collinear-columns',
  'non-positive-log-argument',
  'non-positive-weight',
  'invalid-confidence-level',
  'unknown-form',
  'invalid-argument',
  'magnitude-out-of-range',
  'no-form-fits',
] as const;

export type EngineErrorCode = (typeof ENGINE_ERROR_CODES)[number];

export interface EngineErrorDetails {
  column?: string;
  row?: number;
  field?: string;
  columns?: string[];
}

export class EngineError extends Error {
  readonly code: EngineErrorCode;
  readonly column?: string;
  readonly row?: number;
  readonly field?: string;
  readonly columns?: string[];

  constructor(code: EngineErrorCode, message: string, details: EngineErrorDetails = {}) {
    super(message);
    this.name = 'EngineError';
    this.code = code;
    if (details.column !== undefined) this.column = details.column;
    if (details.row !== undefined) this.row = details.row;
    if (details.field !== undefined) this.field = details.field;
    if (details.columns !== undefined) this.columns = [...details.columns];
  }

  /** Plain object for logs and for the API's problem-details mapping. */
  toJSON(): { code: EngineErrorCode; message: string } & EngineErrorDetails {
    return {
      code: this.code,
      message: this.message,
      ...(this.column !== undefined ? { column: this.column } : {}),
      ...(this.row !== undefined ? { row: this.row } : {}),
      ...(this.field !== undefined ? { field: this.field } : {}),
      ...(this.columns !== undefined ? { columns: [...this.columns] } : {}),
    };
  }
}

export function isEngineError(value: unknown): value is EngineError {
  return value instanceof EngineError;
}
