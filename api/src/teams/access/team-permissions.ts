/**
 * The permission matrix: the one table that says which team role may do what. TeamPermissionGuard reads
 * it for every console route under /v1/teams/{teamId}; services consult `roleAllows` only where a rule
 * also depends on the resource (a developer's own keys). The README's table is written from this one.
 */
export const TEAM_ROLES = ['owner', 'admin', 'developer', 'billing'] as const;
export type TeamRole = (typeof TEAM_ROLES)[number];

/** Roles that can be given by invitation or role change; ownership only moves by transfer. */
export const ASSIGNABLE_ROLES = ['admin', 'developer', 'billing'] as const satisfies readonly TeamRole[];
export type AssignableRole = (typeof ASSIGNABLE_ROLES)[number];

const EVERY_ROLE: readonly TeamRole[] = TEAM_ROLES;

export const PERMISSION_MATRIX = {
  'team:read': { roles: EVERY_ROLE, description: 'See the team, its plan and settings' },
  'team:update': { roles: ['owner', 'admin'], description: 'Rename the team, allow developers their own keys' },
  'team:delete': { roles: ['owner'], description: 'Delete the team and everything in it' },
  'team:transfer-ownership': { roles: ['owner'], description: 'Make another member the owner' },
  'members:read': { roles: EVERY_ROLE, description: 'List members and their roles' },
  'members:manage': { roles: ['owner', 'admin'], description: 'Change roles, remove members' },
  'invitations:manage': { roles: ['owner', 'admin'], description: 'Invite by e-mail, list and withdraw invitations' },
  'keys:manage-all': { roles: ['owner', 'admin'], description: "Create, rotate and revoke any of the team's API keys" },
  'keys:manage-own': {
    roles: ['owner', 'admin', 'developer'],
    description: 'Create, rotate and revoke keys one created (developers: only when the team allows it)',
  },
  'audit:read': { roles: ['owner', 'admin'], description: 'Read the audit log' },
  'playground:use': { roles: ['owner', 'developer'], description: 'Run fits in the console playground' },
  'datasets:read': { roles: ['owner', 'developer'], description: 'List and download datasets' },
  'datasets:write': { roles: ['owner', 'developer'], description: 'Upload and delete datasets' },
  'plan:manage': { roles: ['owner', 'billing'], description: 'Change the plan' },
  'usage:read': { roles: ['owner', 'admin', 'billing'], description: 'See metered usage and the request overview' },
  'invoices:read': { roles: ['owner', 'billing'], description: 'See and download invoices' },
  'payment-method:manage': { roles: ['owner', 'billing'], description: 'Set the payment method' },
} as const satisfies Record<string, { roles: readonly TeamRole[]; description: string }>;

export type TeamPermission = keyof typeof PERMISSION_MATRIX;

export function roleAllows(role: TeamRole, permission: TeamPermission): boolean {
  return (PERMISSION_MATRIX[permission].roles as readonly TeamRole[]).includes(role);
}

export function isTeamRole(value: unknown): value is TeamRole {
  return typeof value === 'string' && (TEAM_ROLES as readonly string[]).includes(value);
}
