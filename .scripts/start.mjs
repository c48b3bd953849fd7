// `npm start`: set everything up on a fresh machine, then serve the API and the console on one origin.
// Ctrl-C stops every process this command started (PostgreSQL only if it was not already running).
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { localSecrets } from './lib/secrets.mjs';
import { buildApi, buildConsole, migrate, prepareStack } from './lib/stack.mjs';
import { fail, ROOT, say } from './lib/repo.mjs';

const API_PORT = Number(process.env.LEASTLINE_PORT ?? 4310);
const SMTP_PORT = Number(process.env.LEASTLINE_SMTP_PORT ?? 4325);
const INBOX_PORT = Number(process.env.LEASTLINE_INBOX_PORT ?? 4326);

async function main() {
  const cluster = prepareStack();
  cluster.ensureDatabase('leastline');
  buildApi();
  buildConsole();
  const secrets = localSecrets();
  const env = {
    ...process.env,
    LEASTLINE_DATABASE_URL: cluster.url('leastline'),
    LEASTLINE_PORT: String(API_PORT),
    LEASTLINE_HOST: '127.0.0.1',
    LEASTLINE_PUBLIC_URL: `http://127.0.0.1:${API_PORT}`,
    LEASTLINE_SESSION_SECRET: secrets.sessionSecret,
    LEASTLINE_KEY_PEPPER: secrets.keyPepper,
    LEASTLINE_SMTP_URL: `smtp://127.0.0.1:${SMTP_PORT}`,
    LEASTLINE_CONSOLE_DIST: join(ROOT, 'console', 'dist'),
  };
  const demo = migrate(env, { seed: true });

  const children = [];
  const spawnChild = (name, args) => {
    const child = spawn(process.execPath, args, { cwd: ROOT, env, stdio: ['ignore', 'inherit', 'inherit'] });
    child.on('exit', (code, signal) => {
      if (!stopping) {
        say(`${name} exited (${code ?? signal}); stopping everything`);
        void shutdown(code ?? 1);
      }
    });
    children.push(child);
    return child;
  };
  let stopping = false;
  const shutdown = async (code) => {
    if (stopping) return;
    stopping = true;
    for (const child of children) child.kill('SIGTERM');
    await new Promise((resolve) => setTimeout(resolve, 800));
    if (cluster.startedHere) {
      say('stopping PostgreSQL');
      try {
        cluster.stop();
      } catch (error) {
        say(`PostgreSQL did not stop cleanly: ${error.message}`);
      }
    }
    process.exit(code);
  };
  process.on('SIGINT', () => void shutdown(0));
  process.on('SIGTERM', () => void shutdown(0));

  spawnChild('mail fake', [join(ROOT, '.scripts', 'mail-fake.mjs'), String(SMTP_PORT), String(INBOX_PORT)]);
  spawnChild('API', [join(ROOT, 'api', 'dist', 'main.js')]);
  await waitForReady(`http://127.0.0.1:${API_PORT}/v1/health/ready`);
  say('ready:');
  say(`  console         http://127.0.0.1:${API_PORT}/`);
  say(`  API             http://127.0.0.1:${API_PORT}/v1  (health: /v1/health/ready)`);
  say(`  OpenAPI         http://127.0.0.1:${API_PORT}/v1/openapi.json`);
  say(`  local inbox     http://127.0.0.1:${INBOX_PORT}/`);
  say(`  PostgreSQL      127.0.0.1:${cluster.port} (database "leastline")`);
  if (demo?.signIn) {
    say(`demo team (invented): ${demo.team}`);
    say(`  sign in as      ${demo.signIn.email} / ${demo.signIn.password}`);
    for (const user of demo.users ?? []) say(`  ${user.role.padEnd(14)} ${user.email}`);
  }
  if (demo?.apiKey) say(`  demo API key    ${demo.apiKey}`);
  say('press Ctrl-C to stop');
}

async function waitForReady(url) {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 300));
  }
  throw new Error(`the API did not become ready at ${url} within 60 s`);
}

main().catch((error) => fail(error.message));
