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
  invalidCredentials: {
    slug: 'invalid-credentials',
    title: 'The e-mail address or password is not correct',
    status: 401,
    advice: 'Check both and try again, or ask for a password-reset e-mail. The answer is the same whether or not an account exists.',
  },
  signInRequired: {
    slug: 'sign-in-required',
    title: 'Sign in to continue',
    status: 401,
    advice: 'Sign in to the console with the account this action belongs to, then repeat the request.',
  },
  apiKeyMalformed: {
    slug: 'api-key-malformed',
    title: 'The API key is not well-formed',
    status: 401,
    advice: 'Copy the whole key again: it starts with "llsq1_" and its last part is a checksum that a typo breaks.',
  },
  apiKeyInvalid: {
    slug: 'api-key-invalid',
    title: 'The API key is not valid',
    status: 401,
    advice: 'Use a key listed under API keys in the console; keys are shown in full only once, at creation.',
  },
  apiKeyRevoked: {
    slug: 'api-key-revoked',
    title: 'The API key was revoked',
    status: 401,
    advice: 'Create a new key in the console; a revoked key never works again.',
  },
  apiKeyExpired: {
    slug: 'api-key-expired',
    title: 'The API key has expired',
    status: 401,
    advice: 'Create a new key, or rotate this one before its expiry next time.',
  },
  apiKeyRotatedOut: {
    slug: 'api-key-rotated-out',
    title: 'The API key was replaced by rotation',
    status: 401,
    advice: 'Use the key that replaced it; the overlap period chosen at rotation has ended.',
  },
  csrfTokenInvalid: {
    slug: 'csrf-token-invalid',
    title: 'The CSRF token is missing or wrong',
    status: 403,
    advice: 'Fetch GET /v1/session/csrf-token and send its value in the X-Leastline-Csrf header on every POST, PUT, PATCH and DELETE.',
  },
  insufficientScope: {
    slug: 'insufficient-scope',
    title: 'The API key lacks a required scope',
    status: 403,
    advice: 'Use a key created with the scopes listed in `missingScopes`, or create one in the console.',
  },
  invitationEmailMismatch: {
    slug: 'invitation-email-mismatch',
    title: 'The invitation was sent to another e-mail address',
    status: 403,
    advice: 'Sign out and accept the invitation while signed in as the invited address (or without an account).',
  },
  notFound: {
    slug: 'not-found',
    title: 'Resource not found',
    status: 404,
    advice: 'Check the path and identifiers; resources of other teams are never visible.',
  },
  linkNotFound: {
    slug: 'link-not-found',
    title: 'The link is not valid',
    status: 404,
    advice: 'Open the most recent e-mail and use its link unchanged, or ask for a new one.',
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
  linkExpired: {
    slug: 'link-expired',
    title: 'The link has expired',
    status: 410,
    advice: 'Ask for a new e-mail: password-reset links last 30 minutes, invitations 7 days.',
  },
  linkUsed: {
    slug: 'link-used',
    title: 'The link was already used',
    status: 410,
    advice: 'Each link works once. Ask for a new e-mail if you still need it.',
  },
  idempotencyInProgress: {
    slug: 'idempotency-request-in-progress',
    title: 'The first request with this Idempotency-Key is still running',
    status: 409,
    advice: 'Wait for the first request to finish, then retry with the same key to receive its answer.',
  },
  idempotencyKeyReused: {
    slug: 'idempotency-key-reused',
    title: 'The Idempotency-Key was used for a different request',
    status: 422,
    advice: 'Send a new Idempotency-Key for every new request; reuse a key only to retry the same request.',
  },
  engineRejected: {
    slug: 'model-not-estimable',
    title: 'The model cannot be estimated from these data',
    status: 422,
    advice: 'Read `detail` and `code`: change the columns, rows or options it names.',
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
  signInThrottled: {
    slug: 'sign-in-throttled',
    title: 'Too many failed sign-ins',
    status: 429,
    advice: 'Wait for the number of seconds in Retry-After, or reset the password by e-mail.',
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
