import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { FastifyRequest } from 'fastify';
import { ApiKeyScope } from '../../api-keys/api-key-scopes';
import { ApiKeyGuard, REQUIRED_SCOPES } from '../../api-keys/api-key.guard';
import { API_KEY_HEADER } from '../../api-keys/api-key.strategies';
import { ApiPrincipal } from '../../api-keys/api-principal';
import { SESSION_COOKIE } from '../../auth/auth-cookies';
import { SessionGuard } from '../../auth/session.guard';
import { TeamAccessService } from '../../teams/access/team-access.service';
import { roleAllows, TeamPermission } from '../../teams/access/team-permissions';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';
import { PublicPrincipal, RequestWithPrincipal } from './public-principal';

/** Header a signed-in console user sends to say which of their teams a public-API call is for. */
export const CONSOLE_TEAM_HEADER = 'x-leastline-team';

/** What a console role needs for the work an API key scope stands for (the permission matrix decides). */
const PERMISSION_FOR_SCOPE: Record<ApiKeyScope, TeamPermission> = {
  'fits:run': 'playground:use',
  'datasets:read': 'datasets:read',
  'datasets:write': 'datasets:write',
  'usage:read': 'usage:read',
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * Authenticates a public-API call either by API key (the usual way: ApiKeyGuard and its scopes) or, for
 * the console, by session cookie + CSRF token + the team header, with the caller's role checked against
 * the permission matrix. Either way the request ends up with one PublicPrincipal.
 */
@Injectable()
export class PublicApiGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly apiKeyGuard: ApiKeyGuard,
    private readonly sessionGuard: SessionGuard,
    private readonly teamAccess: TeamAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const request = context.switchToHttp().getRequest<FastifyRequest & RequestWithPrincipal & { user?: ApiPrincipal }>();
    const presentsKey = request.headers.authorization !== undefined || request.headers[API_KEY_HEADER.toLowerCase()] !== undefined;
    if (presentsKey || request.cookies?.[SESSION_COOKIE] === undefined) {
      await this.apiKeyGuard.canActivate(context);
      const key = request.user as ApiPrincipal;
      request.publicPrincipal = { teamId: key.teamId, teamPlan: key.teamPlan, keyId: key.keyId, scopes: key.scopes, via: 'api-key' };
      return true;
    }
    await this.sessionGuard.canActivate(context);
    request.publicPrincipal = await this.consolePrincipal(context, request);
    return true;
  }

  private async consolePrincipal(context: ExecutionContext, request: FastifyRequest): Promise<PublicPrincipal> {
    const account = request.account;
    if (!account) throw new Error('SessionGuard accepted the request without an account');
    const header = request.headers[CONSOLE_TEAM_HEADER];
    const teamId = Array.isArray(header) ? header[0] : header;
    if (!teamId || !UUID.test(teamId)) {
      throw new ProblemException(
        PROBLEM_TYPES.invalidRequest,
        `Console calls to the public API must name the team in the ${CONSOLE_TEAM_HEADER} header (a team id).`,
        [{ pointer: `#/headers/${CONSOLE_TEAM_HEADER}`, detail: 'missing or not a team id' }],
      );
    }
    const membership = await this.teamAccess.findMembership(teamId, account.userId);
    const team = membership ? await this.teamAccess.findTeam(teamId) : null;
    if (!membership || !team) {
      throw new ProblemException(PROBLEM_TYPES.notFound, 'No such team among yours.', [
        { pointer: `#/headers/${CONSOLE_TEAM_HEADER}`, detail: 'unknown team' },
      ]);
    }
    const required =
      this.reflector.getAllAndOverride<ApiKeyScope[] | undefined>(REQUIRED_SCOPES, [context.getHandler(), context.getClass()]) ?? [];
    const denied = required.filter((scope) => !roleAllows(membership.role, PERMISSION_FOR_SCOPE[scope]));
    if (denied.length > 0) {
      throw new ProblemException(
        PROBLEM_TYPES.forbidden,
        `Your role (${membership.role}) may not do this: it needs ${denied.map((scope) => PERMISSION_FOR_SCOPE[scope]).join(', ')}.`,
      );
    }
    const scopes = (Object.keys(PERMISSION_FOR_SCOPE) as ApiKeyScope[]).filter((scope) =>
      roleAllows(membership.role, PERMISSION_FOR_SCOPE[scope]),
    );
    return { teamId, teamPlan: team.plan, keyId: null, scopes, via: 'console', userId: account.userId };
  }
}
