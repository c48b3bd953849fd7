import { describe, expect, it } from 'vitest';
import { problemFromResponse } from '@/lib/problem';

describe('problemFromResponse', () => {
  it('reads detail, slug, request id and field errors from problem details', () => {
    const body = {
      type: 'https://leastline.dev/problems/invalid-request',
      title: 'The request is not valid',
      status: 400,
      detail: 'email must be an e-mail address',
      requestId: 'req-1',
      errors: [{ pointer: '#/email', detail: 'must be an e-mail address' }],
    };
    const problem = problemFromResponse(body, new Response(null, { status: 400 }));

    expect([problem.slug, problem.detail, problem.requestId]).toEqual(['invalid-request', 'email must be an e-mail address', 'req-1']);
    expect(problem.fieldError('email')).toBe('must be an e-mail address');
    expect(problem.fieldError('/email')).toBe('must be an e-mail address');
    expect(problem.fieldError('password')).toBeUndefined();
  });

  it('explains an answer that carries no problem body, with the retry delay when given', () => {
    const problem = problemFromResponse('<html>bad gateway</html>', new Response(null, { status: 502, headers: { 'retry-after': '7' } }));

    expect(problem.status).toBe(502);
    expect(problem.detail).toMatch(/answered 502/);
    expect(problem.retryAfterSeconds).toBe(7);
  });
});
