/** Every action the audit log records: the one list, so the docs and the `action` filter agree. */
export const AUDIT_ACTIONS = [
  'session.signed-in',
  'team.created',
  'team.updated',
  'team.plan-changed',
  'team.ownership-transferred',
  'member.role-changed',
  'member.removed',
  'invitation.created',
  'invitation.revoked',
  'invitation.accepted',
  'api-key.created',
  'api-key.rotated',
  'api-key.revoked',
  'dataset.created',
  'dataset.deleted',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];
