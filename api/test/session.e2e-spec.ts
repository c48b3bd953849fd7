import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { addMember, cleanUp, connection, insertTeam, insertUser, TEST_PASSWORD, uniqueEmail } from './support/accounts';
import { ConsoleClient } from './support/console-client';
import { MailInbox, tokenFrom } from './support/mail-inbox';
import { createTestApp } from './support/test-app';

describe('console sign-in, session, CSRF and password reset (real app, PostgreSQL, SMTP fake)', () => {
  let app: NestFastifyApplication;
  let inbox: MailInbox;

  beforeAll(async () => {
    inbox = MailInbox.start();
    app = await createTestApp();
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    await inbox.stop();
  });

  describe('GET /v1/session/csrf-token', () => {
    it('sets an httpOnly SameSite=Strict CSRF cookie and returns a token', async () => {
      const response = await request(app.getHttpServer()).get('/v1/session/csrf-token').expect(200);
      expect(typeof response.body.csrfToken).toBe('string');
      const cookie = String(response.headers['set-cookie']);
      expect(cookie).toMatch(/leastline_csrf=/);
      expect(cookie).toMatch(/HttpOnly/i);
      expect(cookie).toMatch(/SameSite=Strict/i);
    });
  });

  describe('POST /v1/session (sign in)', () => {
    it('signs in with the right password and sets an httpOnly SameSite session cookie', async () => {
      const user = await insertUser(app, 'signin');
      const team = await insertTeam(app, 'signin');
      await addMember(app, team.id, user.id, 'developer');
      const client = new ConsoleClient(app);
      const response = await client.signIn(user.email, TEST_PASSWORD);
      expect(response.status).toBe(201);
      expect(response.body.account).toMatchObject({ id: user.id, email: user.email });
      expect(response.body.memberships).toEqual([expect.objectContaining({ teamId: team.id, role: 'developer' })]);
      const cookie = (response.headers['set-cookie'] as unknown as string[]).find((line) => line.startsWith('leastline_session='));
      expect(cookie).toMatch(/HttpOnly/i);
      expect(cookie).toMatch(/SameSite=Strict/i);
      const current = await client.send('get', '/v1/session');
      expect(current.status).toBe(200);
      expect(current.body.account.email).toBe(user.email);

      const [row] = await connection(app).query<{ count: string }>(
        `SELECT count(*) FROM audit_events WHERE team_id = :teamId AND action = 'session.signed-in' AND actor_user_id = :userId AND ip_address IS NOT NULL`,
        { replacements: { teamId: team.id, userId: user.id }, type: QueryTypes.SELECT },
      );
      expect(Number(row?.count)).toBe(1);
      await connection(app).query(`DELETE FROM teams WHERE id = :id`, { replacements: { id: team.id } });
    });

    it('matches the e-mail address case-insensitively', async () => {
      const user = await insertUser(app, 'casing');
      const response = await new ConsoleClient(app).signIn(user.email.toUpperCase(), TEST_PASSWORD);
      expect(response.status).toBe(201);
    });

    it('answers a wrong password and an unknown address with the same 401 problem', async () => {
      const user = await insertUser(app, 'wrongpw');
      const wrong = await new ConsoleClient(app).signIn(user.email, 'not-the-password-at-all');
      const unknown = await new ConsoleClient(app).signIn(uniqueEmail('nobody'), 'not-the-password-at-all');
      for (const response of [wrong, unknown]) {
        expect(response.status).toBe(401);
        expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
        expect(response.body.type).toBe('https://leastline.dev/problems/invalid-credentials');
      }
      expect(unknown.body.detail).toBe(wrong.body.detail);
      expect(unknown.body.title).toBe(wrong.body.title);
    });

    it('rejects a malformed body with field pointers', async () => {
      const response = await new ConsoleClient(app).send('post', '/v1/session', { email: 'not-an-address', password: '', extra: 1 });
      expect(response.status).toBe(400);
      const pointers = (response.body.errors as Array<{ pointer: string }>).map((error) => error.pointer);
      expect(pointers).toEqual(expect.arrayContaining(['#/email', '#/password', '#/extra']));
    });

    it('refuses sign-in without the CSRF header, and with a token from another browser', async () => {
      const user = await insertUser(app, 'csrf');
      const client = new ConsoleClient(app);
      await client.fetchCsrfToken();
      const missing = await client.raw('post', '/v1/session', { email: user.email, password: TEST_PASSWORD });
      expect(missing.status).toBe(403);
      expect(missing.body.type).toBe('https://leastline.dev/problems/csrf-token-invalid');
      expect(missing.body.detail).toMatch(/X-Leastline-Csrf header is missing/);

      const otherBrowser = new ConsoleClient(app);
      const foreignToken = await otherBrowser.fetchCsrfToken();
      const foreign = await client.raw('post', '/v1/session', { email: user.email, password: TEST_PASSWORD }, foreignToken);
      expect(foreign.status).toBe(403);
      expect(foreign.body.detail).toMatch(/does not match/);

      const noCookie = await request(app.getHttpServer()).post('/v1/session').set('X-Leastline-Csrf', foreignToken).send({ email: user.email, password: TEST_PASSWORD });
      expect(noCookie.status).toBe(403);
      expect(noCookie.body.detail).toMatch(/CSRF cookie is missing/);
    });

    it('locks an address after 5 failures (known or unknown alike) with 429 and Retry-After', async () => {
      const user = await insertUser(app, 'lockout');
      const unknownAddress = uniqueEmail('lockout-unknown');
      for (const email of [user.email, unknownAddress]) {
        const client = new ConsoleClient(app);
        for (let attempt = 1; attempt <= 5; attempt++) {
          const response = await client.signIn(email, `wrong-password-${attempt}`);
          expect(response.status).toBe(401);
        }
        const locked = await client.signIn(email, TEST_PASSWORD);
        expect(locked.status).toBe(429);
        expect(locked.body.type).toBe('https://leastline.dev/problems/sign-in-throttled');
        expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
      }
      const keys = [user.email, unknownAddress].map((email) => createHash('sha256').update(email).digest('hex'));
      await connection(app).query(`DELETE FROM sign_in_throttles WHERE email_key IN (:keys)`, { replacements: { keys } });
    });
  });

  describe('GET and DELETE /v1/session', () => {
    it('answers 401 without a cookie and with a forged one', async () => {
      const none = await request(app.getHttpServer()).get('/v1/session');
      expect(none.status).toBe(401);
      expect(none.body.type).toBe('https://leastline.dev/problems/unauthenticated');
      const forged = await request(app.getHttpServer()).get('/v1/session').set('Cookie', 'leastline_session=AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA');
      expect(forged.status).toBe(401);
    });

    it('signs out: the cookie is cleared and the old session value no longer works', async () => {
      const user = await insertUser(app, 'signout');
      const client = new ConsoleClient(app);
      await client.signIn(user.email, TEST_PASSWORD);
      const oldCookie = client.sessionCookie;
      expect(oldCookie).toBeDefined();
      const withoutCsrf = await client.raw('delete', '/v1/session');
      expect(withoutCsrf.status).toBe(403);
      const signedOut = await client.send('delete', '/v1/session');
      expect(signedOut.status).toBe(204);
      expect(client.sessionCookie).toBeUndefined();
      const replay = await request(app.getHttpServer()).get('/v1/session').set('Cookie', `leastline_session=${oldCookie}`);
      expect(replay.status).toBe(401);
    });
  });

  describe('POST /v1/password-resets and /v1/password-resets/completion', () => {
    it('e-mails a one-time link that sets a new password and ends existing sessions', async () => {
      const user = await insertUser(app, 'reset');
      const before = new ConsoleClient(app);
      await before.signIn(user.email, TEST_PASSWORD);

      const mail = inbox.next(user.email);
      const requested = await new ConsoleClient(app).send('post', '/v1/password-resets', { email: user.email });
      expect(requested.status).toBe(202);
      const message = await mail;
      expect(message.subject).toBe('Reset your Leastline password');
      expect(message.template).toBe('password-reset');
      const token = tokenFrom(message.body);

      const newPassword = 'a-brand-new-invented-pass';
      const completed = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', { token, newPassword });
      expect(completed.status).toBe(204);

      expect((await before.send('get', '/v1/session')).status).toBe(401);
      expect((await new ConsoleClient(app).signIn(user.email, TEST_PASSWORD)).status).toBe(401);
      expect((await new ConsoleClient(app).signIn(user.email, newPassword)).status).toBe(201);

      const reused = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', { token, newPassword: 'yet-another-invented-pass' });
      expect(reused.status).toBe(410);
      expect(reused.body.type).toBe('https://leastline.dev/problems/link-used');
    });

    it('answers an unknown address exactly like a known one, and sends nothing', async () => {
      const user = await insertUser(app, 'reset-known');
      const known = await new ConsoleClient(app).send('post', '/v1/password-resets', { email: user.email });
      const unknownAddress = uniqueEmail('reset-unknown');
      const unknown = await new ConsoleClient(app).send('post', '/v1/password-resets', { email: unknownAddress });
      expect(unknown.status).toBe(known.status);
      expect(unknown.body).toEqual(known.body);
      await inbox.next(user.email);
      await expect(inbox.next(unknownAddress, 1_500)).rejects.toThrow(/No message delivered/);
    });

    it('refuses an expired link with 410 and an unknown one with 404', async () => {
      const user = await insertUser(app, 'reset-expired');
      const mail = inbox.next(user.email);
      await new ConsoleClient(app).send('post', '/v1/password-resets', { email: user.email });
      const token = tokenFrom((await mail).body);
      await connection(app).query(`UPDATE password_resets SET expires_at = now() - interval '1 minute' WHERE user_id = :id`, {
        replacements: { id: user.id },
      });
      const expired = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', { token, newPassword: 'another-invented-pass-1' });
      expect(expired.status).toBe(410);
      expect(expired.body.type).toBe('https://leastline.dev/problems/link-expired');

      const unknown = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', {
        token: 'Z'.repeat(43),
        newPassword: 'another-invented-pass-1',
      });
      expect(unknown.status).toBe(404);
      expect(unknown.body.type).toBe('https://leastline.dev/problems/link-not-found');
    });

    it('names the fields of a bad completion request', async () => {
      const response = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', { token: 'short', newPassword: 'short' });
      expect(response.status).toBe(400);
      const pointers = (response.body.errors as Array<{ pointer: string }>).map((error) => error.pointer);
      expect(pointers).toEqual(expect.arrayContaining(['#/token', '#/newPassword']));
      const tooLong = await new ConsoleClient(app).send('post', '/v1/password-resets/completion', {
        token: 'Z'.repeat(43),
        newPassword: 'é'.repeat(40),
      });
      expect(tooLong.status).toBe(400);
      expect(JSON.stringify(tooLong.body.errors)).toMatch(/72 bytes/);
    });
  });
});
