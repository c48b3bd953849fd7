import createClient from 'openapi-fetch';
import type { paths } from '@/lib/api-schema';

// The one client for the Leastline API. The console is served from the same origin as
// the API (a proxy forwards /v1 in development), so the base URL stays empty and the
// session cookie travels with every call.
export const apiClient = createClient<paths>({
  baseUrl: '',
  credentials: 'include',
});
