import { describe, expect, it } from 'vitest';
import { keyPolicy, roleAllows, teamRoles, type TeamPermission } from '@/lib/permissions';
import { demoKey } from '@/testing/demo-fixtures';

const me = 'c0ffee00-1111-4222-8333-444455556666';
const someoneElse = 'abcdef00-1111-4222-8333-444455556666';

describe('role permissions', () => {
  // Rows copied from the permission table in README.md (owner, admin, developer, billing).
  const table: Array<[TeamPermission, boolean, boolean, boolean, boolean]> = [
    ['team:read', true, true, true, true],
    ['team:update', true, true, false, false],
    ['team:transfer-ownership', true, false, false, false],
    ['members:manage', true, true, false, false],
    ['invitations:manage', true, true, false, false],
    ['keys:manage-all', true, true, false, false],
    ['keys:manage-own', true, true, true, false],
    ['audit:read', true, true, false, false],
    ['playground:use', true, false, true, false],
    ['usage:read', true, true, false, true],
    ['plan:manage', true, false, false, true],
  ];

  it.each(table)('%s: owner %s, admin %s, developer %s, billing %s', (permission, ...allowed) => {
    expect(teamRoles.map((role) => roleAllows(role, permission))).toEqual(allowed);
  });
});

describe('API key actions by role', () => {
  const mine = demoKey({ createdByUserId: me });
  const theirs = demoKey({ createdByUserId: someoneElse });

  it('lets owners and admins create, rotate and revoke any key', () => {
    for (const role of ['owner', 'admin'] as const) {
      const policy = keyPolicy({ role, userId: me, developerKeysAllowed: false });
      expect([policy.mayView, policy.mayCreate, policy.mayRotate(theirs), policy.mayRevoke(theirs)]).toEqual([true, true, true, true]);
      expect(policy.createRefusal).toBeNull();
    }
  });

  it('lets a developer only revoke own keys while the team does not allow developer keys', () => {
    const policy = keyPolicy({ role: 'developer', userId: me, developerKeysAllowed: false });
    expect(policy.mayView).toBe(true);
    expect(policy.mayCreate).toBe(false);
    expect(policy.createRefusal).toMatch(/not allowed developers/);
    expect([policy.mayRotate(mine), policy.mayRevoke(mine), policy.mayRevoke(theirs)]).toEqual([false, true, false]);
  });

  it('lets a developer create and rotate own keys once the team allows it, but never touch others’ keys', () => {
    const policy = keyPolicy({ role: 'developer', userId: me, developerKeysAllowed: true });
    expect([policy.mayCreate, policy.mayRotate(mine), policy.mayRotate(theirs), policy.mayRevoke(theirs)]).toEqual([
      true,
      true,
      false,
      false,
    ]);
  });

  it('gives billing members no view of keys and no actions', () => {
    const policy = keyPolicy({ role: 'billing', userId: me, developerKeysAllowed: true });
    expect([policy.mayView, policy.mayCreate, policy.mayRotate(mine), policy.mayRevoke(mine)]).toEqual([false, false, false, false]);
    expect(policy.createRefusal).toMatch(/billing role does not include API keys/);
  });

  it('offers rotation only for active keys and revocation only for keys that still work', () => {
    const policy = keyPolicy({ role: 'admin', userId: me, developerKeysAllowed: false });
    const byStatus = (['active', 'retiring', 'rotated-out', 'expired', 'revoked'] as const).map((status) => {
      const key = demoKey({ status });
      return [status, policy.mayRotate(key), policy.mayRevoke(key)];
    });
    expect(byStatus).toEqual([
      ['active', true, true],
      ['retiring', false, true],
      ['rotated-out', false, false],
      ['expired', false, false],
      ['revoked', false, false],
    ]);
  });
});
