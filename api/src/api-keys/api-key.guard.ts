import { ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import type { FastifyRequest } from 'fastify';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { ApiKeyScope } from './api-key-scopes';
import { ApiKeyUsageRecorder } from './api-key-usage-recorder.service';
import { ApiPrincipal } from './api-principal';
import { API_KEY_HEADER, BEARER_KEY_STRATEGY, HEADER_KEY_STRATEGY } from './api-key.strategies';

export const REQUIRED_SCOPES = 'leastline:required-scopes';

/**
 * The public API's guard: a key in `Authorization: Bearer …` or `X-Leastline-Key`, checked by the two
 * passport-headerapikey strategies, then the scopes named by @RequireScopes on the handler or class.
 */
@Injectable()
export class ApiKeyGuard extends AuthGuard([BEARER_KEY_STRATEGY, HEADER_KEY_STRATEGY]) {
  constructor(
    private readonly reflector: Reflector,
    private readonly usage: ApiKeyUsageRecorder,
  ) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    await super.canActivate(context);
    const request = context.switchToHttp().getRequest<FastifyRequest & { user?: ApiPrincipal }>();
    const principal = request.user;
    if (!principal) throw new Error('ApiKeyGuard: authentication succeeded without a principal');
    const required =
      this.reflector.getAllAndOverride<ApiKeyScope[] | undefined>(REQUIRED_SCOPES, [context.getHandler(), context.getClass()]) ?? [];
    const missing = required.filter((scope) => !principal.scopes.includes(scope));
    if (missing.length > 0) {
      throw new ProblemException(
        PROBLEM_TYPES.insufficientScope,
        `This API key lacks the scope${missing.length > 1 ? 's' : ''} ${missing.join(', ')} needed here.`,
        [],
        { missingScopes: missing },
      );
    }
    this.usage.note(principal.keyId, request.ip);
    return true;
  }

  override handleRequest<TUser = ApiPrincipal>(error: unknown, user: TUser | false): TUser {
    if (error) throw error;
    if (!user) {
      throw new ProblemException(
        PROBLEM_TYPES.unauthenticated,
        `Send an API key as "Authorization: Bearer <key>" or in the ${API_KEY_HEADER} header.`,
      );
    }
    return user;
  }
}
