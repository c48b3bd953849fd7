import type { components } from '@/lib/api-schema';

// Problem details (RFC 9457) as the console sees them. The API answers every failure in this shape, but
// a proxy or a dropped connection can answer anything, so the members the console reads are checked at
// run time rather than trusted from the generated type.

type ProblemDetails = components['schemas']['ProblemDetails'];
export type FieldProblem = NonNullable<ProblemDetails['errors']>[number];

export class ApiProblem extends Error {
  readonly status: number;
  /** The last segment of the problem `type` URI, e.g. `csrf-token-invalid`. */
  readonly slug: string;
  readonly title: string;
  readonly detail: string;
  readonly requestId: string | null;
  readonly fieldErrors: FieldProblem[];
  readonly retryAfterSeconds: number | null;

  constructor(input: {
    status: number;
    slug: string;
    title: string;
    detail: string;
    requestId?: string | null;
    fieldErrors?: FieldProblem[];
    retryAfterSeconds?: number | null;
  }) {
    super(input.detail);
    this.name = 'ApiProblem';
    this.status = input.status;
    this.slug = input.slug;
    this.title = input.title;
    this.detail = input.detail;
    this.requestId = input.requestId ?? null;
    this.fieldErrors = input.fieldErrors ?? [];
    this.retryAfterSeconds = input.retryAfterSeconds ?? null;
  }

  /** The reason given for one request field, found by its JSON Pointer (`#/email` or `/email`). */
  fieldError(field: string): string | undefined {
    const wanted = field.replace(/^#?\//, '');
    return this.fieldErrors.find((error) => error.pointer.replace(/^#?\//, '') === wanted)?.detail;
  }
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

export function slugOfProblemType(type: unknown): string {
  if (typeof type !== 'string' || type === '') return 'unknown';
  const withoutSlash = type.replace(/\/+$/, '');
  return withoutSlash.slice(withoutSlash.lastIndexOf('/') + 1) || 'unknown';
}

function readFieldErrors(value: unknown): FieldProblem[] {
  if (!Array.isArray(value)) return [];
  return value.flatMap((entry) =>
    isRecord(entry) && typeof entry.pointer === 'string' && typeof entry.detail === 'string'
      ? [{ pointer: entry.pointer, detail: entry.detail }]
      : [],
  );
}

/** Turns a failed answer into an ApiProblem, whether or not its body was problem details. */
export function problemFromResponse(body: unknown, response: Response): ApiProblem {
  const retryAfter = Number(response.headers.get('retry-after'));
  const retryAfterSeconds = Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null;
  if (isRecord(body) && typeof body.detail === 'string') {
    return new ApiProblem({
      status: typeof body.status === 'number' ? body.status : response.status,
      slug: slugOfProblemType(body.type),
      title: typeof body.title === 'string' ? body.title : response.statusText,
      detail: body.detail,
      requestId: typeof body.requestId === 'string' ? body.requestId : response.headers.get('x-request-id'),
      fieldErrors: readFieldErrors(body.errors),
      retryAfterSeconds,
    });
  }
  return new ApiProblem({
    status: response.status,
    slug: 'unexpected-answer',
    title: 'Unexpected answer from the API',
    detail: `The API answered ${response.status}${response.statusText ? ` ${response.statusText}` : ''} without an explanation.`,
    requestId: response.headers.get('x-request-id'),
    retryAfterSeconds,
  });
}

type ClientResult<Data> = { data?: Data; error?: unknown; response: Response };

/** Returns the body of a successful answer; throws an ApiProblem for any other. */
export async function expectData<Data>(call: Promise<ClientResult<Data>>): Promise<Data> {
  const result = await call;
  if (!result.response.ok || result.data === undefined) {
    if (result.response.ok) {
      throw new ApiProblem({
        status: result.response.status,
        slug: 'unexpected-answer',
        title: 'Unexpected answer from the API',
        detail: 'The API answered without the expected body.',
      });
    }
    throw problemFromResponse(result.error, result.response);
  }
  return result.data;
}

/** For operations that answer 202 or 204: only success matters. */
export async function expectSuccess(call: Promise<ClientResult<unknown>>): Promise<void> {
  const result = await call;
  if (!result.response.ok) throw problemFromResponse(result.error, result.response);
}

export function isProblem(error: unknown, slug?: string): error is ApiProblem {
  return error instanceof ApiProblem && (slug === undefined || error.slug === slug);
}
