import { vi } from 'vitest';

// A stand-in for the API in component tests: the real openapi-fetch client and its middleware run, and
// only `fetch` is replaced. Routes are "METHOD /path/:param"; unknown routes answer 404 problem details.

export type FakeRequest = { method: string; path: string; params: Record<string, string>; headers: Headers; body: unknown };
type Handler = (request: FakeRequest) => Response | Promise<Response>;

export function json(status: number, body: unknown, headers: Record<string, string> = {}): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json', ...headers } });
}

export function noContent(): Response {
  return new Response(null, { status: 204 });
}

export function problem(status: number, slug: string, detail: string, errors?: Array<{ pointer: string; detail: string }>) {
  return new Response(
    JSON.stringify({
      type: `https://leastline.dev/problems/${slug}`,
      title: slug,
      status,
      detail,
      instance: 'urn:uuid:00000000-0000-4000-8000-000000000001',
      requestId: '00000000-0000-4000-8000-000000000001',
      ...(errors ? { errors } : {}),
    }),
    { status, headers: { 'content-type': 'application/problem+json' } },
  );
}

function matchRoute(pattern: string, method: string, path: string): Record<string, string> | null {
  const [patternMethod, patternPath = ''] = pattern.split(' ');
  if (patternMethod !== method) return null;
  const expected = patternPath.split('/');
  const actual = path.split('/');
  if (expected.length !== actual.length) return null;
  const params: Record<string, string> = {};
  for (const [index, segment] of expected.entries()) {
    const value = actual[index] ?? '';
    if (segment.startsWith(':')) params[segment.slice(1)] = decodeURIComponent(value);
    else if (segment !== value) return null;
  }
  return params;
}

export function installFakeApi(routes: Record<string, Handler>) {
  const calls: FakeRequest[] = [];
  const fetchStub = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const request = input instanceof Request ? input : new Request(String(input), init);
    const url = new URL(request.url);
    const text = request.method === 'GET' || request.method === 'HEAD' ? '' : await request.text();
    const base = { method: request.method, path: url.pathname, headers: request.headers, body: text ? JSON.parse(text) : undefined };
    for (const [pattern, handler] of Object.entries(routes)) {
      const params = matchRoute(pattern, request.method, url.pathname);
      if (params) {
        const call = { ...base, params };
        calls.push(call);
        return handler(call);
      }
    }
    calls.push({ ...base, params: {} });
    return problem(404, 'not-found', `No fake route for ${request.method} ${url.pathname}`);
  });
  vi.stubGlobal('fetch', fetchStub);
  return { calls, fetchStub };
}
