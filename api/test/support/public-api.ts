import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { QueryTypes } from 'sequelize';
import { addMember, connection, insertTeam, insertUser, rememberForCleanup, signedInClient, TestUser } from './accounts';

export interface KeyedTeam {
  id: string;
  owner: TestUser;
  key: string;
}

/** A fresh team on `plan` with a signed-in owner and one API key holding `scopes`. */
export async function teamWithKey(
  app: NestFastifyApplication,
  label: string,
  scopes: string[] = ['fits:run', 'datasets:read', 'datasets:write', 'usage:read'],
  plan = 'scale',
): Promise<KeyedTeam> {
  const team = await insertTeam(app, label);
  rememberForCleanup('team', team.id);
  await connection(app).query('UPDATE teams SET plan = :plan WHERE id = :id', { replacements: { plan, id: team.id }, type: QueryTypes.UPDATE });
  const user = await insertUser(app, `${label}-owner`);
  rememberForCleanup('user', user.id);
  await addMember(app, team.id, user.id, 'owner');
  const owner = { ...user, client: await signedInClient(app, user.email) };
  const created = await owner.client.send('post', `/v1/teams/${team.id}/api-keys`, { name: `${label} key (invented)`, scopes });
  if (created.status !== 201) throw new Error(`key creation answered ${created.status}: ${JSON.stringify(created.body)}`);
  return { id: team.id, owner, key: created.body.plaintextKey as string };
}

export function bearer(key: string): Record<string, string> {
  return { Authorization: `Bearer ${key}` };
}

/** Log relative error (NIST StRD's measure of agreement): −log10(|computed − certified| / |certified|). */
export function logRelativeError(computed: number, certified: number): number {
  if (computed === certified) return 15;
  if (certified === 0) return -Math.log10(Math.abs(computed));
  return -Math.log10(Math.abs(computed - certified) / Math.abs(certified));
}

export async function usageRows(app: NestFastifyApplication, teamId: string) {
  return connection(app).query<{ endpoint: string; units: number; request_id: string; result_id: string | null }>(
    'SELECT endpoint, units, request_id, result_id FROM usage_records WHERE team_id = :teamId ORDER BY id',
    { replacements: { teamId }, type: QueryTypes.SELECT },
  );
}
