import { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import { cleanUp, createTeamWithRoles, TestTeam } from './support/accounts';
import { bearer } from './support/public-api';
import { createTestApp } from './support/test-app';

const fitBody = {
  data: { columns: { offered_rate: [1.0, 1.5, 2.0, 2.5, 3.0], deposit_balance: [102, 118, 131, 149, 160] } },
  model: { response: 'deposit_balance', predictors: ['offered_rate'] },
  diagnostics: 'none',
};

describe('public API from the console (session + team header) and the usage report', () => {
  let app: NestFastifyApplication;
  let team: TestTeam;
  const teamHeader = () => ({ 'X-Leastline-Team': team.id });

  beforeAll(async () => {
    app = await createTestApp();
    team = await createTeamWithRoles(app, 'console-access');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
  });

  it.each([
    ['owner', 201],
    ['developer', 201],
    ['admin', 403],
    ['billing', 403],
  ] as const)('lets a signed-in %s run a fit as the permission matrix says (%d)', async (role, status) => {
    const response = await team.members[role].client.send('post', '/v1/fits', fitBody, teamHeader());
    expect(response.status).toBe(status);
  });

  it('needs the CSRF token for a console POST', async () => {
    const response = await team.members.owner.client.raw('post', '/v1/fits', fitBody, undefined, teamHeader());
    expect(response.status).toBe(403);
  });

  it('needs the team header, and hides teams the caller is not in', async () => {
    const missing = await team.members.owner.client.send('post', '/v1/fits', fitBody);
    expect(missing.status).toBe(400);
    expect(missing.body.errors[0].pointer).toBe('#/headers/x-leastline-team');
    const foreign = await team.outsider.client.send('post', '/v1/fits', fitBody, teamHeader());
    expect(foreign.status).toBe(404);
  });

  it('reports usage by day and endpoint to roles that may read it, counting each billable call once', async () => {
    const owner = team.members.owner.client;
    await owner.send('post', '/v1/fits', fitBody, teamHeader());
    await owner.send('post', '/v1/fits', fitBody, teamHeader());
    const report = await team.members.billing.client.send('get', '/v1/usage', undefined, teamHeader());
    expect(report.status).toBe(200);
    const fits = report.body.rows.filter((row: { endpoint: string }) => row.endpoint === 'fits');
    const requests = fits.reduce((sum: number, row: { requests: number }) => sum + row.requests, 0);
    // Two fits above plus the owner's and the developer's from the role test: four billable calls.
    expect(requests).toBe(4);
    expect(report.body.totals.units).toBe(8);
    const developer = await team.members.developer.client.send('get', '/v1/usage', undefined, teamHeader());
    expect(developer.status).toBe(403);
  });

  it('gives an overview with requests by day, error rate and recent requests', async () => {
    const rejected = await team.members.owner.client.send(
      'post',
      '/v1/fits',
      { ...fitBody, model: { response: 'deposit_balance', predictors: ['no_such_column'] } },
      teamHeader(),
    );
    expect(rejected.status).toBe(422);
    const overview = await team.members.admin.client.send('get', '/v1/usage/overview', undefined, teamHeader());
    expect(overview.status).toBe(200);
    expect(overview.body.recentRequests.length).toBeGreaterThan(0);
    expect(overview.body.recentRequests[0]).toMatchObject({ route: expect.stringMatching(/^\/v1\//), status: expect.any(Number) });
    expect(overview.body.errorRate).toBeGreaterThan(0);
    expect(overview.body.errorRate).toBeLessThan(1);
  });

  it('rejects a usage range that is not a date', async () => {
    const response = await team.members.owner.client.send('get', '/v1/usage?from=yesterday', undefined, teamHeader());
    expect(response.status).toBe(400);
    expect(response.body.errors[0].pointer).toBe('#/from');
  });

  it('refuses an API call without credentials with 401', async () => {
    const response = await request(app.getHttpServer()).post('/v1/fits').send(fitBody).expect(401);
    expect(response.headers['content-type']).toMatch(/problem\+json/);
    await request(app.getHttpServer()).get('/v1/usage').set(bearer('llsq1_not_a_key')).expect(401);
  });
});
