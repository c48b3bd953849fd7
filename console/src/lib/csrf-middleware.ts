import type { Middleware } from 'openapi-fetch';

// The header the API checks on every state-changing console request (see the API's auth section).
export const csrfHeaderName = 'X-Leastline-Csrf';

const stateChangingMethods = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

type CsrfMiddlewareOptions = {
  /** Asks the API for a token; the API also sets the matching secret cookie. */
  fetchToken: () => Promise<string>;
};

export type CsrfMiddleware = Middleware & {
  /** Drops the cached token, e.g. after signing in or out, so the next write fetches a fresh one. */
  forgetToken: () => void;
};

async function isCsrfRefusal(response: Response): Promise<boolean> {
  if (response.status !== 403) return false;
  try {
    const body: unknown = await response.clone().json();
    return (
      typeof body === 'object' &&
      body !== null &&
      typeof (body as { type?: unknown }).type === 'string' &&
      (body as { type: string }).type.endsWith('/csrf-token-invalid')
    );
  } catch {
    return false;
  }
}

/**
 * Attaches the CSRF token to POST, PUT, PATCH and DELETE. The token is fetched once and shared by
 * concurrent requests. When the API refuses a token (the secret cookie expired or was replaced), the
 * token is fetched again and the request is sent a second time, once.
 */
export function createCsrfMiddleware({ fetchToken }: CsrfMiddlewareOptions): CsrfMiddleware {
  let token: Promise<string> | null = null;
  // The body of a sent request cannot be read again, so a copy is kept until the answer arrives.
  const pendingCopies = new Map<string, Request>();

  function currentToken(): Promise<string> {
    if (token === null) {
      token = fetchToken().catch((error: unknown) => {
        token = null;
        throw error;
      });
    }
    return token;
  }

  return {
    forgetToken() {
      token = null;
    },
    async onRequest({ request, id }) {
      if (!stateChangingMethods.has(request.method)) return undefined;
      request.headers.set(csrfHeaderName, await currentToken());
      pendingCopies.set(id, request.clone());
      return request;
    },
    async onResponse({ response, id, options }) {
      const copy = pendingCopies.get(id);
      pendingCopies.delete(id);
      if (copy === undefined || !(await isCsrfRefusal(response))) return undefined;
      token = null;
      copy.headers.set(csrfHeaderName, await currentToken());
      return options.fetch(copy);
    },
    onError({ id }) {
      pendingCopies.delete(id);
      return undefined;
    },
  };
}
