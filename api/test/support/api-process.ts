import { ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';

/** The compiled server, started as deployed (`npm test` compiles the API before the suites run). */
const MAIN = join(__dirname, '..', '..', 'dist', 'main.js');

export async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

export async function startServer(port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, [MAIN], {
    env: { ...process.env, LEASTLINE_PORT: String(port), LEASTLINE_LOG_LEVEL: 'silent', LEASTLINE_CONSOLE_DIST: '' },
    stdio: 'ignore',
  });
  const deadline = Date.now() + 20_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/v1/health`)).ok) return child;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill();
  throw new Error(`server on ${port} did not start`);
}

