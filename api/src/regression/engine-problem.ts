import { FieldProblem, ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { AnalysisError } from './engine/diagnostics/analysis-error';
import { EngineError } from './engine/errors';

/** Engine fields that live under `model` in the request body. */
const MODEL_FIELDS = new Set(['response', 'predictors', 'weights', 'form', 'intercept']);

/** Engine field names that the request spells differently. */
const RENAMED_FIELDS: Record<string, string> = {
  'covariance.groups': 'covariance/groupColumn',
  responses: 'responses',
};

/** Turns an engine field (`covariance.lag`, `predictors`, `diagnostics/0`) into a JSON Pointer of the request. */
export function requestPointer(field: string): string {
  const renamed = RENAMED_FIELDS[field] ?? field.replace(/\./g, '/');
  const head = renamed.split('/')[0] ?? renamed;
  return MODEL_FIELDS.has(head) ? `#/model/${renamed}` : `#/${renamed}`;
}

/**
 * Maps a typed engine failure to one 422 problem: `code` is the engine's stable code (or the analysis
 * reason, which is more specific), and `errors` points at the request field or data cell to change.
 * Row numbers are 0-based positions in the data the model used.
 */
export function engineProblem(error: EngineError, dataPointer = '#/data/columns'): ProblemException {
  const fieldErrors: FieldProblem[] = [];
  if (error.field !== undefined) fieldErrors.push({ pointer: requestPointer(error.field), detail: error.message });
  if (error.column !== undefined) {
    const pointer = error.row !== undefined ? `${dataPointer}/${error.column}/${error.row}` : `${dataPointer}/${error.column}`;
    fieldErrors.push({ pointer, detail: error.message });
  }
  for (const column of error.columns ?? []) {
    if (column !== error.column) fieldErrors.push({ pointer: `${dataPointer}/${column}`, detail: error.message });
  }
  const code = error instanceof AnalysisError ? error.reason : error.code;
  return new ProblemException(PROBLEM_TYPES.engineRejected, error.message, fieldErrors, {
    code,
    ...(error.column !== undefined ? { column: error.column } : {}),
    ...(error.row !== undefined ? { row: error.row } : {}),
    ...(error.columns !== undefined ? { columns: error.columns } : {}),
  });
}

/** Runs engine work and converts its typed failures; anything else stays unexpected (a 500 and a log line). */
export function runEngine<T>(work: () => T, dataPointer?: string): T {
  try {
    return work();
  } catch (error) {
    if (error instanceof EngineError) throw engineProblem(error, dataPointer);
    throw error;
  }
}
