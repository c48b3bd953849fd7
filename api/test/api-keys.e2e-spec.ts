import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { getModelToken } from '@nestjs/sequelize';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { ApiKeyUsageRecorder } from '../src/api-keys/api-key-usage-recorder.service';
import { ApiKey } from '../src/api-keys/models/api-key.model';
import { cleanUp, connection, createTeamWithRoles, TestTeam } from './support/accounts';
import { ConsoleClient } from './support/console-client';
import { MailInbox } from './support/mail-inbox';
import { createTestApp } from './support/test-app';

const KEY_SHAPE = /^llsq1_[0-9a-hjkmnp-tv-z]{12}_[0-9a-hjkmnp-tv-z]{40}_[0-9a-hjkmnp-tv-z]{8}$/;

describe('API keys: console management and the public-API guard (real app, PostgreSQL, SMTP fake)', () => {
  let app: NestFastifyApplication;
  let inbox: MailInbox;
  let team: TestTeam;

  const createKey = async (client: ConsoleClient, body: Record<string, unknown> = {}) => {
    const response = await client.send('post', `/v1/teams/${team.id}/api-keys`, { name: 'forecast job (invented)', scopes: ['fits:run', 'usage:read'], ...body });
    if (response.status !== 201) throw new Error(`key creation answered ${response.status}: ${JSON.stringify(response.body)}`);
    return response.body as { apiKey: { id: string; prefix: string }; plaintextKey: string };
  };
  const callWithBearer = (key: string) => request(app.getHttpServer()).get('/v1/api-keys/current').set('Authorization', `Bearer ${key}`);
  const callWithHeader = (key: string) => request(app.getHttpServer()).get('/v1/api-keys/current').set('X-Leastline-Key', key);

  beforeAll(async () => {
    inbox = MailInbox.start();
    app = await createTestApp();
    team = await createTeamWithRoles(app, 'keys');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    await inbox.stop();
  });

  describe('POST /v1/teams/{teamId}/api-keys', () => {
    it('shows the full key once, stores only a hash of its secret, and records the creation', async () => {
      const created = await createKey(team.members.admin.client);
      expect(created.plaintextKey).toMatch(KEY_SHAPE);
      const [, keyId = '', secret = ''] = created.plaintextKey.split('_');
      expect(created.apiKey.prefix).toBe(`llsq1_${keyId}_…`);
      const [row] = await connection(app).query<Record<string, unknown>>(`SELECT * FROM api_keys WHERE id = :id`, {
        replacements: { id: created.apiKey.id },
        type: QueryTypes.SELECT,
      });
      expect(JSON.stringify(row)).not.toContain(secret);
      expect(row?.secret_hash).toMatch(/^[0-9a-f]{64}$/);
      expect(row?.created_by_user_id).toBe(team.members.admin.id);

      const fetched = await team.members.admin.client.send('get', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(JSON.stringify(fetched.body)).not.toContain(secret);
      expect(fetched.body).toMatchObject({ status: 'active', scopes: ['fits:run', 'usage:read'] });

      const [event] = await connection(app).query<{ action: string; actor_user_id: string }>(
        `SELECT action, actor_user_id FROM audit_events WHERE team_id = :teamId AND target_id = :keyId`,
        { replacements: { teamId: team.id, keyId: created.apiKey.id }, type: QueryTypes.SELECT },
      );
      expect(event).toEqual({ action: 'api-key.created', actor_user_id: team.members.admin.id });
    });

    it('names each bad field: unknown scope, empty scopes, past expiry', async () => {
      const client = team.members.owner.client;
      const unknownScope = await client.send('post', `/v1/teams/${team.id}/api-keys`, { name: 'x', scopes: ['fits:run', 'everything'] });
      expect(unknownScope.status).toBe(400);
      expect(unknownScope.body.errors[0]).toMatchObject({ pointer: '#/scopes' });
      expect(unknownScope.body.errors[0].detail).toMatch(/fits:run, datasets:read, datasets:write, usage:read/);
      const empty = await client.send('post', `/v1/teams/${team.id}/api-keys`, { name: 'x', scopes: [] });
      expect(empty.status).toBe(400);
      const past = await client.send('post', `/v1/teams/${team.id}/api-keys`, { name: 'x', scopes: ['fits:run'], expiresAt: '2001-01-01T00:00:00Z' });
      expect(past.status).toBe(400);
      expect(past.body.errors).toEqual([{ pointer: '#/expiresAt', detail: 'must be in the future and at most 3 years ahead' }]);
    });
  });

  describe('developers and their own keys', () => {
    it('refuses developers until admins allow it, then shows them only their own keys', async () => {
      await connection(app).query(`UPDATE teams SET developer_keys_allowed = false WHERE id = :id`, { replacements: { id: team.id } });
      const refused = await team.members.developer.client.send('post', `/v1/teams/${team.id}/api-keys`, { name: 'mine', scopes: ['fits:run'] });
      expect(refused.status).toBe(403);
      expect(refused.body.detail).toMatch(/not allowed developers/);

      const allowed = await team.members.admin.client.send('patch', `/v1/teams/${team.id}`, { developerKeysAllowed: true });
      expect(allowed.body.developerKeysAllowed).toBe(true);
      const own = await createKey(team.members.developer.client, { name: 'dev own key (invented)' });
      const adminKey = await createKey(team.members.admin.client, { name: 'admin key (invented)' });

      const listed = await team.members.developer.client.send('get', `/v1/teams/${team.id}/api-keys`);
      const ids = (listed.body.items as Array<{ id: string; createdByUserId: string }>).map((item) => item.id);
      expect(ids).toContain(own.apiKey.id);
      expect(ids).not.toContain(adminKey.apiKey.id);
      expect((listed.body.items as Array<{ createdByUserId: string }>).every((item) => item.createdByUserId === team.members.developer.id)).toBe(true);

      const othersKey = await team.members.developer.client.send('delete', `/v1/teams/${team.id}/api-keys/${adminKey.apiKey.id}`);
      expect(othersKey.status).toBe(404);
      expect((await callWithBearer(adminKey.plaintextKey)).status).toBe(200);
      const adminSeesAll = await team.members.admin.client.send('get', `/v1/teams/${team.id}/api-keys`);
      expect((adminSeesAll.body.items as Array<{ id: string }>).map((item) => item.id)).toEqual(expect.arrayContaining([own.apiKey.id, adminKey.apiKey.id]));
    });
  });

  describe('the public-API guard (GET /v1/api-keys/current)', () => {
    it('accepts a key as a bearer token and in X-Leastline-Key, yielding team, key, scopes and plan', async () => {
      const created = await createKey(team.members.owner.client);
      for (const response of [await callWithBearer(created.plaintextKey), await callWithHeader(created.plaintextKey)]) {
        expect(response.status).toBe(200);
        expect(response.body).toEqual({ teamId: team.id, keyId: created.apiKey.id, scopes: ['fits:run', 'usage:read'], teamPlan: 'starter' });
      }
    });

    it('answers a missing key, another scheme, a malformed key and a mistyped one with distinct 401 problems', async () => {
      const created = await createKey(team.members.owner.client);
      const none = await request(app.getHttpServer()).get('/v1/api-keys/current');
      expect(none.status).toBe(401);
      expect(none.body.type).toBe('https://leastline.dev/problems/unauthenticated');
      expect(none.body.detail).toMatch(/Authorization: Bearer/);
      const basic = await request(app.getHttpServer()).get('/v1/api-keys/current').set('Authorization', 'Basic dXNlcjpwYXNz');
      expect(basic.status).toBe(401);
      const foreign = await callWithBearer('other-vendor-0000000000000000');
      expect(foreign.status).toBe(401);
      expect(foreign.body.type).toBe('https://leastline.dev/problems/api-key-malformed');

      const lastCharacter = created.plaintextKey.at(-1) === 'a' ? 'b' : 'a';
      const mistyped = `${created.plaintextKey.slice(0, -1)}${lastCharacter}`;
      const findOne = jest.spyOn(app.get<typeof ApiKey>(getModelToken(ApiKey)), 'findOne');
      const typo = await callWithBearer(mistyped);
      expect(typo.status).toBe(401);
      expect(typo.body.type).toBe('https://leastline.dev/problems/api-key-malformed');
      expect(typo.body.detail).toMatch(/checksum/);
      expect(findOne).not.toHaveBeenCalled();
      findOne.mockRestore();
    });

    it('answers a well-formed key that matches no row, or a wrong secret for a real key id, as not valid', async () => {
      const { formatApiKey } = await import('../src/api-keys/key-format');
      const unknown = await callWithBearer(formatApiKey('zzzzzzzzzzzz', '0'.repeat(40)));
      expect(unknown.status).toBe(401);
      expect(unknown.body.type).toBe('https://leastline.dev/problems/api-key-invalid');
      const created = await createKey(team.members.owner.client);
      const keyId = created.plaintextKey.split('_')[1] ?? '';
      const wrongSecret = await callWithBearer(formatApiKey(keyId, '1'.repeat(40)));
      expect(wrongSecret.status).toBe(401);
      expect(wrongSecret.body.type).toBe('https://leastline.dev/problems/api-key-invalid');
    });

    it('answers repeated requests from the cache: one database look-up for many checks', async () => {
      const created = await createKey(team.members.owner.client);
      const findOne = jest.spyOn(app.get<typeof ApiKey>(getModelToken(ApiKey)), 'findOne');
      for (let index = 0; index < 5; index++) expect((await callWithBearer(created.plaintextKey)).status).toBe(200);
      expect(findOne).toHaveBeenCalledTimes(1);
      findOne.mockRestore();
    });

    it('records the last use (time and address) without a write per request', async () => {
      const created = await createKey(team.members.owner.client);
      await callWithBearer(created.plaintextKey);
      const before = await team.members.owner.client.send('get', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(before.body.lastUsedAt).toBeNull();
      await app.get(ApiKeyUsageRecorder).flush();
      const after = await team.members.owner.client.send('get', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(Date.parse(after.body.lastUsedAt)).toBeGreaterThan(Date.now() - 60_000);
      expect(after.body.lastUsedIp).toMatch(/127\.0\.0\.1|::1/);
    });

    it('refuses an expired key', async () => {
      const created = await createKey(team.members.owner.client, { expiresAt: new Date(Date.now() + 3_600_000).toISOString() });
      await connection(app).query(`UPDATE api_keys SET expires_at = now() - interval '1 second' WHERE id = :id`, { replacements: { id: created.apiKey.id } });
      const response = await callWithBearer(created.plaintextKey);
      expect(response.status).toBe(401);
      expect(response.body.type).toBe('https://leastline.dev/problems/api-key-expired');
    });
  });

  describe('revocation and rotation', () => {
    it('revokes immediately, even when the key was cached a moment before', async () => {
      const created = await createKey(team.members.owner.client);
      expect((await callWithBearer(created.plaintextKey)).status).toBe(200);
      const revoked = await team.members.admin.client.send('delete', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(revoked.status).toBe(204);
      const refused = await callWithBearer(created.plaintextKey);
      expect(refused.status).toBe(401);
      expect(refused.body.type).toBe('https://leastline.dev/problems/api-key-revoked');
      const again = await team.members.admin.client.send('delete', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(again.status).toBe(204);
      const events = await connection(app).query(`SELECT 1 FROM audit_events WHERE target_id = :id AND action = 'api-key.revoked'`, {
        replacements: { id: created.apiKey.id },
        type: QueryTypes.SELECT,
      });
      expect(events).toHaveLength(1);
    });

    it('rotates with an overlap: both keys work, the creator is e-mailed, the old key cannot be rotated again', async () => {
      const created = await createKey(team.members.developer.client);
      expect((await callWithBearer(created.plaintextKey)).status).toBe(200);
      const mail = inbox.next(team.members.developer.email);
      const rotated = await team.members.admin.client.send('post', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}/rotation`, { overlapHours: 24 });
      expect(rotated.status).toBe(201);
      expect(rotated.body.plaintextKey).toMatch(KEY_SHAPE);
      expect(rotated.body.plaintextKey).not.toBe(created.plaintextKey);
      expect(rotated.body.apiKey.scopes).toEqual(['fits:run', 'usage:read']);

      expect((await callWithBearer(created.plaintextKey)).status).toBe(200);
      expect((await callWithBearer(rotated.body.plaintextKey)).status).toBe(200);
      const old = await team.members.admin.client.send('get', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}`);
      expect(old.body).toMatchObject({ status: 'retiring', replacedByKeyId: rotated.body.apiKey.id });
      const hoursLeft = (Date.parse(old.body.retiresAt) - Date.now()) / 3_600_000;
      expect(hoursLeft).toBeGreaterThan(23.9);
      expect(hoursLeft).toBeLessThanOrEqual(24);

      const notice = await mail;
      expect(notice.template).toBe('api-key-rotated');
      expect(notice.body).toContain(created.apiKey.prefix);
      expect(notice.body).not.toContain(rotated.body.plaintextKey);

      const twice = await team.members.admin.client.send('post', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}/rotation`, {});
      expect(twice.status).toBe(409);
    });

    it('with no overlap the old key is rotated out at once', async () => {
      const created = await createKey(team.members.owner.client);
      expect((await callWithBearer(created.plaintextKey)).status).toBe(200);
      const rotated = await team.members.owner.client.send('post', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}/rotation`, { overlapHours: 0 });
      expect(rotated.status).toBe(201);
      const old = await callWithBearer(created.plaintextKey);
      expect(old.status).toBe(401);
      expect(old.body.type).toBe('https://leastline.dev/problems/api-key-rotated-out');
      expect((await callWithBearer(rotated.body.plaintextKey)).status).toBe(200);
    });

    it('names a bad overlap', async () => {
      const created = await createKey(team.members.owner.client);
      const response = await team.members.owner.client.send('post', `/v1/teams/${team.id}/api-keys/${created.apiKey.id}/rotation`, { overlapHours: 1000 });
      expect(response.status).toBe(400);
      expect(response.body.errors[0].pointer).toBe('#/overlapHours');
    });
  });

  describe('cross-team access', () => {
    it("cannot read, rotate or revoke another team's key through one's own team", async () => {
      const other = await createTeamWithRoles(app, 'keys-other');
      const foreignKey = await other.members.owner.client.send('post', `/v1/teams/${other.id}/api-keys`, { name: 'foreign (invented)', scopes: ['fits:run'] });
      expect(foreignKey.status).toBe(201);
      const path = `/v1/teams/${team.id}/api-keys/${foreignKey.body.apiKey.id}`;
      expect((await team.members.owner.client.send('get', path)).status).toBe(404);
      expect((await team.members.owner.client.send('post', `${path}/rotation`, {})).status).toBe(404);
      expect((await team.members.owner.client.send('delete', path)).status).toBe(404);
      expect((await callWithBearer(foreignKey.body.plaintextKey)).body.teamId).toBe(other.id);
    });

    it('a key stops working as soon as its team is deleted', async () => {
      const doomed = await createTeamWithRoles(app, 'keys-doomed');
      const created = await doomed.members.owner.client.send('post', `/v1/teams/${doomed.id}/api-keys`, { name: 'doomed (invented)', scopes: ['fits:run'] });
      expect((await callWithBearer(created.body.plaintextKey)).status).toBe(200);
      expect((await doomed.members.owner.client.send('delete', `/v1/teams/${doomed.id}`)).status).toBe(204);
      const after = await callWithBearer(created.body.plaintextKey);
      expect(after.status).toBe(401);
      expect(after.body.type).toBe('https://leastline.dev/problems/api-key-invalid');
    });
  });
});
