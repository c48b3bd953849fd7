import { ValidationPipe } from '@nestjs/common';
import { ProblemException } from './problem.exception';
import { PROBLEM_TYPES } from './problem-types';
import { toFieldProblems } from './validation-errors';

/**
 * The global pipe: unknown fields are rejected (not stripped), types are converted only where a DTO says
 * so, and every violation becomes a JSON Pointer in the problem's `errors`.
 */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    transformOptions: { enableImplicitConversion: false },
    validationError: { target: false, value: false },
    exceptionFactory: (errors) => {
      const fieldErrors = toFieldProblems(errors);
      const summary = fieldErrors.map((error) => `${error.pointer}: ${error.detail}`).join('; ');
      return new ProblemException(PROBLEM_TYPES.invalidRequest, `The request has invalid fields: ${summary}`, fieldErrors);
    },
  });
}
