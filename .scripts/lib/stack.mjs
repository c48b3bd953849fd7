// The shared bootstrap of `npm start` and `npm test`: packages, PostgreSQL, a database, migrations.
import { join } from 'node:path';
import { ensureNodePackages, ensurePostgres } from './dependencies.mjs';
import { ensureCluster } from './postgres.mjs';
import { capture, npmCommand, ROOT, run, say } from './repo.mjs';

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

/**
 * Applies every pending migration, then (optionally) the invented demo scenario; returns the seed's summary
 * (demo sign-in and key) when it seeded.
 */
export function migrate(env, { seed }) {
  const cli = join(ROOT, 'api', 'dist', 'database', 'migrate-cli.js');
  run(process.execPath, [cli, 'up'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
  if (!seed) return undefined;
  const output = capture(process.execPath, [cli, 'seed'], { env, stdio: ['ignore', 'pipe', 'inherit'] });
  if (output === undefined) throw new Error('seeding the demo scenario failed');
  return JSON.parse(output.split('\n').filter(Boolean).pop() ?? '{}');
}
