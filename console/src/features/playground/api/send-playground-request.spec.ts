import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeApi, json, problem } from '@/testing/fake-api';
import { sendPlaygroundRequest } from '@/features/playground/api/send-playground-request';

const teamId = '7b0c1d2e-3f40-4a51-8b62-9c7d8e9f0a1b';
const body = { data: { columns: { y: [1, 2, 4], x: [1, 2, 3] } }, model: { response: 'y', predictors: ['x'] } };

afterEach(() => vi.unstubAllGlobals());

describe('sendPlaygroundRequest', () => {
  it('sends the session call for the current team, with the CSRF token', async () => {
    const { calls } = installFakeApi({
      'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'csrf-1' }),
      'POST /v1/fits': () => json(201, { id: 'r-1', kind: 'fit' }),
    });
    const answer = await sendPlaygroundRequest('fits', body, { mode: 'session', teamId });
    expect(answer.ok && answer.status).toBe(201);
    const post = calls.find((call) => call.method === 'POST');
    expect(post?.headers.get('x-leastline-team')).toBe(teamId);
    expect(post?.headers.get('authorization')).toBeNull();
    expect(post?.body).toEqual(body);
  });

  it('sends a pasted key as a bearer token instead of naming the team', async () => {
    const { calls } = installFakeApi({
      'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'csrf-1' }),
      'POST /v1/rolling-fits': () => json(201, { id: 'r-2', kind: 'rolling-fit' }),
    });
    await sendPlaygroundRequest('rolling-fits', body, { mode: 'key', apiKey: '  llsq1_example_key  ' });
    const post = calls.find((call) => call.method === 'POST');
    expect(post?.path).toBe('/v1/rolling-fits');
    expect(post?.headers.get('authorization')).toBe('Bearer llsq1_example_key');
    expect(post?.headers.get('x-leastline-team')).toBeNull();
  });

  it('returns a refusal as an answer with its status and field errors', async () => {
    installFakeApi({
      'GET /v1/session/csrf-token': () => json(200, { csrfToken: 'csrf-1' }),
      'POST /v1/fits': () => problem(422, 'unprocessable-data', 'Column "x2" is not in the data.', [{ pointer: '#/model/predictors/0', detail: 'unknown column' }]),
    });
    const answer = await sendPlaygroundRequest('fits', body, { mode: 'session', teamId });
    expect(answer.ok).toBe(false);
    if (answer.ok) return;
    expect(answer.status).toBe(422);
    expect(answer.problem.detail).toBe('Column "x2" is not in the data.');
    expect(answer.problem.fieldError('/model/predictors/0')).toBe('unknown column');
  });
});
