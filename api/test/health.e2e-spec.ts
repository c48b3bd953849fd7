import { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { createTestApp } from './support/test-app';

describe('health and the common HTTP surface (real app, real PostgreSQL)', () => {
  let app: NestFastifyApplication;

  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  describe('GET /v1/health', () => {
    it('answers liveness with a request id header', async () => {
      const response = await request(app.getHttpServer()).get('/v1/health').expect(200);
      expect(response.body).toMatchObject({ status: 'ok' });
      expect(response.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    });

    it('echoes a well-formed incoming request id and replaces a malformed one', async () => {
      const kept = await request(app.getHttpServer()).get('/v1/health').set('X-Request-Id', 'trace-0001-abcd');
      expect(kept.headers['x-request-id']).toBe('trace-0001-abcd');
      const replaced = await request(app.getHttpServer()).get('/v1/health').set('X-Request-Id', 'bad id with spaces');
      expect(replaced.headers['x-request-id']).not.toBe('bad id with spaces');
    });

    it('sends security headers', async () => {
      const response = await request(app.getHttpServer()).get('/v1/health');
      expect(response.headers['x-content-type-options']).toBe('nosniff');
      expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    });
  });

  describe('GET /v1/health/ready', () => {
    it('reports the database as reachable', async () => {
      const response = await request(app.getHttpServer()).get('/v1/health/ready').expect(200);
      expect(response.body.status).toBe('ready');
      expect(typeof response.body.databaseMilliseconds).toBe('number');
    });
  });

  describe('problem details for failures', () => {
    it('answers an unknown API path with a 404 problem carrying the request id', async () => {
      const response = await request(app.getHttpServer()).get('/v1/no-such-thing').expect(404);
      expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
      expect(response.body).toMatchObject({
        type: 'https://leastline.dev/problems/not-found',
        status: 404,
        requestId: response.headers['x-request-id'],
      });
    });

    it('answers malformed JSON with a 400 problem, not a 500', async () => {
      const response = await request(app.getHttpServer())
        .post('/v1/health')
        .set('Content-Type', 'application/json')
        .send('{"broken": ');
      expect(response.status).toBeGreaterThanOrEqual(400);
      expect(response.status).toBeLessThan(500);
      expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    });

    it('answers a body over the limit with 413', async () => {
      const response = await request(app.getHttpServer())
        .post('/v1/health')
        .set('Content-Type', 'application/json')
        .send(JSON.stringify({ padding: 'x'.repeat(2 * 1024 * 1024) }));
      expect(response.status).toBe(413);
      expect(response.body.type).toBe('https://leastline.dev/problems/payload-too-large');
    });
  });

  describe('GET /v1/openapi.json', () => {
    it('serves the OpenAPI document with the health paths', async () => {
      const response = await request(app.getHttpServer()).get('/v1/openapi.json').expect(200);
      expect(response.body.openapi).toMatch(/^3\./);
      expect(Object.keys(response.body.paths)).toEqual(expect.arrayContaining(['/v1/health', '/v1/health/ready']));
    });
  });
});
