import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { readTestEnvironment } from './environment';

const repositoryRoot = join(__dirname, '..', '..');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

export type RunningApi = {
  origin: string;
  stop: () => Promise<void>;
};

async function waitUntilHealthy(origin: string, child: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The API exited with code ${child.exitCode}:\n${output()}`);
    try {
      const response = await fetch(`${origin}/v1/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  throw new Error(`The API did not become healthy within 30 s:\n${output()}`);
}

/**
 * Starts the built API (which also serves the built console) on a free loopback port. Mail is polled
 * often so that messages reach the SMTP fake within a second.
 */
export async function startApi(): Promise<RunningApi> {
  const environment = readTestEnvironment();
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  let output = '';
  const child = spawn(process.execPath, [join(repositoryRoot, 'api', 'dist', 'main.js')], {
    cwd: repositoryRoot,
    env: {
      ...process.env,
      ...environment,
      LEASTLINE_PORT: String(port),
      LEASTLINE_HOST: '127.0.0.1',
      LEASTLINE_PUBLIC_URL: origin,
      LEASTLINE_LOG_LEVEL: process.env.LEASTLINE_LOG_LEVEL ?? 'silent',
      LEASTLINE_MAIL_POLL_MS: '200',
      LEASTLINE_MAIL_RETRY_BASE_MS: '200',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const keep = (chunk: Buffer) => {
    output = (output + chunk.toString()).slice(-20_000);
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);

  await waitUntilHealthy(origin, child, () => output);

  return {
    origin,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
        child.once('exit', () => {
          clearTimeout(timer);
          resolve();
        });
        child.kill('SIGTERM');
      }),
  };
}
