import { createHash } from 'node:crypto';

/** JSON with object keys sorted at every level, so equal specifications hash equally. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value && typeof value === 'object' && !ArrayBuffer.isView(value)) {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, entry]) => entry !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([key, entry]) => `${JSON.stringify(key)}:${canonicalJson(entry)}`).join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

/**
 * The audit hash of a billable call: SHA-256 over the canonical specification and, column by column in
 * name order, the exact values the engine received (float64 bytes for numbers, JSON for labels). Two calls
 * with the same hash estimated the same model on the same numbers.
 */
export function inputHash(
  specification: unknown,
  numeric: Record<string, Float64Array>,
  labels: Record<string, string[]> = {},
): string {
  const hash = createHash('sha256');
  hash.update(canonicalJson(specification));
  for (const name of Object.keys(numeric).sort()) {
    const values = numeric[name] as Float64Array;
    hash.update(`\u0000n:${name}:${values.length}\u0000`);
    hash.update(new Uint8Array(values.buffer, values.byteOffset, values.byteLength));
  }
  for (const name of Object.keys(labels).sort()) {
    hash.update(`\u0000t:${name}\u0000`);
    hash.update(JSON.stringify(labels[name]));
  }
  return hash.digest('hex');
}
