import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { FastifyRequest } from 'fastify';
import { ProblemException } from '../../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../../common/problem-details/problem-types';
import '../../common/request-context/request-principals';
import { TeamAccessService } from './team-access.service';
import { PERMISSION_MATRIX, roleAllows, TeamPermission } from './team-permissions';

export const TEAM_PERMISSION = 'leastline:team-permission';
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/**
 * The one guard that reads the permission matrix. Runs after SessionGuard. A team the caller does not
 * belong to answers 404 exactly like a team that does not exist, so ids of other teams reveal nothing;
 * a member whose role lacks the permission gets 403 naming the role and the permission.
 */
@Injectable()
export class TeamPermissionGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly access: TeamAccessService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const permission = this.reflector.get<TeamPermission | undefined>(TEAM_PERMISSION, context.getHandler());
    if (!permission) throw new Error('TeamPermissionGuard used on a route without @TeamPermission');
    const request = context.switchToHttp().getRequest<FastifyRequest<{ Params: { teamId?: string } }>>();
    const account = request.account;
    if (!account) throw new Error('TeamPermissionGuard must run after SessionGuard');
    const teamId = request.params.teamId ?? '';
    if (!UUID.test(teamId)) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, `The path parameter teamId must be a UUID (got "${teamId.slice(0, 60)}").`, [
        { pointer: '#/path/teamId', detail: 'must be a UUID' },
      ]);
    }
    const membership = await this.access.findMembership(teamId.toLowerCase(), account.userId);
    if (!membership) {
      throw new ProblemException(PROBLEM_TYPES.notFound, `No team with id ${teamId} is visible to you.`);
    }
    if (!roleAllows(membership.role, permission)) {
      const allowed = PERMISSION_MATRIX[permission].roles.join(', ');
      throw new ProblemException(
        PROBLEM_TYPES.forbidden,
        `Your role in this team is ${membership.role}; "${permission}" needs one of: ${allowed}.`,
        [],
        { requiredPermission: permission, yourRole: membership.role },
      );
    }
    request.teamAccess = {
      teamId: membership.teamId,
      teamName: membership.teamName,
      teamPlan: membership.teamPlan,
      developerKeysAllowed: membership.developerKeysAllowed,
      role: membership.role,
    };
    return true;
  }
}
