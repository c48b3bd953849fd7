import { applyDecorators, createParamDecorator, ExecutionContext, SetMetadata, UseGuards } from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse, ApiSecurity, ApiUnauthorizedResponse } from '@nestjs/swagger';
import type { FastifyRequest } from 'fastify';
import { SessionAccount, TeamAccess } from '../common/request-context/request-principals';
import { TEAM_PERMISSION, TeamPermissionGuard } from '../teams/access/team-permission.guard';
import { TeamPermission } from '../teams/access/team-permissions';
import { AuditActor } from '../audit/audit.service';
import { SessionGuard } from './session.guard';

export const SESSION_SECURITY = 'session';
export const CSRF_SECURITY = 'csrf';

/**
 * One OpenAPI security requirement naming both the session cookie and the CSRF header (both are needed,
 * so they share one requirement object); omitConsoleCsrfOnReads then drops CSRF from GET operations.
 */
const consoleSecurity = () => ApiSecurity({ [SESSION_SECURITY]: [], [CSRF_SECURITY]: [] });

/** A console route for any signed-in person (CSRF checked on state-changing methods). */
export function SignedIn() {
  return applyDecorators(
    UseGuards(SessionGuard),
    consoleSecurity(),
    ApiUnauthorizedResponse({ description: 'No valid session cookie (problem details).' }),
  );
}

/** A console route under /v1/teams/{teamId} that needs one permission of the matrix. */
export function TeamPermissionRequired(permission: TeamPermission) {
  return applyDecorators(
    SetMetadata(TEAM_PERMISSION, permission),
    UseGuards(SessionGuard, TeamPermissionGuard),
    consoleSecurity(),
    ApiUnauthorizedResponse({ description: 'No valid session cookie (problem details).' }),
    ApiForbiddenResponse({ description: `Your role lacks "${permission}", or the CSRF token is wrong (problem details).` }),
    ApiNotFoundResponse({ description: 'No such team among yours (problem details).' }),
  );
}

function requestOf(context: ExecutionContext): FastifyRequest {
  return context.switchToHttp().getRequest<FastifyRequest>();
}

export const CurrentAccount = createParamDecorator((_data: unknown, context: ExecutionContext): SessionAccount => {
  const account = requestOf(context).account;
  if (!account) throw new Error('@CurrentAccount needs SessionGuard');
  return account;
});

export const OptionalAccount = createParamDecorator(
  (_data: unknown, context: ExecutionContext): SessionAccount | undefined => requestOf(context).account,
);

export const CurrentTeam = createParamDecorator((_data: unknown, context: ExecutionContext): TeamAccess => {
  const access = requestOf(context).teamAccess;
  if (!access) throw new Error('@CurrentTeam needs TeamPermissionGuard');
  return access;
});

/** The signed-in person plus the request's address, for the audit log. */
export const CurrentActor = createParamDecorator((_data: unknown, context: ExecutionContext): AuditActor & { userId: string; email: string } => {
  const request = requestOf(context);
  if (!request.account) throw new Error('@CurrentActor needs SessionGuard');
  return { userId: request.account.userId, email: request.account.email, ipAddress: request.ip };
});

export const ClientAddress = createParamDecorator((_data: unknown, context: ExecutionContext) => {
  const request = requestOf(context);
  const userAgent = request.headers['user-agent'];
  return { ipAddress: request.ip, userAgent: typeof userAgent === 'string' ? userAgent : undefined };
});
