import { HttpException } from '@nestjs/common';
import { FieldProblem, ProblemException } from './problem.exception';
import { ReplayedProblemException } from './replayed-problem.exception';
import { PROBLEM_TYPES, ProblemType, problemTypeForStatus, problemTypeUri } from './problem-types';

export const PROBLEM_CONTENT_TYPE = 'application/problem+json';

export interface ProblemBody {
  type: string;
  title: string;
  status: number;
  detail: string;
  instance: string;
  requestId: string;
  errors?: FieldProblem[];
  [extension: string]: unknown;
}

export interface ProblemResponse {
  body: ProblemBody;
  headers: Record<string, string>;
  /** True when the failure is ours, not the client's: the stack belongs in the log. */
  unexpected: boolean;
}

/** Fastify's own errors (body parsing, size limits, media types) carry a statusCode and an FST_ code. */
interface FrameworkError {
  statusCode?: number;
  code?: string;
  message?: string;
}

function fromFrameworkError(error: FrameworkError): { type: ProblemType; detail: string } | undefined {
  switch (error.code) {
    case 'FST_ERR_CTP_BODY_TOO_LARGE':
    case 'FST_REQ_FILE_TOO_LARGE':
    case 'FST_FILES_LIMIT':
    case 'FST_PARTS_LIMIT':
      return { type: PROBLEM_TYPES.payloadTooLarge, detail: 'The request body is larger than the documented limit.' };
    case 'FST_ERR_CTP_INVALID_MEDIA_TYPE':
      return { type: PROBLEM_TYPES.unsupportedMediaType, detail: error.message ?? 'Unsupported content type.' };
    case 'FST_ERR_CTP_EMPTY_JSON_BODY':
      return { type: PROBLEM_TYPES.malformedBody, detail: 'The body is empty but Content-Type says JSON.' };
    case 'FST_ERR_CTP_INVALID_CONTENT_LENGTH':
      return { type: PROBLEM_TYPES.malformedBody, detail: 'Content-Length does not match the body.' };
    default:
      break;
  }
  if (error instanceof SyntaxError || error.code === 'FST_ERR_CTP_INVALID_JSON_BODY') {
    return { type: PROBLEM_TYPES.malformedBody, detail: `The body is not valid JSON: ${error.message ?? ''}`.trim() };
  }
  if (typeof error.statusCode === 'number' && error.statusCode >= 400 && error.statusCode < 500) {
    return { type: problemTypeForStatus(error.statusCode), detail: error.message ?? 'The request was rejected.' };
  }
  return undefined;
}

function httpExceptionDetail(exception: HttpException): string {
  const response = exception.getResponse();
  if (typeof response === 'string') return response;
  const message = (response as { message?: unknown }).message;
  if (Array.isArray(message)) return message.join('; ');
  if (typeof message === 'string') return message;
  return exception.message;
}

/** Maps any thrown value to one RFC 9457 body. The single place that decides what a client sees. */
export function buildProblem(exception: unknown, requestId: string): ProblemResponse {
  const base = { instance: `urn:uuid:${requestId}`, requestId };
  if (exception instanceof ReplayedProblemException) {
    return { body: exception.storedBody, headers: { 'idempotency-replayed': 'true' }, unexpected: false };
  }
  if (exception instanceof ProblemException) {
    const body: ProblemBody = {
      ...exception.extensions,
      type: problemTypeUri(exception.problemType),
      title: exception.problemType.title,
      status: exception.problemType.status,
      detail: exception.detail,
      ...base,
    };
    if (exception.fieldErrors.length > 0) body.errors = exception.fieldErrors;
    return { body, headers: exception.headers, unexpected: false };
  }
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const type = problemTypeForStatus(status);
    const detail = status >= 500 ? type.advice : httpExceptionDetail(exception);
    return {
      body: { type: problemTypeUri(type), title: type.title, status: type.status, detail, ...base },
      headers: {},
      unexpected: status >= 500,
    };
  }
  const framework = exception && typeof exception === 'object' ? fromFrameworkError(exception as FrameworkError) : undefined;
  if (framework) {
    return {
      body: {
        type: problemTypeUri(framework.type),
        title: framework.type.title,
        status: framework.type.status,
        detail: framework.detail,
        ...base,
      },
      headers: {},
      unexpected: false,
    };
  }
  const internal = PROBLEM_TYPES.internal;
  return {
    body: { type: problemTypeUri(internal), title: internal.title, status: internal.status, detail: internal.advice, ...base },
    headers: {},
    unexpected: true,
  };
}
