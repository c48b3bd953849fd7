import type { components } from '@/lib/api-schema';
import type { TeamRole } from '@/lib/permissions';

// Invented demo data for component tests, in the shapes the API documents.
export const demoTeamId = '7b0c1d2e-3f40-4a51-8b62-9c7d8e9f0a1b';
export const otherTeamId = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
export const demoAccountId = 'c0ffee00-1111-4222-8333-444455556666';

export function demoSession(role: TeamRole): components['schemas']['SessionDto'] {
  return {
    account: { id: demoAccountId, email: 'dana.developer@quillfeather.example.test', displayName: 'Dana Devlin (invented)' },
    memberships: [
      { teamId: demoTeamId, teamName: 'Quillfeather Payments (invented demo team)', role },
      { teamId: otherTeamId, teamName: 'Quillfeather risk analytics (invented)', role: 'admin' },
    ],
    expiresAt: '2030-01-01T00:00:00.000Z',
  };
}

export function demoTeam(role: TeamRole, developerKeysAllowed = false): components['schemas']['TeamDto'] {
  return {
    id: demoTeamId,
    slug: 'quillfeather-demo',
    name: 'Quillfeather Payments (invented demo team)',
    plan: 'growth',
    isDemo: true,
    developerKeysAllowed,
    yourRole: role,
  };
}

export function demoKey(overrides: Partial<components['schemas']['ApiKeyDto']> = {}): components['schemas']['ApiKeyDto'] {
  return {
    id: '9d8c7b6a-5f4e-4d3c-8b2a-190817263544',
    name: 'settlement-forecast job (invented)',
    prefix: 'llsq1_7k2m9x4r8t3v_…',
    scopes: ['fits:run'],
    status: 'active',
    createdByUserId: demoAccountId,
    createdAt: '2026-01-05T09:00:00.000Z',
    expiresAt: null,
    lastUsedAt: null,
    lastUsedIp: null,
    revokedAt: null,
    retiresAt: null,
    replacedByKeyId: null,
    ...overrides,
  };
}
