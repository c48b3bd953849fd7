import { ParseUUIDPipe } from '@nestjs/common';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';

/** ParseUUIDPipe whose failure names the path parameter, as a problem rather than a bare 400. */
export function uuidParam(name: string): ParseUUIDPipe {
  return new ParseUUIDPipe({
    exceptionFactory: () =>
      new ProblemException(PROBLEM_TYPES.invalidRequest, `The path parameter ${name} must be a UUID.`, [
        { pointer: `#/path/${name}`, detail: 'must be a UUID' },
      ]),
  });
}
