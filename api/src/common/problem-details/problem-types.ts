/**
 * The one catalogue of problem types (RFC 9457). The slug is stable and becomes the `type` URI; the title
 * never changes for a slug; `advice` says what the client should change and feeds the docs.
 */
export const PROBLEM_TYPE_BASE = 'https://leastline.dev/problems/';

export interface ProblemType {
  slug: string;
  title: string;
  status: number;
  advice: string;
}

function define<T extends Record<string, ProblemType>>(types: T): T {
  return types;
}

export const PROBLEM_TYPES = define({
  invalidRequest: {
    slug: 'invalid-request',
    title: 'The request is not valid',
    status: 400,
    advice: 'Correct each field listed in `errors` (JSON Pointers into the request) and send again.',
  },
  malformedBody: {
    slug: 'malformed-body',
    title: 'The request body could not be read',
    status: 400,
    advice: 'Send well-formed JSON with Content-Type application/json (or a supported binary type).',
  },
  unauthenticated: {
    slug: 'unauthenticated',
    title: 'Authentication is required',
    status: 401,
    advice: 'Send a valid API key, or sign in to the console.',
  },
  forbidden: {
    slug: 'forbidden',
    title: 'Your role does not allow this action',
    status: 403,
    advice: 'Ask a team owner or admin for a role that allows it.',
  },
  notFound: {
    slug: 'not-found',
    title: 'Resource not found',
    status: 404,
    advice: 'Check the path and identifiers; resources of other teams are never visible.',
  },
  methodNotAllowed: {
    slug: 'method-not-allowed',
    title: 'Method not allowed',
    status: 405,
    advice: 'Use a method that the resource supports.',
  },
  conflict: {
    slug: 'conflict',
    title: 'The request conflicts with the current state',
    status: 409,
    advice: 'Reload the resource and retry with current values.',
  },
  payloadTooLarge: {
    slug: 'payload-too-large',
    title: 'The request body is too large',
    status: 413,
    advice: 'Upload the data as a dataset in parts, or use the compact binary body.',
  },
  unsupportedMediaType: {
    slug: 'unsupported-media-type',
    title: 'Unsupported content type',
    status: 415,
    advice: 'Send application/json unless the endpoint documents another type.',
  },
  unprocessable: {
    slug: 'unprocessable-data',
    title: 'The data cannot be fitted as requested',
    status: 422,
    advice: 'Read `detail` and the listed fields; the request was well-formed but the data do not allow it.',
  },
  rateLimited: {
    slug: 'rate-limited',
    title: 'Too many requests',
    status: 429,
    advice: 'Wait for the number of seconds in Retry-After before sending again.',
  },
  internal: {
    slug: 'internal-error',
    title: 'Unexpected server error',
    status: 500,
    advice: 'Retry later and quote the request id to support if it persists.',
  },
  serviceUnavailable: {
    slug: 'service-unavailable',
    title: 'A dependency is unavailable',
    status: 503,
    advice: 'Retry later; the service is alive but cannot reach a dependency.',
  },
});

export type ProblemTypeName = keyof typeof PROBLEM_TYPES;

export function problemTypeUri(type: ProblemType): string {
  return PROBLEM_TYPE_BASE + type.slug;
}

/** Default problem for a bare HTTP status, used when a framework error carries no type of ours. */
export function problemTypeForStatus(status: number): ProblemType {
  const match = Object.values(PROBLEM_TYPES).find((type) => type.status === status);
  if (match) return match;
  return status >= 500 ? PROBLEM_TYPES.internal : PROBLEM_TYPES.invalidRequest;
}
