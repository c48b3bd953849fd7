/**
 * The public input of a fit, and its validation into Float64Array columns.
 *
 * Every rejection is an EngineError naming what the caller sent: `column` is the column name as given
 * in `columns`, `row` is a 0-based row index (messages say "0-based"), `field` is the option's name.
 */

import { EngineError } from './errors';
import { assertFinite, firstNonFinite, nonFiniteError } from './finite-values';
import { FUNCTIONAL_FORMS, FunctionalForm, predictorTransformation } from './functional-forms';
import { powerTerms } from './polynomial-terms';

export type ColumnValues = ArrayLike<number | null> | Float64Array;

export interface FitInput {
  /** Named columns of equal length; null marks a missing value (rejected). */
  columns: Record<string, ColumnValues>;
  /** Name of the response column. */
  response: string;
  /**
   * The predictors, at least one: a column name, or a power term { column, power } whose values the engine
   * computes from the raw column in double-double (polynomial-terms.ts), so a polynomial keeps the digits
   * that rounding each power to a double would lose. A power term's coefficient is named "column^power".
   */
  predictors: PredictorEntry[];
  /** Fit an intercept (default true). */
  intercept?: boolean;
  /** Name of a column of positive weights for weighted least squares. */
  weights?: string;
  /** Functional form (default 'lin-lin'). */
  form?: FunctionalForm;
  /** Level of the coefficient confidence intervals, strictly between 0 and 1 (default 0.95). */
  confidenceLevel?: number;
  /** Include per-observation arrays: fitted values, residuals, leverage, influence measures. */
  includeObservations?: boolean;
}

/**
 * A validated column. Float64Array inputs are used without copying, and their finiteness is checked
 * later, fused into the first pass that reads them (`finiteChecked` false until then); other arrays
 * are copied and checked here.
 */
export interface ValidatedColumn {
  name: string;
  values: Float64Array;
  finiteChecked: boolean;
  /** Power terms only: the low part of the double-double power (values + lowPart is x^k to ~32 digits). */
  lowPart?: Float64Array;
  /** Power terms only: the source column and the power. */
  term?: PowerTerm;
}

export interface PowerTerm {
  column: string;
  power: number;
}

export type PredictorEntry = string | PowerTerm;

/** Highest power a term may take (a degree-10 polynomial is the most demanding certified case). */
export const MAX_TERM_POWER = 20;

/** The coefficient name of a predictor entry: the column, or "column^power" for a power above 1. */
export function predictorEntryName(entry: PredictorEntry): string {
  return typeof entry === 'string' ? entry : entry.power === 1 ? entry.column : `${entry.column}^${entry.power}`;
}

/** The column a predictor entry reads. */
export function predictorEntryColumn(entry: PredictorEntry): string {
  return typeof entry === 'string' ? entry : entry.column;
}

function validatePredictorEntry(entry: unknown, index: number): PredictorEntry {
  if (typeof entry === 'string') return entry;
  const term = entry as Partial<PowerTerm> | null;
  if (term === null || typeof term !== 'object' || typeof term.column !== 'string' || term.column.length === 0) {
    throw new EngineError('invalid-argument', 'Every entry of "predictors" must be a column name or a power term { column, power }.', {
      field: `predictors/${index}`,
    });
  }
  if (!Number.isInteger(term.power) || (term.power as number) < 1 || (term.power as number) > MAX_TERM_POWER) {
    throw new EngineError('invalid-argument', `The power of a term must be an integer from 1 to ${MAX_TERM_POWER}.`, {
      field: `predictors/${index}/power`,
    });
  }
  return { column: term.column, power: term.power as number };
}

export interface ValidatedInput {
  n: number;
  response: ValidatedColumn;
  predictors: ValidatedColumn[];
  weights: { name: string; values: Float64Array } | null;
  intercept: boolean;
  form: FunctionalForm;
  confidenceLevel: number;
  includeObservations: boolean;
}

export const DEFAULT_CONFIDENCE_LEVEL = 0.95;

/**
 * Validates a fit request. Every used column is finite on return, unless `deferFiniteCheck` is set:
 * then Float64Array columns are left for the caller to check (`ensureFinite`, or fused into its first
 * pass) and carry `finiteChecked: false`.
 */
