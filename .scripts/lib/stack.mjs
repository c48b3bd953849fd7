// The shared bootstrap of `npm start` and `npm test`: packages, PostgreSQL, a database, migrations.
import { join } from 'node:path';
import { ensureNodePackages, ensurePostgres } from './dependencies.mjs';
import { ensureCluster } from './postgres.mjs';
import { npmCommand, ROOT, run, say } from './repo.mjs';

export function prepareStack() {
  ensureNodePackages();
  const bin = ensurePostgres();
  return ensureCluster(bin);
}

export function buildApi() {
  say('compiling the API');
  run(npmCommand(), ['run', '--silent', 'build', '-w', 'api']);
}

export function buildConsole() {
  say('building the console');
  run(npmCommand(), ['run', '--silent', 'build', '-w', 'console']);
}

/** Applies every pending migration, then (optionally) the invented demo scenario. */
export function migrate(env, { seed }) {
  const cli = join(ROOT, 'api', 'dist', 'database', 'migrate-cli.js');
  run(process.execPath, [cli, 'up'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
  if (seed) run(process.execPath, [cli, 'seed'], { env, stdio: ['ignore', 'inherit', 'inherit'] });
}
