import { ASSIGNABLE_ROLES, PERMISSION_MATRIX, roleAllows, TEAM_ROLES, TeamPermission } from './team-permissions';

describe('the permission matrix', () => {
  const permissions = Object.keys(PERMISSION_MATRIX) as TeamPermission[];

  it('lets the owner do everything', () => {
    expect(permissions.filter((permission) => !roleAllows('owner', permission))).toEqual([]);
  });

  it('keeps ownership out of the roles an invitation or role change can give', () => {
    expect(ASSIGNABLE_ROLES).not.toContain('owner');
  });

  it('keeps billing away from keys, members and the audit log, and admins away from billing', () => {
    for (const permission of ['keys:manage-own', 'keys:manage-all', 'members:manage', 'invitations:manage', 'audit:read'] as const) {
      expect(roleAllows('billing', permission)).toBe(false);
    }
    for (const permission of ['plan:manage', 'invoices:read', 'payment-method:manage'] as const) {
      expect(roleAllows('admin', permission)).toBe(false);
      expect(roleAllows('billing', permission)).toBe(true);
    }
    expect(roleAllows('developer', 'keys:manage-all')).toBe(false);
    expect(roleAllows('developer', 'keys:manage-own')).toBe(true);
  });

  it('names only known roles', () => {
    for (const permission of permissions) {
      for (const role of PERMISSION_MATRIX[permission].roles) expect(TEAM_ROLES).toContain(role);
    }
  });
});
