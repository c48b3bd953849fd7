import { ArgumentsHost, Catch, ExceptionFilter, Logger, NotFoundException } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { buildProblem, PROBLEM_CONTENT_TYPE } from './problem-body';

/** Lets the console host answer unknown non-API GETs with the single-page app instead of a 404 problem. */
export type NotFoundFallback = (request: FastifyRequest, reply: FastifyReply) => boolean;

/**
 * The catch-all filter: every failure that reaches Nest leaves as problem details. Unexpected errors are
 * logged with their stack and the request id; the client only sees a plain 500 with that id.
 */
@Catch()
export class ProblemDetailsFilter implements ExceptionFilter {
  private readonly logger = new Logger('ProblemDetails');

  constructor(private readonly notFoundFallback?: NotFoundFallback) {}

  catch(exception: unknown, host: ArgumentsHost): void {
    const context = host.switchToHttp();
    const request = context.getRequest<FastifyRequest>();
    const reply = context.getResponse<FastifyReply>();
    if (exception instanceof NotFoundException && this.notFoundFallback?.(request, reply)) return;
    sendProblem(exception, request, reply, this.logger);
  }
}

export function sendProblem(exception: unknown, request: FastifyRequest, reply: FastifyReply, logger: Logger): void {
  const requestId = String(request.id);
  const problem = buildProblem(exception, requestId);
  if (problem.unexpected) {
    const stack = exception instanceof Error ? exception.stack : String(exception);
    logger.error({ msg: 'unexpected error', reqId: requestId, method: request.method, url: request.url, stack });
  }
  if (reply.sent) return;
  reply.status(problem.body.status).headers(problem.headers).type(PROBLEM_CONTENT_TYPE).send(problem.body);
}
