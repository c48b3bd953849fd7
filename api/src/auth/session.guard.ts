import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import '../common/request-context/request-principals';
import { SESSION_COOKIE } from './auth-cookies';
import { CsrfService } from './csrf.service';
import { SessionsService } from './sessions.service';

/** Console routes: a valid session cookie, and on state-changing methods a valid CSRF token. */
@Injectable()
export class SessionGuard implements CanActivate {
  constructor(
    private readonly sessions: SessionsService,
    private readonly csrf: CsrfService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    const request = http.getRequest<FastifyRequest>();
    const token = request.cookies?.[SESSION_COOKIE];
    const account = token ? await this.sessions.resolve(token) : undefined;
    if (!account) {
      throw new ProblemException(
        PROBLEM_TYPES.unauthenticated,
        'Sign in first: this request has no valid session cookie (it is missing, expired or signed out).',
      );
    }
    request.account = {
      userId: account.userId,
      email: account.email,
      displayName: account.displayName,
      sessionId: account.sessionId,
    };
    await this.csrf.verify(request, http.getResponse<FastifyReply>());
    return true;
  }
}

/**
 * For routes that behave differently for a signed-in caller but also serve anonymous ones (invitation
 * acceptance): sets the account when the cookie is valid, never refuses, and still checks CSRF.
 */
@Injectable()
export class OptionalSessionGuard implements CanActivate {
  constructor(
    private readonly sessions: SessionsService,
    private readonly csrf: CsrfService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const http = context.switchToHttp();
    const request = http.getRequest<FastifyRequest>();
    const token = request.cookies?.[SESSION_COOKIE];
    const account = token ? await this.sessions.resolve(token) : undefined;
    if (account) {
      request.account = {
        userId: account.userId,
        email: account.email,
        displayName: account.displayName,
        sessionId: account.sessionId,
      };
    }
    await this.csrf.verify(request, http.getResponse<FastifyReply>());
    return true;
  }
}
