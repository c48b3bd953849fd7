import type { TeamRole } from '../../teams/access/team-permissions';

/** Set by SessionGuard: the person behind a console request. */
export interface SessionAccount {
  userId: string;
  email: string;
  displayName: string;
  sessionId: string;
}

/** Set by TeamPermissionGuard: the caller's membership in the team named by the path. */
export interface TeamAccess {
  teamId: string;
  teamName: string;
  teamPlan: string;
  developerKeysAllowed: boolean;
  role: TeamRole;
}

declare module 'fastify' {
  interface FastifyRequest {
    account?: SessionAccount;
    teamAccess?: TeamAccess;
  }
}
