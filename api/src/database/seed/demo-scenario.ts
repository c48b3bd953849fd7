import bcrypt from 'bcryptjs';
import { QueryTypes, Sequelize } from 'sequelize';
import { API_KEY_SCOPES } from '../../api-keys/api-key-scopes';
import { deriveDemoApiKey, hashKeySecret } from '../../api-keys/key-format';
import { LeastlineEnvironment } from '../../config/env.validation';
import { TeamRole } from '../../teams/access/team-permissions';

/**
 * The invented demo scenario. Every name here is fictional: "Quillfeather Payments" is a made-up card
 * processor used to show the product; no real company, person or data set is represented.
 * Idempotent: running it twice leaves one copy.
 */
export const DEMO_TEAM = { slug: 'quillfeather-demo', name: 'Quillfeather Payments (invented demo team)' };

/** Shared by all four demo accounts and printed by `npm start`; demo data only, never a real account. */
export const DEMO_PASSWORD = 'quillfeather-demo-pass';

export const DEMO_USERS: ReadonlyArray<{ role: TeamRole; email: string; displayName: string }> = [
  { role: 'owner', email: 'olu.owner@quillfeather.example.test', displayName: 'Olu Okafor (invented)' },
  { role: 'admin', email: 'ada.admin@quillfeather.example.test', displayName: 'Ada Achterberg (invented)' },
  { role: 'developer', email: 'dana.developer@quillfeather.example.test', displayName: 'Dana Devlin (invented)' },
  { role: 'billing', email: 'bea.billing@quillfeather.example.test', displayName: 'Bea Bellweather (invented)' },
];

export const DEMO_KEY_NAME = 'Demo key (invented scenario)';

export interface SeedSummary {
  team: string;
  /** Sign in to the console with any of these e-mail addresses and the one demo password. */
  signIn: { email: string; password: string };
  users: Array<{ role: TeamRole; email: string }>;
  /** A working key for the demo team with every scope; derived from LEASTLINE_KEY_PEPPER, so stable per machine. */
  apiKey: string;
}

export async function seedDemoScenario(sequelize: Sequelize, env: LeastlineEnvironment): Promise<SeedSummary> {
  await sequelize.query(
    `INSERT INTO teams (id, slug, name, plan, is_demo, created_at, updated_at)
     VALUES (gen_random_uuid(), :slug, :name, 'growth', true, now(), now())
     ON CONFLICT (slug) DO NOTHING`,
    { replacements: DEMO_TEAM, type: QueryTypes.INSERT },
  );
  const [team] = await sequelize.query<{ id: string }>(`SELECT id FROM teams WHERE slug = :slug`, {
    replacements: { slug: DEMO_TEAM.slug },
    type: QueryTypes.SELECT,
  });
  if (!team) throw new Error('the demo team was not created');

  let passwordHash: string | undefined;
  const userIds = new Map<TeamRole, string>();
  for (const person of DEMO_USERS) {
    const [existing] = await sequelize.query<{ id: string }>(`SELECT id FROM users WHERE email = :email`, {
      replacements: { email: person.email },
      type: QueryTypes.SELECT,
    });
    let userId = existing?.id;
    if (!userId) {
      passwordHash ??= await bcrypt.hash(DEMO_PASSWORD, env.LEASTLINE_PASSWORD_HASH_COST);
      const [created] = await sequelize.query<{ id: string }>(
        `INSERT INTO users (id, email, display_name, password_hash, password_changed_at, created_at, updated_at)
         VALUES (gen_random_uuid(), :email, :displayName, :passwordHash, now(), now(), now())
         ON CONFLICT (email) DO UPDATE SET email = EXCLUDED.email
         RETURNING id`,
        { replacements: { ...person, passwordHash }, type: QueryTypes.SELECT },
      );
      userId = created?.id;
    }
    if (!userId) throw new Error(`the demo user ${person.email} was not created`);
    userIds.set(person.role, userId);
    // Without a conflict target this also skips a second owner (partial unique index) on a re-run.
    await sequelize.query(
      `INSERT INTO team_memberships (id, team_id, user_id, role, created_at, updated_at)
       VALUES (gen_random_uuid(), :teamId, :userId, :role, now(), now())
       ON CONFLICT DO NOTHING`,
      { replacements: { teamId: team.id, userId, role: person.role }, type: QueryTypes.INSERT },
    );
  }

  // Re-seeding restores the demo key if someone revoked or rotated it while trying the console.
  const demoKey = deriveDemoApiKey(env.LEASTLINE_KEY_PEPPER);
  await sequelize.query(
    `INSERT INTO api_keys (id, public_id, team_id, name, scopes, secret_hash, created_by_user_id, created_at, updated_at)
     VALUES (gen_random_uuid(), :publicId, :teamId, :name, ARRAY[:scopes]::varchar(32)[], :secretHash, :createdBy, now(), now())
     ON CONFLICT (public_id) DO UPDATE SET
       secret_hash = EXCLUDED.secret_hash, scopes = EXCLUDED.scopes, revoked_at = NULL, retires_at = NULL,
       expires_at = NULL, replaced_by_key_id = NULL, updated_at = now()`,
    {
      replacements: {
        publicId: demoKey.keyId,
        teamId: team.id,
        name: DEMO_KEY_NAME,
        scopes: [...API_KEY_SCOPES],
        secretHash: hashKeySecret(demoKey.secret, env.LEASTLINE_KEY_PEPPER),
        createdBy: userIds.get('owner') ?? null,
      },
      type: QueryTypes.INSERT,
    },
  );

  const owner = DEMO_USERS.find((person) => person.role === 'owner') ?? DEMO_USERS[0];
  return {
    team: DEMO_TEAM.name,
    signIn: { email: owner?.email ?? '', password: DEMO_PASSWORD },
    users: DEMO_USERS.map(({ role, email }) => ({ role, email })),
    apiKey: demoKey.fullKey,
  };
}
