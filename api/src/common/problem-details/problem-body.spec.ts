import { BadRequestException, NotFoundException } from '@nestjs/common';
import { buildProblem } from './problem-body';
import { ProblemException } from './problem.exception';
import { PROBLEM_TYPES } from './problem-types';

describe('buildProblem (RFC 9457 section 3 members)', () => {
  it('keeps a ProblemException type, detail, field errors and extensions', () => {
    const problem = buildProblem(
      new ProblemException(PROBLEM_TYPES.unprocessable, 'Column "fee" is constant.', [
        { pointer: '#/predictors/0', detail: 'constant column' },
      ], { code: 'constant-column' }),
      'abc',
    );
    expect(problem.body).toMatchObject({
      type: 'https://leastline.dev/problems/unprocessable-data',
      status: 422,
      detail: 'Column "fee" is constant.',
      requestId: 'abc',
      instance: 'urn:uuid:abc',
      code: 'constant-column',
      errors: [{ pointer: '#/predictors/0', detail: 'constant column' }],
    });
    expect(problem.unexpected).toBe(false);
  });

  it('maps framework HTTP exceptions by status', () => {
    expect(buildProblem(new NotFoundException('Cannot GET /v1/nope'), 'r').body.type).toMatch(/not-found$/);
    expect(buildProblem(new BadRequestException('bad'), 'r').body.status).toBe(400);
  });

  it('maps a body-size error from the HTTP layer to 413', () => {
    const error = Object.assign(new Error('too big'), { code: 'FST_ERR_CTP_BODY_TOO_LARGE', statusCode: 413 });
    expect(buildProblem(error, 'r').body.status).toBe(413);
  });

  it('hides the message of an unexpected error', () => {
    const problem = buildProblem(new Error('password=hunter2 leaked'), 'r');
    expect(problem.body.status).toBe(500);
    expect(JSON.stringify(problem.body)).not.toContain('hunter2');
    expect(problem.unexpected).toBe(true);
  });
});
