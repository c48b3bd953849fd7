import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { parsePlainNumber } from '../datasets/ingest/column-builder';

export type MissingValuePolicy = 'drop-rows' | 'reject';
export const MISSING_VALUE_POLICIES: MissingValuePolicy[] = ['drop-rows', 'reject'];

export type RawColumn = ArrayLike<number | string | null> | Float64Array;

export interface ColumnRequirement {
  name: string;
  /** JSON Pointer of the request field that named this column (for error messages). */
  pointer: string;
  kind: 'numeric' | 'label';
}

export interface PreparedData {
  /** Numeric columns with missing rows removed (policy drop-rows) — all the same length. */
  numeric: Record<string, Float64Array>;
  /** Label columns (e.g. cluster groups), aligned with the numeric ones. */
  labels: Record<string, string[]>;
  rowsUsed: number;
  /** 0-based indices (in the caller's data) of the rows dropped for missing values. */
  rowsDropped: number[];
  rowsTotal: number;
}

const MAX_LISTED_ROWS = 20;

/**
 * A cell as a number: numbers as they are, and strings that are plain decimal numbers (a dataset column
 * stored as text because of one odd cell keeps its other cells as text too). Anything else is NaN.
 */
function numericValue(value: number | string | null | undefined): number {
  if (typeof value === 'number') return value;
  if (typeof value === 'string') return parsePlainNumber(value.trim());
  return Number.NaN;
}

function isMissing(value: number | string | null | undefined): boolean {
  return value === null || value === undefined || (typeof value === 'number' && Number.isNaN(value)) || value === '';
}

/**
 * Applies the request's missing-value policy to exactly the columns a model uses (listwise: a row is
 * dropped when any used column is missing there) and checks that numeric columns hold numbers. Rows are
 * reported 0-based, as positions in the arrays (or dataset rows) the caller sent.
 */
export function prepareModelData(
  columns: Record<string, RawColumn>,
  requirements: ColumnRequirement[],
  policy: MissingValuePolicy,
  sourcePointer: string,
): PreparedData {
  let length: number | undefined;
  let lengthFrom = '';
  for (const requirement of requirements) {
    const column = columns[requirement.name];
    if (column === undefined) {
      throw new ProblemException(
        PROBLEM_TYPES.unprocessable,
        `Column "${requirement.name}" (named at ${requirement.pointer}) is not in the data. Available: ${Object.keys(columns).join(', ') || 'none'}.`,
        [{ pointer: requirement.pointer, detail: `unknown column "${requirement.name}"` }],
        { code: 'unknown-column' },
      );
    }
    if (length === undefined) {
      length = column.length;
      lengthFrom = requirement.name;
    } else if (column.length !== length) {
      throw new ProblemException(
        PROBLEM_TYPES.unprocessable,
        `Column "${requirement.name}" has ${column.length} values but "${lengthFrom}" has ${length}; columns must have equal length.`,
        [{ pointer: `${sourcePointer}/${requirement.name}`, detail: `expected ${length} values` }],
        { code: 'unequal-lengths' },
      );
    }
  }
  const total = length ?? 0;
  const keep = new Uint8Array(total).fill(1);
  const missingRows: number[] = [];
  for (const requirement of requirements) {
    const column = columns[requirement.name] as RawColumn;
    for (let i = 0; i < total; i++) {
      const value = column[i];
      if (isMissing(value)) {
        if (keep[i]) missingRows.push(i);
        keep[i] = 0;
        continue;
      }
      if (requirement.kind === 'numeric' && !Number.isFinite(numericValue(value))) {
        const shown = typeof value === 'string' ? `"${value.slice(0, 40)}"` : String(value);
        throw new ProblemException(
          PROBLEM_TYPES.unprocessable,
          `Column "${requirement.name}" must be numeric, but row ${i} (0-based) holds ${shown}.`,
          [{ pointer: `${sourcePointer}/${requirement.name}/${i}`, detail: 'not a finite number' }],
          { code: 'non-numeric-value', column: requirement.name, row: i },
        );
      }
    }
  }
  missingRows.sort((a, b) => a - b);
  if (missingRows.length > 0 && policy === 'reject') {
    const listed = missingRows.slice(0, MAX_LISTED_ROWS);
    throw new ProblemException(
      PROBLEM_TYPES.unprocessable,
      `${missingRows.length} row(s) have missing values in the model's columns (0-based rows ${listed.join(', ')}` +
        `${missingRows.length > listed.length ? ', …' : ''}). Fill them, or set missingValues to "drop-rows".`,
      listed.map((row) => ({ pointer: `${sourcePointer}/*/${row}`, detail: 'missing value' })),
      { code: 'missing-values', rows: listed, missingRowCount: missingRows.length },
    );
  }
  const used = total - missingRows.length;
  const numeric: Record<string, Float64Array> = {};
  const labels: Record<string, string[]> = {};
  for (const requirement of requirements) {
    const column = columns[requirement.name] as RawColumn;
    if (requirement.kind === 'numeric') {
      if (missingRows.length === 0 && column instanceof Float64Array) {
        numeric[requirement.name] = column;
        continue;
      }
      const values = new Float64Array(used);
      for (let i = 0, j = 0; i < total; i++) if (keep[i]) values[j++] = numericValue(column[i]);
      numeric[requirement.name] = values;
    } else {
      const values: string[] = new Array<string>(used);
      for (let i = 0, j = 0; i < total; i++) if (keep[i]) values[j++] = String(column[i]);
      labels[requirement.name] = values;
    }
  }
  return { numeric, labels, rowsUsed: used, rowsDropped: missingRows, rowsTotal: total };
}
