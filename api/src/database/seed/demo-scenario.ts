import { QueryTypes, Sequelize } from 'sequelize';
import { LeastlineEnvironment } from '../../config/env.validation';

/**
 * The invented demo scenario. Every name here is fictional: "Quillfeather Payments" is a made-up card
 * processor used to show the product; no real company, person or data set is represented.
 * Idempotent: running it twice leaves one copy.
 */
export const DEMO_TEAM = { slug: 'quillfeather-demo', name: 'Quillfeather Payments (invented demo team)' };

export interface SeedSummary {
  team: string;
}

export async function seedDemoScenario(sequelize: Sequelize, _env: LeastlineEnvironment): Promise<SeedSummary> {
  await sequelize.query(
    `INSERT INTO teams (id, slug, name, plan, is_demo, created_at, updated_at)
     VALUES (gen_random_uuid(), :slug, :name, 'growth', true, now(), now())
     ON CONFLICT (slug) DO NOTHING`,
    { replacements: DEMO_TEAM, type: QueryTypes.INSERT },
  );
  return { team: DEMO_TEAM.name };
}
