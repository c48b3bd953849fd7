import createClient from 'openapi-fetch';
import { createCsrfMiddleware } from '@/lib/csrf-middleware';
import type { paths } from '@/lib/api-schema';
import { expectData } from '@/lib/problem';

// The one client for the Leastline API. The console is served from the same origin as the API (a proxy
// forwards /v1 in development), so requests go to this page's own origin and the session cookie travels
// with every call. `fetch` is looked up at call time so component tests can stand in a fake server.
export const apiClient = createClient<paths>({
  baseUrl: globalThis.location?.origin ?? '',
  credentials: 'include',
  fetch: (request) => globalThis.fetch(request),
});

export const csrfMiddleware = createCsrfMiddleware({
  fetchToken: async () => {
    const { csrfToken } = await expectData(apiClient.GET('/v1/session/csrf-token'));
    return csrfToken;
  },
});

apiClient.use(csrfMiddleware);
