import { DataType, tableFromIPC } from 'apache-arrow';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';

/** Content type of the compact binary body: an Apache Arrow IPC stream. */
export const ARROW_STREAM_CONTENT_TYPE = 'application/vnd.apache.arrow.stream';
/** Schema metadata key that carries the JSON request (everything except the data columns). */
export const ARROW_REQUEST_METADATA_KEY = 'leastline.request';

export interface DecodedArrowBody {
  request: Record<string, unknown>;
  columns: Record<string, Float64Array | (string | null)[]>;
}

/**
 * Decodes an Arrow IPC stream body. Numeric columns (floating point or integer) become Float64Array with
 * NaN for nulls, so missing values follow the request's missing-value policy like JSON nulls do; UTF-8
 * columns become string arrays (for group columns). The request JSON travels in the schema metadata under
 * `leastline.request`, so one binary body carries both the data and the model specification.
 */
export function decodeArrowBody(body: Buffer): DecodedArrowBody {
  let table;
  try {
    table = tableFromIPC(body);
  } catch (error) {
    throw new ProblemException(PROBLEM_TYPES.malformedBody, `The body is not an Arrow IPC stream: ${(error as Error).message}`);
  }
  const metadata = table.schema.metadata.get(ARROW_REQUEST_METADATA_KEY);
  if (!metadata) {
    throw new ProblemException(
      PROBLEM_TYPES.invalidRequest,
      `The Arrow schema must carry the request JSON in its metadata under "${ARROW_REQUEST_METADATA_KEY}".`,
      [{ pointer: '#/schema/metadata', detail: `missing "${ARROW_REQUEST_METADATA_KEY}"` }],
    );
  }
  let request: unknown;
  try {
    request = JSON.parse(metadata);
  } catch {
    throw new ProblemException(PROBLEM_TYPES.malformedBody, `The "${ARROW_REQUEST_METADATA_KEY}" metadata is not valid JSON.`);
  }
  if (request === null || typeof request !== 'object' || Array.isArray(request)) {
    throw new ProblemException(PROBLEM_TYPES.invalidRequest, `The "${ARROW_REQUEST_METADATA_KEY}" metadata must be a JSON object.`);
  }
  const columns: DecodedArrowBody['columns'] = {};
  for (const field of table.schema.fields) {
    const vector = table.getChild(field.name);
    if (!vector) continue;
    if (DataType.isFloat(field.type) || DataType.isInt(field.type)) {
      const values = new Float64Array(vector.length);
      if (vector.nullCount === 0 && DataType.isFloat(field.type)) {
        values.set(vector.toArray() as Float64Array);
      } else {
        for (let i = 0; i < vector.length; i++) {
          const value = vector.get(i) as number | bigint | null;
          values[i] = value === null ? Number.NaN : Number(value);
        }
      }
      columns[field.name] = values;
    } else if (DataType.isUtf8(field.type) || DataType.isLargeUtf8(field.type)) {
      columns[field.name] = Array.from({ length: vector.length }, (_, i) => (vector.get(i) as string | null) ?? null);
    } else {
      throw new ProblemException(
        PROBLEM_TYPES.invalidRequest,
        `Arrow column "${field.name}" has type ${String(field.type)}; use a floating-point, integer or UTF-8 column.`,
        [{ pointer: `#/columns/${field.name}`, detail: 'unsupported Arrow type' }],
      );
    }
  }
  return { request: request as Record<string, unknown>, columns };
}
