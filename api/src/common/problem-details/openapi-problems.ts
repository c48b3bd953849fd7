import type { OpenAPIObject } from '@nestjs/swagger';
import { PROBLEM_CONTENT_TYPE } from './problem-body';
import { PROBLEM_TYPE_BASE, PROBLEM_TYPES } from './problem-types';

const PROBLEM_SCHEMA_NAME = 'ProblemDetails';

/** RFC 9457 problem details as this API sends them (see problem-body.ts). */
const PROBLEM_SCHEMA = {
  type: 'object',
  description: `RFC 9457 problem details. \`type\` is one of the URIs under ${PROBLEM_TYPE_BASE} listed in \`x-problem-types\`.`,
  required: ['type', 'title', 'status', 'detail', 'instance', 'requestId'],
  properties: {
    type: { type: 'string', format: 'uri', example: `${PROBLEM_TYPE_BASE}model-not-estimable` },
    title: { type: 'string' },
    status: { type: 'integer' },
    detail: { type: 'string', description: 'What went wrong and what to change.' },
    instance: { type: 'string', description: 'urn:uuid:<request id>' },
    requestId: { type: 'string', description: 'Also in the X-Request-Id header of every answer.' },
    code: { type: 'string', description: 'A finer, stable reason where one exists (e.g. collinear-columns, missing-values).' },
    errors: {
      type: 'array',
      description: 'One entry per offending field or data cell.',
      items: {
        type: 'object',
        required: ['pointer', 'detail'],
        properties: {
          pointer: { type: 'string', description: 'JSON Pointer (RFC 6901) into the request, e.g. #/model/predictors/1.' },
          detail: { type: 'string' },
        },
      },
    },
  },
  additionalProperties: true,
  'x-problem-types': Object.values(PROBLEM_TYPES).map((problem) => ({
    type: PROBLEM_TYPE_BASE + problem.slug,
    title: problem.title,
    status: problem.status,
    advice: problem.advice,
  })),
};

/**
 * Gives every error answer of every operation the problem-details body, and adds a `default` answer, so
 * clients generated from the document (the SDK, the console) get the problem as their typed `error`.
 */
export function addProblemResponses(document: OpenAPIObject): OpenAPIObject {
  document.components ??= {};
  document.components.schemas ??= {};
  document.components.schemas[PROBLEM_SCHEMA_NAME] = PROBLEM_SCHEMA as never;
  const content = { [PROBLEM_CONTENT_TYPE]: { schema: { $ref: `#/components/schemas/${PROBLEM_SCHEMA_NAME}` } } };
  for (const pathItem of Object.values(document.paths)) {
    for (const method of ['get', 'put', 'post', 'delete', 'patch'] as const) {
      const operation = pathItem[method];
      if (!operation) continue;
      for (const [status, response] of Object.entries(operation.responses ?? {})) {
        if (Number(status) >= 400 && response && !('$ref' in response) && !response.content) response.content = content;
      }
      operation.responses.default ??= { description: 'Any other failure (problem details).', content };
    }
  }
  return document;
}
