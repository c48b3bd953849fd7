import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { ChildProcess } from 'node:child_process';
import { cleanUp } from './support/accounts';
import { freePort, startServer } from './support/api-process';
import { KeyedTeam, teamWithKey } from './support/public-api';
import { createTestApp } from './support/test-app';

/**
 * Revocation is immediate in every API process, not only the one that handled it: another process that has
 * the key in its cache (30 s lifetime) must refuse it as soon as the revocation commits.
 */
describe('key revocation across API processes', () => {
  let app: NestFastifyApplication;
  let team: KeyedTeam;
  let server: ChildProcess;
  let port = 0;

  beforeAll(async () => {
    app = await createTestApp();
    team = await teamWithKey(app, 'revocation', ['datasets:read']);
    port = await freePort();
    server = await startServer(port);
  });
  afterAll(async () => {
    server.kill('SIGTERM');
    await cleanUp(app);
    await app.close();
  });

  const call = () => fetch(`http://127.0.0.1:${port}/v1/datasets`, { headers: { Authorization: `Bearer ${team.key}` } });

  it('refuses a revoked key in the other process within a second, although that process had it cached', async () => {
    expect((await call()).status).toBe(200); // the other process now holds the key in its cache
    const keys = await team.owner.client.send('get', `/v1/teams/${team.id}/api-keys`);
    const keyId = keys.body[0]?.id ?? keys.body.items?.[0]?.id;
    const revoked = await team.owner.client.send('delete', `/v1/teams/${team.id}/api-keys/${keyId}`);
    expect(revoked.status).toBe(204);
    let status = 0;
    let type = '';
    for (let attempt = 0; attempt < 10; attempt++) {
      const response = await call();
      status = response.status;
      type = ((await response.json()) as { type?: string }).type ?? '';
      if (status === 401) break;
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(status).toBe(401);
    expect(type).toMatch(/api-key-revoked$/);
  });
});
