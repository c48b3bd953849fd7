import { NestFastifyApplication } from '@nestjs/platform-fastify';
import bcrypt from 'bcryptjs';
import { createHash, randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { getConnectionToken } from '@nestjs/sequelize';
import { ConsoleClient } from './console-client';

export type Role = 'owner' | 'admin' | 'developer' | 'billing';
export const ROLES: Role[] = ['owner', 'admin', 'developer', 'billing'];
export const TEST_PASSWORD = 'invented-test-password-01';

/** One bcrypt hash (cost 10) shared by every test user, so setting up a team costs no hashing. */
let sharedHash: string | undefined;
function passwordHash(): string {
  sharedHash ??= bcrypt.hashSync(TEST_PASSWORD, 10);
  return sharedHash;
}

export function uniqueSuffix(): string {
  return randomBytes(5).toString('hex');
}

export function uniqueEmail(label: string): string {
  const email = `${label}.${uniqueSuffix()}@example.test`;
  usedEmails.push(email);
  return email;
}

export function connection(app: NestFastifyApplication): Sequelize {
  return app.get<Sequelize>(getConnectionToken());
}

export interface TestUser {
  id: string;
  email: string;
  client: ConsoleClient;
}

export interface TestTeam {
  id: string;
  slug: string;
  members: Record<Role, TestUser>;
  /** A signed-in person who belongs to another team only. */
  outsider: TestUser;
}

export async function insertUser(app: NestFastifyApplication, label: string): Promise<{ id: string; email: string }> {
  const email = uniqueEmail(label);
  const [row] = await connection(app).query<{ id: string }>(
    `INSERT INTO users (id, email, display_name, password_hash, password_changed_at, created_at, updated_at)
     VALUES (gen_random_uuid(), :email, :name, :hash, now(), now(), now()) RETURNING id`,
    { replacements: { email, name: `${label} (invented test person)`, hash: passwordHash() }, type: QueryTypes.SELECT },
  );
  if (!row) throw new Error('user insert returned nothing');
  return { id: row.id, email };
}

export async function insertTeam(app: NestFastifyApplication, label: string): Promise<{ id: string; slug: string }> {
  const slug = `${label}-${uniqueSuffix()}`;
  const [row] = await connection(app).query<{ id: string }>(
    `INSERT INTO teams (id, slug, name, plan, is_demo, created_at, updated_at)
     VALUES (gen_random_uuid(), :slug, :name, 'starter', false, now(), now()) RETURNING id`,
    { replacements: { slug, name: `${label} (invented test team)` }, type: QueryTypes.SELECT },
  );
  if (!row) throw new Error('team insert returned nothing');
  return { id: row.id, slug };
}

export async function addMember(app: NestFastifyApplication, teamId: string, userId: string, role: Role): Promise<void> {
  await connection(app).query(
    `INSERT INTO team_memberships (id, team_id, user_id, role, created_at, updated_at)
     VALUES (gen_random_uuid(), :teamId, :userId, :role, now(), now())`,
    { replacements: { teamId, userId, role }, type: QueryTypes.INSERT },
  );
}

export async function signedInClient(app: NestFastifyApplication, email: string): Promise<ConsoleClient> {
  const client = new ConsoleClient(app);
  const response = await client.signIn(email, TEST_PASSWORD);
  if (response.status !== 201) throw new Error(`sign-in for ${email} answered ${response.status}: ${JSON.stringify(response.body)}`);
  return client;
}

/** A team with one signed-in member per role, plus a signed-in outsider who owns a team of their own. */
export async function createTeamWithRoles(app: NestFastifyApplication, label: string): Promise<TestTeam> {
  const team = await insertTeam(app, label);
  const members = {} as Record<Role, TestUser>;
  for (const role of ROLES) {
    const user = await insertUser(app, `${label}-${role}`);
    await addMember(app, team.id, user.id, role);
    members[role] = { ...user, client: await signedInClient(app, user.email) };
  }
  const otherTeam = await insertTeam(app, `${label}-other`);
  const outsiderUser = await insertUser(app, `${label}-outsider`);
  await addMember(app, otherTeam.id, outsiderUser.id, 'owner');
  const outsider = { ...outsiderUser, client: await signedInClient(app, outsiderUser.email) };
  createdTeams.push(team.id, otherTeam.id);
  createdUsers.push(...Object.values(members).map((member) => member.id), outsider.id);
  return { ...team, members, outsider };
}

const createdTeams: string[] = [];
const createdUsers: string[] = [];
const usedEmails: string[] = [];

export function rememberForCleanup(kind: 'team' | 'user' | 'email', id: string): void {
  (kind === 'team' ? createdTeams : kind === 'user' ? createdUsers : usedEmails).push(id);
}

/** Deletes what this spec created; cascades remove memberships, keys, invitations, sessions and audit rows. */
export async function cleanUp(app: NestFastifyApplication): Promise<void> {
  const db = connection(app);
  if (createdTeams.length > 0) await db.query(`DELETE FROM teams WHERE id IN (:ids)`, { replacements: { ids: createdTeams.splice(0) } });
  if (createdUsers.length > 0) await db.query(`DELETE FROM users WHERE id IN (:ids)`, { replacements: { ids: createdUsers.splice(0) } });
  if (usedEmails.length > 0) {
    const emails = usedEmails.splice(0);
    await db.query(`DELETE FROM users WHERE email IN (:emails)`, { replacements: { emails } });
    await db.query(`DELETE FROM mail_outbox WHERE recipient IN (:emails)`, { replacements: { emails } });
    const throttleKeys = emails.map((email) => createHash('sha256').update(email).digest('hex'));
    await db.query(`DELETE FROM sign_in_throttles WHERE email_key IN (:throttleKeys)`, { replacements: { throttleKeys } });
  }
}
