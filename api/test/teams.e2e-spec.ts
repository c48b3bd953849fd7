import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { QueryTypes } from 'sequelize';
import { cleanUp, connection, createTeamWithRoles, insertUser, rememberForCleanup, signedInClient, TestTeam, uniqueEmail } from './support/accounts';
import { ConsoleClient } from './support/console-client';
import { MailInbox, tokenFrom } from './support/mail-inbox';
import { createTestApp } from './support/test-app';

async function auditActions(app: NestFastifyApplication, teamId: string): Promise<string[]> {
  const rows = await connection(app).query<{ action: string }>(`SELECT action FROM audit_events WHERE team_id = :teamId ORDER BY id`, {
    replacements: { teamId },
    type: QueryTypes.SELECT,
  });
  return rows.map((row) => row.action);
}

describe('teams, members, invitations and the audit log (real app, PostgreSQL, SMTP fake)', () => {
  let app: NestFastifyApplication;
  let inbox: MailInbox;
  let team: TestTeam;

  beforeAll(async () => {
    inbox = MailInbox.start();
    app = await createTestApp();
    team = await createTeamWithRoles(app, 'flows');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    await inbox.stop();
  });

  describe('GET and POST /v1/teams', () => {
    it('creates a team whose creator is the owner, and lists it with the role', async () => {
      const client = team.outsider.client;
      const created = await client.send('post', '/v1/teams', { name: 'Quillfeather risk desk (invented)' });
      expect(created.status).toBe(201);
      rememberForCleanup('team', created.body.id);
      expect(created.body).toMatchObject({ name: 'Quillfeather risk desk (invented)', plan: 'starter', yourRole: 'owner' });
      expect(created.body.slug).toMatch(/^quillfeather-risk-desk-invented-[0-9a-f]{6}$/);
      const listed = await client.send('get', '/v1/teams');
      expect(listed.body.items).toEqual(expect.arrayContaining([expect.objectContaining({ id: created.body.id, yourRole: 'owner' })]));
      expect(await auditActions(app, created.body.id)).toEqual(['team.created']);
    });

    it('refuses a taken slug with 409 naming the slug, and a malformed one with 400', async () => {
      const taken = await team.outsider.client.send('post', '/v1/teams', { name: 'Copy (invented)', slug: team.slug });
      expect(taken.status).toBe(409);
      expect(taken.body.errors).toEqual([{ pointer: '#/slug', detail: 'is already used by another team' }]);
      const malformed = await team.outsider.client.send('post', '/v1/teams', { name: 'Bad (invented)', slug: 'Not A Slug' });
      expect(malformed.status).toBe(400);
      expect(malformed.body.errors[0].pointer).toBe('#/slug');
    });
  });

  describe('invitations', () => {
    it('invites by e-mail; accepting without an account creates it, signs it in and records the events', async () => {
      const email = uniqueEmail('newcomer');
      const mail = inbox.next(email);
      const invited = await team.members.admin.client.send('post', `/v1/teams/${team.id}/invitations`, { email, role: 'developer' });
      expect(invited.status).toBe(201);
      expect(invited.body).toMatchObject({ email, role: 'developer', status: 'pending' });
      const message = await mail;
      expect(message.template).toBe('invitation');
      expect(message.subject).toContain('flows (invented test team)');
      const token = tokenFrom(message.body);

      const visitor = new ConsoleClient(app);
      const preview = await visitor.send('post', '/v1/invitations/preview', { token });
      expect(preview.status).toBe(200);
      expect(preview.body).toMatchObject({ email, role: 'developer', accountExists: false });

      const incomplete = await visitor.send('post', '/v1/invitations/acceptance', { token });
      expect(incomplete.status).toBe(400);
      expect(incomplete.body.errors.map((error: { pointer: string }) => error.pointer)).toEqual(['#/displayName', '#/password']);

      const accepted = await visitor.send('post', '/v1/invitations/acceptance', {
        token,
        displayName: 'Nia Newcomer (invented)',
        password: 'newcomer-invented-pass',
      });
      expect(accepted.status).toBe(201);
      expect(accepted.body).toMatchObject({ teamId: team.id, role: 'developer', accountCreated: true });
      expect(visitor.sessionCookie).toBeDefined();
      const session = await visitor.send('get', '/v1/session');
      expect(session.body.memberships).toEqual([expect.objectContaining({ teamId: team.id, role: 'developer' })]);

      const reused = await new ConsoleClient(app).send('post', '/v1/invitations/acceptance', { token, displayName: 'X', password: 'another-invented-pass' });
      expect(reused.status).toBe(410);
      expect(reused.body.type).toBe('https://leastline.dev/problems/link-used');
      expect(await auditActions(app, team.id)).toEqual(expect.arrayContaining(['invitation.created', 'invitation.accepted']));
    });

    it('links an existing account only when it is signed in as the invited address', async () => {
      const existing = await insertUser(app, 'existing');
      const mail = inbox.next(existing.email);
      await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: existing.email, role: 'billing' });
      const token = tokenFrom((await mail).body);

      const anonymous = await new ConsoleClient(app).send('post', '/v1/invitations/acceptance', { token, displayName: 'Imposter', password: 'imposter-invented-pass' });
      expect(anonymous.status).toBe(401);
      expect(anonymous.body.type).toBe('https://leastline.dev/problems/sign-in-required');

      const someoneElse = await team.outsider.client.send('post', '/v1/invitations/acceptance', { token });
      expect(someoneElse.status).toBe(403);
      expect(someoneElse.body.type).toBe('https://leastline.dev/problems/invitation-email-mismatch');

      const invitee = await signedInClient(app, existing.email);
      const accepted = await invitee.send('post', '/v1/invitations/acceptance', { token });
      expect(accepted.status).toBe(201);
      expect(accepted.body).toMatchObject({ role: 'billing', accountCreated: false, account: { id: existing.id } });
    });

    it('refuses an expired, a withdrawn, a replaced and an unknown invitation link', async () => {
      const expiredEmail = uniqueEmail('late');
      let mail = inbox.next(expiredEmail);
      await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: expiredEmail, role: 'developer' });
      const expiredToken = tokenFrom((await mail).body);
      await connection(app).query(`UPDATE team_invitations SET expires_at = now() - interval '1 second' WHERE email = :email`, {
        replacements: { email: expiredEmail },
      });
      const expired = await new ConsoleClient(app).send('post', '/v1/invitations/preview', { token: expiredToken });
      expect(expired.status).toBe(410);
      expect(expired.body.type).toBe('https://leastline.dev/problems/link-expired');

      const withdrawnEmail = uniqueEmail('withdrawn');
      mail = inbox.next(withdrawnEmail);
      const created = await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: withdrawnEmail, role: 'developer' });
      const withdrawnToken = tokenFrom((await mail).body);
      expect((await team.members.admin.client.send('delete', `/v1/teams/${team.id}/invitations/${created.body.id}`)).status).toBe(204);
      const withdrawn = await new ConsoleClient(app).send('post', '/v1/invitations/acceptance', { token: withdrawnToken, displayName: 'W', password: 'withdrawn-invented-pass' });
      expect(withdrawn.status).toBe(404);
      expect(withdrawn.body.type).toBe('https://leastline.dev/problems/link-not-found');

      const twiceEmail = uniqueEmail('twice');
      mail = inbox.next(twiceEmail);
      await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: twiceEmail, role: 'developer' });
      const firstToken = tokenFrom((await mail).body);
      mail = inbox.next(twiceEmail);
      await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: twiceEmail, role: 'admin' });
      const secondToken = tokenFrom((await mail).body);
      expect((await new ConsoleClient(app).send('post', '/v1/invitations/preview', { token: firstToken })).status).toBe(404);
      expect((await new ConsoleClient(app).send('post', '/v1/invitations/preview', { token: secondToken })).body.role).toBe('admin');

      const malformed = await new ConsoleClient(app).send('post', '/v1/invitations/preview', { token: 'nope' });
      expect(malformed.status).toBe(400);
      expect(malformed.body.errors[0].pointer).toBe('#/token');
    });

    it('refuses to invite an existing member (409) or to invite as owner (400)', async () => {
      const member = await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: team.members.developer.email, role: 'admin' });
      expect(member.status).toBe(409);
      const owner = await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: uniqueEmail('x'), role: 'owner' });
      expect(owner.status).toBe(400);
      expect(owner.body.errors[0].pointer).toBe('#/role');
    });
  });

  describe('members and ownership', () => {
    it("changes roles, never the owner's, and records from/to in the audit log", async () => {
      const target = await insertUser(app, 'promoted');
      rememberForCleanup('user', target.id);
      await connection(app).query(
        `INSERT INTO team_memberships (id, team_id, user_id, role, created_at, updated_at) VALUES (gen_random_uuid(), :teamId, :userId, 'billing', now(), now())`,
        { replacements: { teamId: team.id, userId: target.id } },
      );
      const changed = await team.members.admin.client.send('patch', `/v1/teams/${team.id}/members/${target.id}`, { role: 'developer' });
      expect(changed.status).toBe(200);
      expect(changed.body).toMatchObject({ userId: target.id, role: 'developer' });
      const audit = await team.members.owner.client.send('get', `/v1/teams/${team.id}/audit-events?action=member.role-changed`);
      expect(audit.body.items[0]).toMatchObject({
        action: 'member.role-changed',
        actor: { userId: team.members.admin.id, email: team.members.admin.email },
        target: { type: 'user', id: target.id },
        details: { from: 'billing', to: 'developer' },
      });
      expect(audit.body.items[0].ipAddress).toBeTruthy();

      const ownerChange = await team.members.admin.client.send('patch', `/v1/teams/${team.id}/members/${team.members.owner.id}`, { role: 'billing' });
      expect(ownerChange.status).toBe(403);
      const ownerRemoval = await team.members.admin.client.send('delete', `/v1/teams/${team.id}/members/${team.members.owner.id}`);
      expect(ownerRemoval.status).toBe(403);
      const stranger = await team.members.admin.client.send('patch', `/v1/teams/${team.id}/members/${team.outsider.id}`, { role: 'billing' });
      expect(stranger.status).toBe(404);
    });

    it('transfers ownership: the heir becomes owner and the previous owner admin', async () => {
      const local = await createTeamWithRoles(app, 'succession');
      const response = await local.members.owner.client.send('post', `/v1/teams/${local.id}/ownership-transfer`, { newOwnerUserId: local.members.developer.id });
      expect(response.status).toBe(204);
      const members = await local.members.developer.client.send('get', `/v1/teams/${local.id}/members`);
      const roles = Object.fromEntries((members.body.items as Array<{ userId: string; role: string }>).map((member) => [member.userId, member.role]));
      expect(roles[local.members.developer.id]).toBe('owner');
      expect(roles[local.members.owner.id]).toBe('admin');
      const outsider = await local.members.developer.client.send('post', `/v1/teams/${local.id}/ownership-transfer`, { newOwnerUserId: team.outsider.id });
      expect(outsider.status).toBe(404);
      expect(await auditActions(app, local.id)).toContain('team.ownership-transferred');
    });

    it('changes the plan (billing role) and records it', async () => {
      const response = await team.members.billing.client.send('put', `/v1/teams/${team.id}/plan`, { plan: 'scale' });
      expect(response.status).toBe(200);
      expect(response.body.plan).toBe('scale');
      const bad = await team.members.billing.client.send('put', `/v1/teams/${team.id}/plan`, { plan: 'platinum' });
      expect(bad.status).toBe(400);
      expect(bad.body.errors[0].pointer).toBe('#/plan');
      expect(await auditActions(app, team.id)).toContain('team.plan-changed');
    });
  });

  describe('GET /v1/teams/{teamId}/audit-events', () => {
    it('pages newest first with a cursor in the body and a Link header, without repeats', async () => {
      const local = await createTeamWithRoles(app, 'auditpages');
      for (let index = 0; index < 5; index++) {
        await local.members.owner.client.send('patch', `/v1/teams/${local.id}`, { name: `Audit page ${index} (invented)` });
      }
      const seen: string[] = [];
      let path: string | undefined = `/v1/teams/${local.id}/audit-events?limit=2`;
      let pages = 0;
      while (path) {
        const response = await local.members.admin.client.send('get', path);
        expect(response.status).toBe(200);
        pages += 1;
        seen.push(...(response.body.items as Array<{ id: string }>).map((item) => item.id));
        if (response.body.nextCursor) {
          expect(response.headers.link).toMatch(/^<http[^>]+cursor=[^>]+>; rel="next"$/);
          const next = new URL(/<([^>]+)>/.exec(response.headers.link as string)?.[1] ?? '');
          expect(next.searchParams.get('cursor')).toBe(response.body.nextCursor);
          path = `${next.pathname}${next.search}`;
        } else {
          expect(response.headers.link).toBeUndefined();
          path = undefined;
        }
      }
      // 4 sign-ins (one per role) + 5 renames = 9 events over 5 pages of 2.
      expect(seen).toHaveLength(9);
      expect(pages).toBe(5);
      expect(new Set(seen).size).toBe(9);
      const numeric = seen.map(Number);
      expect(numeric).toEqual([...numeric].sort((a, b) => b - a));
    });

    it('rejects a forged cursor and a bad limit with field pointers', async () => {
      const forged = await team.members.owner.client.send('get', `/v1/teams/${team.id}/audit-events?cursor=bm90LWEtY3Vyc29y`);
      expect(forged.status).toBe(400);
      expect(forged.body.errors[0].pointer).toBe('#/cursor');
      const limit = await team.members.owner.client.send('get', `/v1/teams/${team.id}/audit-events?limit=1000`);
      expect(limit.status).toBe(400);
      expect(limit.body.errors[0].pointer).toBe('#/limit');
    });

    it("never shows another team's events", async () => {
      const response = await team.members.owner.client.send('get', `/v1/teams/${team.id}/audit-events?limit=100`);
      const rows = await connection(app).query<{ id: string }>(`SELECT id FROM audit_events WHERE team_id <> :teamId`, {
        replacements: { teamId: team.id },
        type: QueryTypes.SELECT,
      });
      const foreign = new Set(rows.map((row) => String(row.id)));
      expect((response.body.items as Array<{ id: string }>).some((item) => foreign.has(item.id))).toBe(false);
      expect(response.body.items.length).toBeGreaterThan(0);
    });
  });
});
