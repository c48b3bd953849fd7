import type { components } from '@/lib/api-schema';

// What each team role may do in the console: the API's permission table, mirrored in this one file so
// pages decide "may act" the same way everywhere. The API still checks every request; this only keeps
// controls away from people whose requests would be refused.

export type TeamRole = components['schemas']['SessionMembershipDto']['role'];
type ApiKey = components['schemas']['ApiKeyDto'];

export const teamRoles: readonly TeamRole[] = ['owner', 'admin', 'developer', 'billing'];

/** Roles that can be given by invitation or role change; the owner role moves only by transfer. */
export const assignableRoles = ['admin', 'developer', 'billing'] as const satisfies readonly TeamRole[];
export type AssignableRole = (typeof assignableRoles)[number];

export const roleLabels: Record<TeamRole, string> = {
  owner: 'Owner',
  admin: 'Admin',
  developer: 'Developer',
  billing: 'Billing',
};

export const roleSummaries: Record<TeamRole, string> = {
  owner: 'Everything, including ownership transfer and deleting the team.',
  admin: 'Members, invitations, API keys, team settings and the audit log.',
  developer: 'Playground and datasets; own API keys when the team allows it.',
  billing: 'Plan, usage, invoices and payment method.',
};

const everyRole = teamRoles;

export const permissionRoles = {
  'team:read': everyRole,
  'team:update': ['owner', 'admin'],
  'team:delete': ['owner'],
  'team:transfer-ownership': ['owner'],
  'members:read': everyRole,
  'members:manage': ['owner', 'admin'],
  'invitations:manage': ['owner', 'admin'],
  'keys:manage-all': ['owner', 'admin'],
  'keys:manage-own': ['owner', 'admin', 'developer'],
  'audit:read': ['owner', 'admin'],
  'playground:use': ['owner', 'developer'],
  'datasets:read': ['owner', 'developer'],
  'datasets:write': ['owner', 'developer'],
  'plan:manage': ['owner', 'billing'],
  'usage:read': ['owner', 'admin', 'billing'],
  'invoices:read': ['owner', 'billing'],
  'payment-method:manage': ['owner', 'billing'],
} as const satisfies Record<string, readonly TeamRole[]>;

export type TeamPermission = keyof typeof permissionRoles;

export function roleAllows(role: TeamRole, permission: TeamPermission): boolean {
  return (permissionRoles[permission] as readonly TeamRole[]).includes(role);
}

export type KeyPolicyContext = {
  role: TeamRole;
  userId: string;
  developerKeysAllowed: boolean;
};

export type KeyPolicy = {
  /** The key list is visible at all (owners and admins see every key, developers their own). */
  mayView: boolean;
  mayCreate: boolean;
  /** Why creating is not offered, when it is not; null when it is. */
  createRefusal: string | null;
  mayRotate: (key: ApiKey) => boolean;
  mayRevoke: (key: ApiKey) => boolean;
};

const finishedStatuses: ReadonlySet<ApiKey['status']> = new Set(['rotated-out', 'expired', 'revoked']);

/**
 * Owners and admins manage every key. Developers see and revoke the keys they created, and create or
 * rotate keys only when the team allows developers their own keys. Billing members see no keys.
 */
export function keyPolicy({ role, userId, developerKeysAllowed }: KeyPolicyContext): KeyPolicy {
  const managesAll = roleAllows(role, 'keys:manage-all');
  const managesOwn = roleAllows(role, 'keys:manage-own');
  const mayIssue = managesAll || (managesOwn && developerKeysAllowed);
  const ownsOrManages = (key: ApiKey) => managesAll || (managesOwn && key.createdByUserId === userId);

  let createRefusal: string | null = null;
  if (!managesOwn) createRefusal = `The ${roleLabels[role].toLowerCase()} role does not include API keys.`;
  else if (!mayIssue) createRefusal = 'The admins of this team have not allowed developers to create their own keys.';

  return {
    mayView: managesOwn,
    mayCreate: mayIssue,
    createRefusal,
    mayRotate: (key) => mayIssue && ownsOrManages(key) && key.status === 'active',
    mayRevoke: (key) => ownsOrManages(key) && !finishedStatuses.has(key.status),
  };
}
