/**
 * Column chunks on disk. Numeric columns: little-endian IEEE-754 float64 (NaN marks a missing value), so
 * a chunk decodes straight into a Float64Array slice with one copy. Text columns: a UTF-8 JSON array.
 */
export const VALUES_PER_CHUNK = 65_536;

const LITTLE_ENDIAN = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

export function encodeNumericChunk(values: Float64Array): Buffer {
  const copy = Buffer.from(values.buffer.slice(values.byteOffset, values.byteOffset + values.byteLength));
  if (!LITTLE_ENDIAN) copy.swap64();
  return copy;
}

/** Decodes one chunk into `target` at `offset`; returns the number of values written. */
export function decodeNumericChunk(payload: Buffer, target: Float64Array, offset: number): number {
  const count = payload.byteLength / 8;
  if (!Number.isInteger(count)) throw new Error('corrupt numeric chunk (length not a multiple of 8)');
  const bytes = Buffer.from(payload);
  if (!LITTLE_ENDIAN) bytes.swap64();
  target.set(new Float64Array(bytes.buffer, bytes.byteOffset, count), offset);
  return count;
}

export function encodeTextChunk(values: (string | null)[]): Buffer {
  return Buffer.from(JSON.stringify(values), 'utf8');
}

export function decodeTextChunk(payload: Buffer): (string | null)[] {
  return JSON.parse(payload.toString('utf8')) as (string | null)[];
}
