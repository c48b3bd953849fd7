import { createLeastlineClient, paginate } from '../src/index';

interface Seen {
  url: string;
  method: string;
  headers: Headers;
  body: string;
}

/** A scripted fetch: answers in turn, records every request it was given. */
function scriptedFetch(answers: Array<() => Response>) {
  const seen: Seen[] = [];
  const fetchImpl = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const request = input instanceof Request ? input : new Request(input, init);
    seen.push({ url: request.url, method: request.method, headers: request.headers, body: await request.text() });
    const next = answers.shift();
    if (!next) throw new Error('no scripted answer left');
    return next();
  };
  return { fetchImpl: fetchImpl as typeof fetch, seen };
}

const json = (status: number, body: unknown, headers: Record<string, string> = {}) => () =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json', ...headers } });

const fitBody = {
  data: { columns: { benchmark: [0.01, -0.02, 0.015], fund: [0.012, -0.019, 0.02] } },
  model: { response: 'fund', predictors: ['benchmark'] },
};

describe('createLeastlineClient', () => {
  it('sends the key as a bearer token and an Idempotency-Key on POST', async () => {
    const { fetchImpl, seen } = scriptedFetch([json(201, { id: 'r1' })]);
    const client = createLeastlineClient({ baseUrl: 'http://api.test', apiKey: 'llsq1_demo', fetch: fetchImpl });
    const { data } = await client.POST('/v1/fits', { body: fitBody as never });
    expect(data).toEqual({ id: 'r1' });
    expect(seen[0]?.headers.get('authorization')).toBe('Bearer llsq1_demo');
    expect(seen[0]?.headers.get('idempotency-key')).toMatch(/^[0-9a-f-]{36}$/);
    expect(seen[0]?.url).toBe('http://api.test/v1/fits');
  });

  it('retries a 429 after Retry-After with the same Idempotency-Key and body', async () => {
    const { fetchImpl, seen } = scriptedFetch([
      json(429, { type: 'https://leastline.dev/problems/rate-limited', status: 429 }, { 'retry-after': '0' }),
      json(201, { id: 'r2' }),
    ]);
    const client = createLeastlineClient({ baseUrl: 'http://api.test', apiKey: 'k', fetch: fetchImpl });
    const { data, response } = await client.POST('/v1/fits', { body: fitBody as never });
    expect(response.status).toBe(201);
    expect(data).toEqual({ id: 'r2' });
    expect(seen).toHaveLength(2);
    expect(seen[1]?.headers.get('idempotency-key')).toBe(seen[0]?.headers.get('idempotency-key'));
    expect(seen[1]?.body).toBe(seen[0]?.body);
  });

  it('gives up after maxRetries and returns the problem as `error`', async () => {
    const problem = { type: 'https://leastline.dev/problems/service-unavailable', status: 503, title: 't', detail: 'd' };
    const { fetchImpl, seen } = scriptedFetch([json(503, problem, { 'retry-after': '0' }), json(503, problem, { 'retry-after': '0' })]);
    const client = createLeastlineClient({ baseUrl: 'http://api.test', apiKey: 'k', maxRetries: 1, fetch: fetchImpl });
    const { error, response } = await client.GET('/v1/health/ready');
    expect(response.status).toBe(503);
    expect(error).toMatchObject({ status: 503 });
    expect(seen).toHaveLength(2);
  });

  it('does not retry a client error', async () => {
    const { fetchImpl, seen } = scriptedFetch([json(422, { status: 422, code: 'collinear-columns' })]);
    const client = createLeastlineClient({ baseUrl: 'http://api.test', apiKey: 'k', fetch: fetchImpl });
    const { error } = await client.POST('/v1/fits', { body: fitBody as never });
    expect(error).toMatchObject({ code: 'collinear-columns' });
    expect(seen).toHaveLength(1);
  });
});

describe('paginate', () => {
  it('follows nextCursor until it is null', async () => {
    const pages: Record<string, { items: number[]; nextCursor: string | null }> = {
      start: { items: [1, 2], nextCursor: 'c2' },
      c2: { items: [3], nextCursor: null },
    };
    const cursors: (string | undefined)[] = [];
    const items: number[] = [];
    for await (const item of paginate(async (cursor) => {
      cursors.push(cursor);
      return pages[cursor ?? 'start'];
    })) {
      items.push(item);
    }
    expect(items).toEqual([1, 2, 3]);
    expect(cursors).toEqual([undefined, 'c2']);
  });
});
