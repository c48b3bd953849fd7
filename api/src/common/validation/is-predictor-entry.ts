import { ValidateBy, ValidationOptions } from 'class-validator';

/** Highest power a predictor term may take (the engine's MAX_TERM_POWER; checked again there). */
export const MAX_PREDICTOR_POWER = 20;
const MAX_NAME_LENGTH = 200;

/**
 * One predictor entry: a column name, or a power term { column, power } with nothing else in it.
 * class-validator has no union type, so the element check is written here; `each: true` names the index.
 */
export function predictorEntryProblem(value: unknown): string | null {
  if (typeof value === 'string') {
    return value.length > 0 && value.length <= MAX_NAME_LENGTH ? null : `must be a column name of 1 to ${MAX_NAME_LENGTH} characters`;
  }
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return 'must be a column name or a power term { column, power }';
  const record = value as Record<string, unknown>;
  const extra = Object.keys(record).filter((key) => key !== 'column' && key !== 'power');
  if (extra.length > 0) return `a power term takes only "column" and "power" (not ${extra.map((key) => `"${key}"`).join(', ')})`;
  if (typeof record.column !== 'string' || record.column.length === 0 || record.column.length > MAX_NAME_LENGTH) {
    return `a power term's "column" must be a column name of 1 to ${MAX_NAME_LENGTH} characters`;
  }
  if (typeof record.power !== 'number' || !Number.isInteger(record.power) || record.power < 1 || record.power > MAX_PREDICTOR_POWER) {
    return `a power term's "power" must be an integer from 1 to ${MAX_PREDICTOR_POWER}`;
  }
  return null;
}

/** The first bad entry of a predictor list as "@/index: reason" (validation-errors.ts turns it into a pointer). */
function listProblem(value: unknown): string | null {
  if (!Array.isArray(value)) return null;
  for (let index = 0; index < value.length; index++) {
    const problem = predictorEntryProblem(value[index]);
    if (problem) return `@/${index}: ${problem}`;
  }
  return null;
}

/** Every element of the array is a predictor entry; the message names the first bad one by its index. */
export function IsPredictorList(options?: ValidationOptions): PropertyDecorator {
  return ValidateBy(
    {
      name: 'isPredictorList',
      validator: {
        validate: (value: unknown) => !Array.isArray(value) || listProblem(value) === null,
        defaultMessage: (args) => listProblem(args?.value) ?? 'must list column names or power terms',
      },
    },
    options,
  );
}