export function validateFitInput(input: FitInput, options: { deferFiniteCheck?: boolean } = {}): ValidatedInput {
  if (input === null || typeof input !== 'object') {
    throw new EngineError('invalid-argument', 'The fit input must be an object.', { field: 'input' });
  }
  const { columns } = input;
  if (columns === null || typeof columns !== 'object') {
    throw new EngineError('invalid-argument', '"columns" must map column names to arrays of numbers.', {
      field: 'columns',
    });
  }
  const form = validateForm(input.form);
  const confidenceLevel = validateConfidenceLevel(input.confidenceLevel);
  const intercept = input.intercept ?? true;
  if (typeof intercept !== 'boolean') {
    throw new EngineError('invalid-argument', '"intercept" must be true or false.', { field: 'intercept' });
  }
  if (typeof input.response !== 'string' || input.response.length === 0) {
    throw new EngineError('invalid-argument', '"response" must name a column.', { field: 'response' });
  }
  if (!Array.isArray(input.predictors) || input.predictors.length === 0) {
    throw new EngineError('invalid-argument', '"predictors" must list at least one column name.', {
      field: 'predictors',
    });
  }
  const entries = input.predictors.map(validatePredictorEntry);
  const seen = new Set<string>();
  entries.forEach((entry, index) => {
    const name = predictorEntryName(entry);
    if (seen.has(name)) {
      throw new EngineError('duplicate-column', `Predictor "${name}" is listed more than once in "predictors".`, {
        column: name,
        field: `predictors/${index}`,
      });
    }
    if (predictorEntryColumn(entry) === input.response) {
      throw new EngineError('duplicate-column', `Column "${predictorEntryColumn(entry)}" is the response and cannot also be a predictor.`, {
        column: predictorEntryColumn(entry),
        field: `predictors/${index}`,
      });
    }
    if (typeof entry !== 'string' && entry.power > 1 && predictorTransformation(form) === 'natural-log') {
      throw new EngineError(
        'invalid-argument',
        `The ${form} form takes logs of the predictors, so the power term "${name}" would only repeat ln of its column; use lin-lin or log-lin with power terms.`,
        { field: `predictors/${index}` },
      );
    }
    seen.add(name);
  });
  const used = [input.response, ...new Set(entries.map(predictorEntryColumn))];
  if (input.weights !== undefined) {
    if (typeof input.weights !== 'string') {
      throw new EngineError('invalid-argument', '"weights" must name a column.', { field: 'weights' });
    }
    used.push(input.weights);
  }
  let n = -1;
  for (const name of used) {
    const values = lookupColumn(columns, name);
    if (n < 0) {
      n = values.length;
      if (n === 0) {
        throw new EngineError('empty-input', `Column "${name}" has no values; a fit needs observations.`, {
          column: name,
        });
      }
    } else if (values.length !== n) {
      throw new EngineError(
        'length-mismatch',
        `Column "${name}" has ${values.length} values but column "${used[0]}" has ${n}; all columns must have the same length.`,
        { column: name },
      );
    }
  }
  const response = toValidatedColumn(input.response, lookupColumn(columns, input.response));
  const predictors = entries.map((entry) => validatedPredictor(entry, columns));
  if (!options.deferFiniteCheck) for (const column of [response, ...predictors]) ensureFinite(column);
  let weights: ValidatedInput['weights'] = null;
  if (input.weights !== undefined) {
    const values = toValidatedColumn(input.weights, lookupColumn(columns, input.weights)).values;
    assertFinite(input.weights, values);
    for (let i = 0; i < n; i++) {
      if (!(values[i]! > 0)) {
        throw new EngineError(
          'non-positive-weight',
          `Weight column "${input.weights}" has a value that is not positive (${values[i]}) at row ${i} (0-based); weights must be > 0.`,
          { column: input.weights, row: i },
        );
      }
    }
    weights = { name: input.weights, values };
  }
  const parameters = input.predictors.length + (intercept ? 1 : 0);
  if (n <= parameters) {
    throw new EngineError(
      'too-few-observations',
      `${n} observations cannot estimate ${parameters} coefficients and leave residual degrees of freedom; ` +
        `at least ${parameters + 1} are needed.`,
      { field: 'columns' },
    );
  }
  return {
    n,
    response,
    predictors,
    weights,
    intercept,
    form,
    confidenceLevel,
    includeObservations: input.includeObservations === true,
  };
}

function validatedPredictor(entry: PredictorEntry, columns: FitInput['columns']): ValidatedColumn {
  const column = toValidatedColumn(predictorEntryColumn(entry), lookupColumn(columns, predictorEntryColumn(entry)));
  if (typeof entry === 'string' || entry.power === 1) return column;
  ensureFinite(column);
  const terms = powerTerms(column.values, entry.power);
  return {
    name: predictorEntryName(entry),
    values: terms.columns[entry.power - 1] as Float64Array,
    lowPart: terms.lowParts[entry.power - 1] as Float64Array,
    finiteChecked: false,
    term: entry,
  };
}

export function validateForm(form: unknown): FunctionalForm {
  if (form === undefined) return 'lin-lin';
  if (typeof form !== 'string' || !(FUNCTIONAL_FORMS as readonly string[]).includes(form)) {
    throw new EngineError(
      'unknown-form',
      `Unknown functional form ${JSON.stringify(form)}; use one of ${FUNCTIONAL_FORMS.join(', ')}.`,
      { field: 'form' },
    );
  }
  return form as FunctionalForm;
}

export function validateConfidenceLevel(level: unknown): number {
  if (level === undefined) return DEFAULT_CONFIDENCE_LEVEL;
  if (typeof level !== 'number' || !(level > 0 && level < 1)) {
    throw new EngineError(
      'invalid-confidence-level',
      `The confidence level must be a number strictly between 0 and 1 (for example 0.95); got ${JSON.stringify(level)}.`,
      { field: 'confidenceLevel' },
    );
  }
  return level;
}

function lookupColumn(columns: Record<string, ColumnValues>, name: string): ColumnValues {
  const values = Object.prototype.hasOwnProperty.call(columns, name) ? columns[name] : undefined;
  if (values === undefined || values === null || typeof (values as ArrayLike<unknown>).length !== 'number') {
    throw new EngineError('missing-column', `Column "${name}" is not among the supplied columns.`, { column: name });
  }
  return values;
}

/** A Float64Array input is used as is (not copied, checked later); other inputs are copied and checked. */
function toValidatedColumn(name: string, values: ColumnValues): ValidatedColumn {
  const n = values.length;
  if (values instanceof Float64Array) return { name, values, finiteChecked: false };
  const result = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const value = values[i];
    if (typeof value !== 'number' || !Number.isFinite(value)) throw nonFiniteError(name, i, value);
    result[i] = value;
  }
  return { name, values: result, finiteChecked: true };
}

export function ensureFinite(column: ValidatedColumn): void {
  if (!column.finiteChecked) {
    const row = firstNonFinite(column.values);
    if (row >= 0) throw nonFiniteError(column.name, row, column.values[row]);
    column.finiteChecked = true;
  }
}
