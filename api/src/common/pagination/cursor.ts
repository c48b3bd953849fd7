import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';

/**
 * Opaque cursors: base64url JSON naming the last row seen. Clients pass them back unchanged; anything
 * else is answered with a problem naming the `cursor` parameter rather than an empty or wrong page.
 */
export function encodeCursor(position: Record<string, string>): string {
  return Buffer.from(JSON.stringify(position), 'utf8').toString('base64url');
}

export function invalidCursor(): ProblemException {
  return new ProblemException(PROBLEM_TYPES.invalidRequest, 'The cursor is not one this API issued; start again without it.', [
    { pointer: '#/cursor', detail: 'must be a nextCursor value returned by the previous page' },
  ]);
}

export function decodeCursor(cursor: string, keys: readonly string[]): Record<string, string> {
  const invalid = invalidCursor;
  let parsed: unknown;
  try {
    parsed = JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8'));
  } catch {
    throw invalid();
  }
  if (!parsed || typeof parsed !== 'object' || Array.isArray(parsed)) throw invalid();
  const record = parsed as Record<string, unknown>;
  for (const key of keys) if (typeof record[key] !== 'string') throw invalid();
  return record as Record<string, string>;
}

/** RFC 8288 Link header for the next page, keeping the other query parameters of the request. */
export function nextPageLink(publicUrl: string, path: string, query: Record<string, string | undefined>): string {
  const url = new URL(path, `${publicUrl}/`);
  for (const [name, value] of Object.entries(query)) if (value !== undefined) url.searchParams.set(name, value);
  return `<${url.toString()}>; rel="next"`;
}
