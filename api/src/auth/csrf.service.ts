import { Injectable } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import '@fastify/csrf-protection';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { CSRF_COOKIE, CSRF_HEADER } from './auth-cookies';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Wraps @fastify/csrf-protection (registered in configure-app). The plugin answers a failed check by
 * sending its own error on the reply; here the reply's `send` is intercepted so the failure becomes one of
 * our problem types and travels through the ProblemDetailsFilter like every other error.
 */
@Injectable()
export class CsrfService {
  issue(reply: FastifyReply): string {
    return reply.generateCsrf();
  }

  async verify(request: FastifyRequest, reply: FastifyReply): Promise<void> {
    if (SAFE_METHODS.has(request.method)) return;
    if (!request.cookies?.[CSRF_COOKIE]) {
      throw new ProblemException(
        PROBLEM_TYPES.csrfTokenInvalid,
        'The CSRF cookie is missing: call GET /v1/session/csrf-token first and send the token it returns in the X-Leastline-Csrf header.',
      );
    }
    const passed = await new Promise<boolean>((resolve) => {
      const interceptedReply = Object.create(reply) as FastifyReply;
      interceptedReply.send = () => {
        resolve(false);
        return interceptedReply;
      };
      request.server.csrfProtection(request, interceptedReply, () => resolve(true));
    });
    if (!passed) {
      const sent = request.headers[CSRF_HEADER];
      throw new ProblemException(
        PROBLEM_TYPES.csrfTokenInvalid,
        sent
          ? 'The X-Leastline-Csrf header does not match the CSRF cookie; fetch a fresh token from GET /v1/session/csrf-token.'
          : 'The X-Leastline-Csrf header is missing; send the token from GET /v1/session/csrf-token on every POST, PUT, PATCH and DELETE.',
      );
    }
  }
}
