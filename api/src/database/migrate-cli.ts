import { Sequelize } from 'sequelize';
import { validateEnvironment } from '../config/env.validation';
import { createMigrator } from './migrator';
import { seedDemoScenario } from './seed/demo-scenario';

/**
 * `node dist/database/migrate-cli.js up|down|seed`: the runner used by `npm start`, `npm test` and
 * operators. `down` reverts the last migration only.
 */
async function main() {
  const command = process.argv[2] ?? 'up';
  const env = validateEnvironment(process.env);
  const sequelize = new Sequelize(env.LEASTLINE_DATABASE_URL, { logging: false });
  try {
    const migrator = createMigrator(sequelize, (line) => process.stdout.write(`${line}\n`));
    if (command === 'up') {
      const applied = await migrator.up();
      process.stdout.write(`migrations applied: ${applied.length}\n`);
    } else if (command === 'down') {
      await migrator.down();
    } else if (command === 'seed') {
      const summary = await seedDemoScenario(sequelize, env);
      process.stdout.write(`${JSON.stringify(summary)}\n`);
    } else {
      throw new Error(`unknown command "${command}" (use up, down or seed)`);
    }
  } finally {
    await sequelize.close();
  }
}

main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
