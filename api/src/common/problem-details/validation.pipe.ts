import { ArgumentMetadata, ValidationPipe } from '@nestjs/common';
import { decodeArrowBody } from '../body-parsers/arrow-body';
import { ProblemException } from './problem.exception';
import { PROBLEM_TYPES } from './problem-types';
import { toFieldProblems } from './validation-errors';

/**
 * The global pipe: unknown fields are rejected (not stripped), types are converted only where a DTO says
 * so, and every violation becomes a JSON Pointer in the problem's `errors`. A binary Arrow body becomes
 * the same request as its JSON twin (the request from the schema metadata, the columns as `data.columns`)
 * before validation, so both formats obey one DTO.
 */
class LeastlineValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type === 'body' && Buffer.isBuffer(value)) {
      const { request, columns } = decodeArrowBody(value);
      const data = (request.data ?? {}) as Record<string, unknown>;
      // Validate with an empty column map, then attach the typed arrays: class-transformer would otherwise
      // copy every Float64Array element by element into plain objects.
      const validated = (await super.transform({ ...request, data: { ...data, columns: {} } }, metadata)) as {
        data: { columns: unknown };
      };
      validated.data.columns = columns;
      return validated;
    }
    return super.transform(value, metadata);
  }
}

export function createValidationPipe(): ValidationPipe {
  return new LeastlineValidationPipe({
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
