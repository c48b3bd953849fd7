import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createServer } from 'node:net';
import request from 'supertest';
import { createTestApp } from './support/test-app';

/** A port with nothing listening: grab a free one and release it. */
async function closedPort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 1));
    });
  });
}

describe('with the database unreachable', () => {
  let app: NestFastifyApplication;
  const originalUrl = process.env.LEASTLINE_DATABASE_URL;

  beforeAll(async () => {
    process.env.LEASTLINE_DATABASE_URL = `postgres://postgres@127.0.0.1:${await closedPort()}/nowhere`;
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
    process.env.LEASTLINE_DATABASE_URL = originalUrl;
  });

  it('keeps serving liveness', async () => {
    await request(app.getHttpServer()).get('/v1/health').expect(200);
  });

  it('reports readiness as 503 problem details', async () => {
    const response = await request(app.getHttpServer()).get('/v1/health/ready').expect(503);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(response.body.type).toBe('https://leastline.dev/problems/service-unavailable');
    expect(response.body.detail).toMatch(/database is not reachable/);
  });
});
