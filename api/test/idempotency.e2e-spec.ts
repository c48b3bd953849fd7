import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { cleanUp, connection } from './support/accounts';
import { bearer, KeyedTeam, teamWithKey, usageRows } from './support/public-api';
import { createTestApp } from './support/test-app';

const body = {
  data: { columns: { ticket_size: [12, 25, 31, 48, 55, 70], chargeback_rate: [0.004, 0.006, 0.0065, 0.009, 0.0097, 0.012] } },
  model: { response: 'chargeback_rate', predictors: ['ticket_size'] },
  diagnostics: 'none',
};

describe('Idempotency-Key on POST (IETF draft-ietf-httpapi-idempotency-key-header)', () => {
  let app: NestFastifyApplication;
  let team: KeyedTeam;
  const post = (key: string | undefined, payload: object = body) => {
    const call = request(app.getHttpServer()).post('/v1/fits').set(bearer(team.key));
    if (key !== undefined) call.set('Idempotency-Key', key);
    return call.send(payload);
  };

  beforeAll(async () => {
    app = await createTestApp();
    team = await teamWithKey(app, 'idempotency');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
  });

  it('replays the stored answer for a retry with the same key and body, metered once', async () => {
    const key = randomUUID();
    const before = (await usageRows(app, team.id)).length;
    const first = await post(key).expect(201);
    const retry = await post(key).expect(201);
    expect(retry.body.id).toBe(first.body.id);
    expect(retry.body.fit).toEqual(first.body.fit);
    expect(retry.headers['idempotency-replayed']).toBe('true');
    expect((await usageRows(app, team.id)).length).toBe(before + 1);
  });

  it('answers the same key with a different body with 422', async () => {
    const key = randomUUID();
    await post(key).expect(201);
    const response = await post(key, { ...body, confidenceLevel: 0.9 }).expect(422);
    expect(response.body.type).toMatch(/idempotency-key-reused$/);
  });

  it('answers a retry while the first request is still running with 409', async () => {
    const key = randomUUID();
    // The first request is "running": its claim exists without an answer (as while a long fit computes).
    await post(key).expect(201);
    await connection(app).query(
      `UPDATE idempotency_records SET state = 'running', response_status = NULL, response_body = NULL
        WHERE team_id = :teamId AND idempotency_key = :key`,
      { replacements: { teamId: team.id, key } },
    );
    const response = await post(key).expect(409);
    expect(response.body.type).toMatch(/idempotency-request-in-progress$/);
    expect(response.headers['retry-after']).toBeDefined();
  });

  it('replays a stored client error too, without a second usage record', async () => {
    const key = randomUUID();
    const bad = { ...body, model: { response: 'chargeback_rate', predictors: ['missing_column'] } };
    const first = await post(key, bad).expect(422);
    const retry = await post(key, bad).expect(422);
    expect(retry.body).toEqual(first.body);
  });

  it('does nothing special without the header: two calls, two results, two usage records', async () => {
    const before = (await usageRows(app, team.id)).length;
    const one = await post(undefined).expect(201);
    const two = await post(undefined).expect(201);
    expect(one.body.id).not.toBe(two.body.id);
    expect((await usageRows(app, team.id)).length).toBe(before + 2);
  });

  it('rejects a malformed key', async () => {
    const response = await post('bad key with spaces').expect(400);
    expect(response.body.errors[0].pointer).toBe('#/headers/idempotency-key');
  });
});
