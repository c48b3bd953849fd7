import createClient, { type Client, type Middleware } from 'openapi-fetch';
import type { components, paths } from './api-schema';

export type { components, paths };

/** RFC 9457 problem details, as every Leastline error arrives. */
export interface Problem {
  type: string;
  title: string;
  status: number;
  detail: string;
  instance?: string;
  requestId?: string;
  errors?: { pointer: string; detail: string }[];
  [extension: string]: unknown;
}

export interface LeastlineClientOptions {
  /** Origin of the API, e.g. `http://127.0.0.1:4310`. */
  baseUrl: string;
  /** A Leastline API key, sent as `Authorization: Bearer <key>`. */
  apiKey: string;
  /** Retries for 429 and 503 answers (honouring Retry-After) and network failures. Default 2. */
  maxRetries?: number;
  /** Supply your own fetch (tests, proxies). */
  fetch?: typeof fetch;
}

const RETRYABLE_STATUS = new Set([429, 503]);

function retryDelayMs(response: Response | undefined, attempt: number): number {
  const header = response?.headers.get('retry-after');
  const seconds = header === null || header === undefined ? Number.NaN : Number(header);
  if (Number.isFinite(seconds) && seconds >= 0) return Math.min(seconds, 60) * 1000;
  return Math.min(250 * 2 ** attempt, 8000);
}

/**
 * Creates a typed client. Calls keep openapi-fetch's `{ data, error, response }` shape, with `error` being
 * the problem details. Every POST gets an `Idempotency-Key` (one per logical call, reused on retries), so a
 * retried fit is never billed twice; the request id of each answer is at `response.headers.get('x-request-id')`.
 */
export function createLeastlineClient(options: LeastlineClientOptions): Client<paths> {
  const maxRetries = options.maxRetries ?? 2;
  const baseFetch = options.fetch ?? globalThis.fetch;
  const retryingFetch: typeof fetch = async (input, init) => {
    const request = input instanceof Request ? input : new Request(input, init);
    let attempt = 0;
    for (;;) {
      let response: Response | undefined;
      try {
        response = await baseFetch(request.clone());
        if (!RETRYABLE_STATUS.has(response.status) || attempt >= maxRetries) return response;
      } catch (error) {
        if (attempt >= maxRetries) throw error;
      }
      await new Promise((resolve) => setTimeout(resolve, retryDelayMs(response, attempt)));
      attempt += 1;
    }
  };
  const authentication: Middleware = {
    onRequest({ request }) {
      request.headers.set('Authorization', `Bearer ${options.apiKey}`);
      if (request.method === 'POST' && !request.headers.has('Idempotency-Key')) {
        request.headers.set('Idempotency-Key', crypto.randomUUID());
      }
      return request;
    },
  };
  const client = createClient<paths>({ baseUrl: options.baseUrl, fetch: retryingFetch });
  client.use(authentication);
  return client;
}

/**
 * Follows `nextCursor` through a paginated list. `fetchPage` calls one list endpoint with the cursor and
 * returns its `data`.
 */
export async function* paginate<Item>(
  fetchPage: (cursor: string | undefined) => Promise<{ items: Item[]; nextCursor?: string | null } | undefined>,
): AsyncGenerator<Item> {
  let cursor: string | undefined;
  for (;;) {
    const page = await fetchPage(cursor);
    if (!page) return;
    yield* page.items;
    if (!page.nextCursor) return;
    cursor = page.nextCursor;
  }
}
