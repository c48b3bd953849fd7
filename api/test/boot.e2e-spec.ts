import { spawnSync } from 'node:child_process';
import { createServer, Server } from 'node:net';
import { join } from 'node:path';

/**
 * Start-up faults, checked on the compiled server exactly as an operator would run it
 * (`npm test` compiles the API before the suites run).
 */
const MAIN = join(__dirname, '..', 'dist', 'main.js');

function start(env: Record<string, string | undefined>) {
  return spawnSync(process.execPath, [MAIN], { env: { PATH: process.env.PATH, ...env }, encoding: 'utf8', timeout: 20_000 });
}

const validEnv = () => ({
  LEASTLINE_DATABASE_URL: process.env.LEASTLINE_DATABASE_URL,
  LEASTLINE_SESSION_SECRET: 'boot-test-secret-boot-test-secret-0000',
  LEASTLINE_KEY_PEPPER: 'boot-test-pepper-0000',
  LEASTLINE_LOG_LEVEL: 'silent',
});

describe('server start-up', () => {
  it('stops with one message naming a missing variable', () => {
    const result = start({ ...validEnv(), LEASTLINE_DATABASE_URL: undefined });
    expect(result.status).toBe(78);
    expect(result.stderr).toContain('LEASTLINE_DATABASE_URL is required');
    expect(result.stderr).not.toMatch(/\n\s+at /);
  });

  it('stops with one message naming a wrong value', () => {
    const result = start({ ...validEnv(), LEASTLINE_PORT: 'eighty' });
    expect(result.status).toBe(78);
    expect(result.stderr).toContain('LEASTLINE_PORT must be an integer');
  });

  describe('when the port is taken', () => {
    let blocker: Server;
    let port = 0;
    beforeAll(async () => {
      blocker = createServer();
      await new Promise<void>((resolve) => blocker.listen(0, '127.0.0.1', () => resolve()));
      const address = blocker.address();
      port = typeof address === 'object' && address ? address.port : 0;
    });
    afterAll(() => new Promise<void>((resolve) => blocker.close(() => resolve())));

    it('reports the port plainly instead of a stack trace', () => {
      const result = start({ ...validEnv(), LEASTLINE_PORT: String(port) });
      expect(result.status).toBe(75);
      expect(result.stderr).toContain(`port ${port} on 127.0.0.1 is already in use`);
      expect(result.stderr).not.toMatch(/\n\s+at /);
    });
  });
});
