import createClient from 'openapi-fetch';
import { describe, expect, it, vi } from 'vitest';
import { createCsrfMiddleware, csrfHeaderName } from '@/lib/csrf-middleware';
import type { paths } from '@/lib/api-schema';

const origin = 'http://console.test';

function csrfRefusal() {
  return new Response(JSON.stringify({ type: 'https://leastline.dev/problems/csrf-token-invalid', status: 403, detail: 'wrong token' }), {
    status: 403,
    headers: { 'content-type': 'application/problem+json' },
  });
}

function setUp(answers: Array<(request: Request) => Response>) {
  const seen: Request[] = [];
  const fetch = vi.fn(async (request: Request) => {
    seen.push(request.clone());
    const answer = answers.shift();
    if (!answer) throw new Error(`unexpected request ${request.method} ${request.url}`);
    return answer(request);
  });
  let issued = 0;
  const fetchToken = vi.fn(async () => `token-${++issued}`);
  const client = createClient<paths>({ baseUrl: origin, fetch });
  client.use(createCsrfMiddleware({ fetchToken }));
  return { client, seen, fetchToken };
}

describe('CSRF middleware', () => {
  it('sends the token on state-changing requests and fetches it only once', async () => {
    const { client, seen, fetchToken } = setUp([() => new Response(null, { status: 204 }), () => new Response(null, { status: 204 })]);

    await client.DELETE('/v1/session');
    await client.DELETE('/v1/session');

    expect(seen.map((request) => request.headers.get(csrfHeaderName))).toEqual(['token-1', 'token-1']);
    expect(fetchToken).toHaveBeenCalledTimes(1);
  });

  it('leaves reads alone', async () => {
    const { client, seen, fetchToken } = setUp([() => new Response('{"status":"ok","version":"0"}', { status: 200 })]);

    await client.GET('/v1/health');

    expect(seen[0]?.headers.get(csrfHeaderName)).toBeNull();
    expect(fetchToken).not.toHaveBeenCalled();
  });

  it('after a CSRF refusal fetches a new token and sends the same request again, once', async () => {
    const { client, seen, fetchToken } = setUp([
      csrfRefusal,
      () => new Response(JSON.stringify({ message: 'on its way' }), { status: 202, headers: { 'content-type': 'application/json' } }),
    ]);

    const result = await client.POST('/v1/password-resets', { body: { email: 'bea.billing@quillfeather.example.test' } });

    expect(result.response.status).toBe(202);
    expect(fetchToken).toHaveBeenCalledTimes(2);
    expect(seen.map((request) => request.headers.get(csrfHeaderName))).toEqual(['token-1', 'token-2']);
    await expect(seen[1]?.json()).resolves.toEqual({ email: 'bea.billing@quillfeather.example.test' });
  });

  it('gives up after the second refusal instead of looping', async () => {
    const { client, seen } = setUp([csrfRefusal, csrfRefusal]);

    const result = await client.DELETE('/v1/session');

    expect(result.response.status).toBe(403);
    expect(seen).toHaveLength(2);
  });

  it('does not retry other refusals', async () => {
    const forbidden = () =>
      new Response(JSON.stringify({ type: 'https://leastline.dev/problems/forbidden', status: 403, detail: 'role' }), { status: 403 });
    const { client, seen, fetchToken } = setUp([forbidden]);

    const result = await client.DELETE('/v1/session');

    expect(result.response.status).toBe(403);
    expect(seen).toHaveLength(1);
    expect(fetchToken).toHaveBeenCalledTimes(1);
  });
});
