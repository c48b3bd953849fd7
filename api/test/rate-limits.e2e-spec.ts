import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { ChildProcess } from 'node:child_process';
import { cleanUp } from './support/accounts';
import { KeyedTeam, teamWithKey } from './support/public-api';
import { freePort, startServer } from './support/api-process';
import { createTestApp } from './support/test-app';

/**
 * Two API processes (the compiled server, as deployed) against one database: the per-key quota of the
 * "trial" plan (5 requests per minute, plan-limits.ts) must hold across both.
 */
describe('rate limits shared by two API processes', () => {
  let app: NestFastifyApplication;
  let team: KeyedTeam;
  const servers: ChildProcess[] = [];
  const ports: number[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    team = await teamWithKey(app, 'rate-limits', ['datasets:read'], 'trial');
    for (let i = 0; i < 2; i++) {
      const port = await freePort();
      ports.push(port);
      servers.push(await startServer(port));
    }
  });
  afterAll(async () => {
    for (const server of servers) server.kill('SIGTERM');
    await cleanUp(app);
    await app.close();
  });

  it('counts requests to both processes against one per-key quota and answers 429 with Retry-After', async () => {
    const statuses: number[] = [];
    let limited: Response | undefined;
    for (let i = 0; i < 7; i++) {
      const port = ports[i % 2] as number;
      const response = await fetch(`http://127.0.0.1:${port}/v1/datasets`, { headers: { Authorization: `Bearer ${team.key}` } });
      statuses.push(response.status);
      if (response.status === 429 && !limited) limited = response;
      else await response.arrayBuffer();
    }
    expect(statuses.slice(0, 5)).toEqual([200, 200, 200, 200, 200]);
    expect(statuses.slice(5)).toEqual([429, 429]);
    expect(limited).toBeDefined();
    const response = limited as Response;
    expect(Number(response.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(response.headers.get('ratelimit-policy')).toContain('"per-key";q=5;w=60');
    expect(response.headers.get('ratelimit')).toMatch(/"per-key";r=0;t=\d+/);
    const problem = (await response.json()) as { type: string };
    expect(problem.type).toMatch(/rate-limited$/);
  });
});
