import { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { addMember, cleanUp, connection, createTeamWithRoles, insertTeam, insertUser, rememberForCleanup, Role, ROLES, TestTeam, uniqueEmail } from './support/accounts';
import { ConsoleClient } from './support/console-client';
import { MailInbox } from './support/mail-inbox';
import { createTestApp } from './support/test-app';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

interface Prepared {
  path: string;
  body?: unknown;
}

/**
 * Every console route under /v1/teams/{teamId}, with the roles the product rules allow (written out here
 * independently of the matrix in the code, so a wrong entry there makes this fail) and the status an
 * allowed call answers. `prepare` builds a fresh target for each call so calls do not disturb each other.
 */
interface RouteCase {
  name: string;
  method: Method;
  allowed: Role[];
  success: number;
  prepare: (context: { team: TestTeam; role: Role; client: ConsoleClient }) => Promise<Prepared>;
}

describe('team roles: every team route against every role, outsiders and anonymous callers', () => {
  let app: NestFastifyApplication;
  let inbox: MailInbox;
  let team: TestTeam;

  const disposableMember = async (teamId: string, role: Role = 'developer') => {
    const user = await insertUser(app, `target-${role}`);
    rememberForCleanup('user', user.id);
    await addMember(app, teamId, user.id, role);
    return user;
  };

  const createKeyAs = async (client: ConsoleClient, teamId: string) => {
    const response = await client.send('post', `/v1/teams/${teamId}/api-keys`, { name: 'matrix key (invented)', scopes: ['fits:run'] });
    if (response.status !== 201) throw new Error(`key creation answered ${response.status}: ${JSON.stringify(response.body)}`);
    return response.body.apiKey.id as string;
  };

  /** Owner-created key for roles that may not create one: they are refused before the key matters. */
  const keyFor = async ({ team: current, role, client }: { team: TestTeam; role: Role; client: ConsoleClient }) =>
    ['owner', 'admin', 'developer'].includes(role) ? createKeyAs(client, current.id) : createKeyAs(current.members.owner.client, current.id);

  const ROUTES: RouteCase[] = [
    { name: 'GET /v1/teams/{teamId}', method: 'get', allowed: ['owner', 'admin', 'developer', 'billing'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}` }) },
    {
      name: 'PATCH /v1/teams/{teamId}',
      method: 'patch',
      allowed: ['owner', 'admin'],
      success: 200,
      prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}`, body: { name: 'Renamed (invented test team)' } }),
    },
    {
      name: 'DELETE /v1/teams/{teamId}',
      method: 'delete',
      allowed: ['owner'],
      success: 204,
      prepare: async ({ team: t, role }) => {
        if (role !== 'owner') return { path: `/v1/teams/${t.id}` };
        const disposable = await insertTeam(app, 'doomed');
        rememberForCleanup('team', disposable.id);
        await addMember(app, disposable.id, t.members.owner.id, 'owner');
        return { path: `/v1/teams/${disposable.id}` };
      },
    },
    {
      name: 'POST /v1/teams/{teamId}/ownership-transfer',
      method: 'post',
      allowed: ['owner'],
      success: 204,
      prepare: async ({ team: t, role }) => {
        if (role !== 'owner') return { path: `/v1/teams/${t.id}/ownership-transfer`, body: { newOwnerUserId: t.members.admin.id } };
        const disposable = await insertTeam(app, 'handover');
        rememberForCleanup('team', disposable.id);
        await addMember(app, disposable.id, t.members.owner.id, 'owner');
        const heir = await disposableMember(disposable.id, 'admin');
        return { path: `/v1/teams/${disposable.id}/ownership-transfer`, body: { newOwnerUserId: heir.id } };
      },
    },
    { name: 'PUT /v1/teams/{teamId}/plan', method: 'put', allowed: ['owner', 'billing'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/plan`, body: { plan: 'growth' } }) },
    { name: 'GET /v1/teams/{teamId}/members', method: 'get', allowed: ['owner', 'admin', 'developer', 'billing'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/members` }) },
    {
      name: 'PATCH /v1/teams/{teamId}/members/{userId}',
      method: 'patch',
      allowed: ['owner', 'admin'],
      success: 200,
      prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/members/${(await disposableMember(t.id)).id}`, body: { role: 'billing' } }),
    },
    {
      name: 'DELETE /v1/teams/{teamId}/members/{userId}',
      method: 'delete',
      allowed: ['owner', 'admin'],
      success: 204,
      prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/members/${(await disposableMember(t.id)).id}` }),
    },
    { name: 'GET /v1/teams/{teamId}/invitations', method: 'get', allowed: ['owner', 'admin'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/invitations` }) },
    {
      name: 'POST /v1/teams/{teamId}/invitations',
      method: 'post',
      allowed: ['owner', 'admin'],
      success: 201,
      prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/invitations`, body: { email: uniqueEmail('invitee'), role: 'developer' } }),
    },
    {
      name: 'DELETE /v1/teams/{teamId}/invitations/{invitationId}',
      method: 'delete',
      allowed: ['owner', 'admin'],
      success: 204,
      prepare: async ({ team: t }) => {
        const created = await t.members.owner.client.send('post', `/v1/teams/${t.id}/invitations`, { email: uniqueEmail('withdrawn'), role: 'billing' });
        return { path: `/v1/teams/${t.id}/invitations/${created.body.id}` };
      },
    },
    { name: 'GET /v1/teams/{teamId}/api-keys', method: 'get', allowed: ['owner', 'admin', 'developer'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/api-keys` }) },
    {
      name: 'POST /v1/teams/{teamId}/api-keys',
      method: 'post',
      allowed: ['owner', 'admin', 'developer'],
      success: 201,
      prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/api-keys`, body: { name: 'matrix key (invented)', scopes: ['usage:read'] } }),
    },
    { name: 'GET /v1/teams/{teamId}/api-keys/{keyId}', method: 'get', allowed: ['owner', 'admin', 'developer'], success: 200, prepare: async (context) => ({ path: `/v1/teams/${context.team.id}/api-keys/${await keyFor(context)}` }) },
    {
      name: 'POST /v1/teams/{teamId}/api-keys/{keyId}/rotation',
      method: 'post',
      allowed: ['owner', 'admin', 'developer'],
      success: 201,
      prepare: async (context) => ({ path: `/v1/teams/${context.team.id}/api-keys/${await keyFor(context)}/rotation`, body: { overlapHours: 1 } }),
    },
    {
      name: 'DELETE /v1/teams/{teamId}/api-keys/{keyId}',
      method: 'delete',
      allowed: ['owner', 'admin', 'developer'],
      success: 204,
      prepare: async (context) => ({ path: `/v1/teams/${context.team.id}/api-keys/${await keyFor(context)}` }),
    },
    { name: 'GET /v1/teams/{teamId}/audit-events', method: 'get', allowed: ['owner', 'admin'], success: 200, prepare: async ({ team: t }) => ({ path: `/v1/teams/${t.id}/audit-events` }) },
  ];

  beforeAll(async () => {
    inbox = MailInbox.start();
    app = await createTestApp();
    team = await createTeamWithRoles(app, 'matrix');
    // The matrix checks roles; the developer-keys switch has its own tests in api-keys.e2e-spec.ts.
    await connection(app).query(`UPDATE teams SET developer_keys_allowed = true WHERE id = :id`, { replacements: { id: team.id } });
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    await inbox.stop();
  });

  for (const route of ROUTES) {
    describe(route.name, () => {
      for (const role of ROLES) {
        const allowed = route.allowed.includes(role);
        it(`${role}: ${allowed ? `allowed (${route.success})` : 'refused with 403'}`, async () => {
          const client = team.members[role].client;
          const prepared = await route.prepare({ team, role, client });
          const response = await client.send(route.method, prepared.path, prepared.body);
          if (allowed) {
            expect({ status: response.status, body: response.status === route.success ? undefined : response.body }).toEqual({
              status: route.success,
              body: undefined,
            });
          } else {
            expect(response.status).toBe(403);
            expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
            expect(response.body.type).toBe('https://leastline.dev/problems/forbidden');
            expect(response.body.yourRole).toBe(role);
          }
        });
      }

      it('a signed-in member of another team gets 404, as if the team did not exist', async () => {
        const prepared = await route.prepare({ team, role: 'billing', client: team.members.billing.client });
        const response = await team.outsider.client.send(route.method, prepared.path, prepared.body);
        expect(response.status).toBe(404);
        expect(response.body.type).toBe('https://leastline.dev/problems/not-found');
        expect(JSON.stringify(response.body)).not.toContain('invented test team');
      });

      it('an anonymous caller gets 401', async () => {
        const prepared = await route.prepare({ team, role: 'billing', client: team.members.billing.client });
        const response = await request(app.getHttpServer())[route.method](prepared.path).send(prepared.body as object);
        expect(response.status).toBe(401);
        expect(response.body.type).toBe('https://leastline.dev/problems/unauthenticated');
      });

      if (route.method !== 'get') {
        it('a signed-in owner without the CSRF header gets 403 and nothing changes', async () => {
          const prepared = await route.prepare({ team, role: 'billing', client: team.members.billing.client });
          const response = await team.members.owner.client.raw(route.method, prepared.path, prepared.body);
          expect(response.status).toBe(403);
          expect(response.body.type).toBe('https://leastline.dev/problems/csrf-token-invalid');
        });
      }
    });
  }

  it('covers every team-scoped operation of the OpenAPI document', async () => {
    const document = await request(app.getHttpServer()).get('/v1/openapi.json');
    const documented = Object.entries(document.body.paths as Record<string, Record<string, unknown>>)
      .filter(([path]) => path.startsWith('/v1/teams/{teamId}'))
      .flatMap(([path, operations]) => Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`));
    expect(documented.sort()).toEqual(ROUTES.map((route) => route.name).sort());
  });

  describe('team ids', () => {
    it('answers a malformed team id with 400 naming teamId, and an unknown one with 404', async () => {
      const malformed = await team.members.owner.client.send('get', '/v1/teams/not-a-uuid');
      expect(malformed.status).toBe(400);
      expect(malformed.body.errors).toEqual([{ pointer: '#/path/teamId', detail: 'must be a UUID' }]);
      const unknown = await team.members.owner.client.send('get', '/v1/teams/00000000-0000-4000-8000-000000000000');
      expect(unknown.status).toBe(404);
    });
  });
});
