// `npm run bench`: compiles the API, then runs every benchmark in test/bench one after another (never in
// parallel: each measures side by side within its own run, and the machine has few cores). Benchmarks
// named *.api.bench.mjs run against a real API process on a throwaway database, started here.
import { spawn } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { buildApi, migrate, prepareStack } from './lib/stack.mjs';
import { ensureNodePackages } from './lib/dependencies.mjs';
import { fail, ROOT, runAsync, say } from './lib/repo.mjs';

function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

async function startApi() {
  const cluster = prepareStack();
  const database = `leastline_bench_${process.pid}`;
  cluster.ensureDatabase(database);
  const port = await freePort();
  const env = {
    ...process.env,
    LEASTLINE_DATABASE_URL: cluster.url(database),
    LEASTLINE_SESSION_SECRET: randomBytes(32).toString('base64url'),
    LEASTLINE_KEY_PEPPER: randomBytes(24).toString('base64url'),
    LEASTLINE_PORT: String(port),
    LEASTLINE_LOG_LEVEL: 'warn',
    LEASTLINE_SMTP_URL: `smtp://127.0.0.1:${await freePort()}`,
  };
  const demo = migrate(env, { seed: true });
  const child = spawn(process.execPath, ['--max-old-space-size=8192', join(ROOT, 'api', 'dist', 'main.js')], { env, stdio: 'inherit' });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 100; i++) {
    try {
      if ((await fetch(`${url}/v1/health`)).ok) break;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  return {
    env: { LEASTLINE_BENCH_URL: url, LEASTLINE_BENCH_KEY: demo.apiKey, LEASTLINE_BENCH_API_PID: String(child.pid) },
    stop() {
      child.kill('SIGTERM');
      setTimeout(() => {
        cluster.dropDatabase(database);
        if (cluster.startedHere) cluster.stop();
      }, 1000);
    },
  };
}

async function main() {
  ensureNodePackages();
  buildApi();
  const folder = join(ROOT, 'test', 'bench');
  const only = process.argv[2];
  const files = readdirSync(folder)
    .filter((file) => /\.bench\.(m?js)$/.test(file))
    .filter((file) => !only || file.includes(only))
    .sort();
  let failures = 0;
  let api;
  for (const file of files) {
    say(`benchmark ${file}`);
    let extraEnv = {};
    if (file.endsWith('.api.bench.mjs')) {
      api ??= await startApi();
      extraEnv = api.env;
    }
    const code = await runAsync(process.execPath, ['--max-old-space-size=8192', join(folder, file)], { env: { ...process.env, ...extraEnv } });
    if (code !== 0) failures += 1;
  }
  api?.stop();
  await new Promise((resolve) => setTimeout(resolve, 1500));
  if (failures > 0) fail(`${failures} benchmark(s) failed`);
}

main().catch((error) => fail(error.message));
