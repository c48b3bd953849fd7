/** Two-space JSON with arrays of plain numbers kept on one line, so data columns stay readable. */
export function compactJson(value: unknown): string {
  return JSON.stringify(value, null, 2).replace(
    /\[\s+([-\d.eE+,\s]+?)\s+\]/g,
    (_match, inner: string) => `[${inner.trim().split(/,\s*/).join(', ')}]`,
  );
}
