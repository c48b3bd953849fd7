import { NestFastifyApplication } from '@nestjs/platform-fastify';
import request from 'supertest';
import longley from '../src/regression/engine/__fixtures__/nist-strd/Longley.json';
import { cleanUp, connection } from './support/accounts';
import { bearer, KeyedTeam, logRelativeError, teamWithKey } from './support/public-api';
import { createTestApp } from './support/test-app';

const UPLOAD_LIMIT = 200_000;

/** NIST StRD Longley as a CSV file, the way a customer would export it. */
function longleyCsv(): string {
  const names = ['y', 'x1', 'x2', 'x3', 'x4', 'x5', 'x6'] as const;
  const data = longley.data as unknown as Record<(typeof names)[number], number[]>;
  const lines = [names.join(',')];
  for (let i = 0; i < data.y.length; i++) lines.push(names.map((name) => String(data[name][i])).join(','));
  return `${lines.join('\r\n')}\r\n`;
}

describe('public API: datasets', () => {
  let app: NestFastifyApplication;
  let team: KeyedTeam;
  let otherTeam: KeyedTeam;
  const originalLimit = process.env.LEASTLINE_UPLOAD_LIMIT_BYTES;

  const uploadCsv = (csv: string | Buffer, name = 'settlements', key = team.key) =>
    request(app.getHttpServer())
      .post(`/v1/datasets/csv?name=${name}`)
      .set(bearer(key))
      .attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), { filename: `${name}.csv`, contentType: 'text/csv' });

  beforeAll(async () => {
    process.env.LEASTLINE_UPLOAD_LIMIT_BYTES = String(UPLOAD_LIMIT);
    app = await createTestApp();
    team = await teamWithKey(app, 'datasets');
    otherTeam = await teamWithKey(app, 'datasets-other');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    process.env.LEASTLINE_UPLOAD_LIMIT_BYTES = originalLimit;
  });

  describe('POST /v1/datasets/csv', () => {
    it('stores NIST StRD Longley from a CSV upload, and a fit by dataset id reproduces the certified values (LRE ≥ 9), source: NIST StRD Longley', async () => {
      const upload = await uploadCsv(longleyCsv(), 'nist-longley').expect(201);
      expect(upload.body).toMatchObject({ name: 'nist-longley', version: 1, rowCount: 16, source: 'csv' });
      expect(upload.body.columns.map((column: { kind: string }) => column.kind)).toEqual(Array(7).fill('numeric'));
      const fit = await request(app.getHttpServer())
        .post('/v1/fits')
        .set(bearer(team.key))
        .send({ data: { datasetId: upload.body.id }, model: { response: 'y', predictors: ['x1', 'x2', 'x3', 'x4', 'x5', 'x6'] }, diagnostics: 'none' })
        .expect(201);
      const certified = longley.certified_values;
      certified.coefficients.forEach((coefficient, index) => {
        expect(logRelativeError(fit.body.fit.coefficients[index].estimate, coefficient.estimate)).toBeGreaterThanOrEqual(9);
        expect(logRelativeError(fit.body.fit.coefficients[index].standardError, coefficient.standard_deviation)).toBeGreaterThanOrEqual(9);
      });
      expect(logRelativeError(fit.body.fit.residualStandardError, certified.residual_standard_deviation)).toBeGreaterThanOrEqual(9);
      expect(logRelativeError(fit.body.fit.rSquared, certified.r_squared)).toBeGreaterThanOrEqual(9);
      expect(fit.body.source).toMatchObject({ kind: 'dataset', datasetId: upload.body.id, datasetContentHash: upload.body.contentHash });
    });

    it('accepts the raw text/csv body too, and a byte-order mark', async () => {
      const response = await request(app.getHttpServer())
        .post('/v1/datasets/csv?name=bom-file')
        .set(bearer(team.key))
        .set('Content-Type', 'text/csv')
        .send('\uFEFFticket_size,fee\n10,0.6\n20,0.9\n')
        .expect(201);
      expect(response.body.columns.map((column: { name: string }) => column.name)).toEqual(['ticket_size', 'fee']);
    });

    it('makes a new version for the same name and never overwrites; equal content gives an equal hash', async () => {
      const first = await uploadCsv('a,b\n1,2\n3,4\n', 'versions').expect(201);
      const second = await uploadCsv('a,b\n1,2\n3,4\n', 'versions').expect(201);
      expect([first.body.version, second.body.version]).toEqual([1, 2]);
      expect(second.body.contentHash).toBe(first.body.contentHash);
      const listed = await request(app.getHttpServer()).get('/v1/datasets?name=versions').set(bearer(team.key)).expect(200);
      expect(listed.body.items.map((item: { version: number }) => item.version)).toEqual([2, 1]);
    });

    it.each([
      ['an empty file', '', 'empty-file'],
      ['duplicate headers', 'fee,fee\n1,2\n', 'duplicate-header'],
      ['a semicolon file sent as comma-separated', 'fee;rate\n1;2\n', 'wrong-delimiter'],
      ['a short row', 'fee,rate,desk\n1,2,3\n4\n5,6,7\n', 'malformed-row'],
    ])('refuses %s with a specific problem', async (_label, csv, code) => {
      const response = await uploadCsv(csv, 'bad-file').expect(422);
      expect(response.body.code).toBe(code);
      expect(response.headers['content-type']).toMatch(/problem\+json/);
    });

    it('refuses a file over the upload limit with 413', async () => {
      const big = `a,b\n${'1.2345,6.789\n'.repeat(Math.ceil(UPLOAD_LIMIT / 12) + 10)}`;
      const response = await uploadCsv(big, 'too-big');
      expect(response.status).toBe(413);
      expect(response.body.type).toMatch(/payload-too-large$/);
    });

    it('stores a column with a non-numeric cell as text, and a fit on it names the row', async () => {
      const upload = await uploadCsv('fee,rate\n1,0.5\n2,n/a\n3,0.9\n', 'mixed').expect(201);
      expect(upload.body.columns[1]).toMatchObject({ kind: 'text', firstTextRow: 2, firstTextValue: 'n/a' });
      const fit = await request(app.getHttpServer())
        .post('/v1/fits')
        .set(bearer(team.key))
        .send({ data: { datasetId: upload.body.id }, model: { response: 'fee', predictors: ['rate'] } })
        .expect(422);
      expect(fit.body).toMatchObject({ code: 'non-numeric-value', column: 'rate', row: 1 });
    });
  });

  describe('reading and deleting', () => {
    it('pages rows and summarises columns (mean and sample sd computed by hand below)', async () => {
      const upload = await uploadCsv('amount,desk\n10,north\n20,south\n30,\n40,east\n', 'summaries').expect(201);
      // amount: mean 25, sample sd sqrt(((15²+5²+5²+15²)/3)) = sqrt(500/3).
      expect(upload.body.columns[0]).toMatchObject({ count: 4, missing: 0, mean: 25, min: 10, max: 40 });
      expect(upload.body.columns[0].standardDeviation).toBeCloseTo(Math.sqrt(500 / 3), 12);
      expect(upload.body.columns[1]).toMatchObject({ kind: 'text', count: 3, missing: 1 });
      const page = await request(app.getHttpServer()).get(`/v1/datasets/${upload.body.id}/rows?offset=1&limit=2`).set(bearer(team.key)).expect(200);
      expect(page.body).toMatchObject({ columns: ['amount', 'desk'], offset: 1, total: 4, rows: [[20, 'south'], [30, null]] });
    });

    it('hides another team’s dataset behind 404, for reading and for fitting', async () => {
      const upload = await uploadCsv('x,y\n1,2\n2,4\n3,7\n', 'private').expect(201);
      await request(app.getHttpServer()).get(`/v1/datasets/${upload.body.id}`).set(bearer(otherTeam.key)).expect(404);
      const fit = await request(app.getHttpServer())
        .post('/v1/fits')
        .set(bearer(otherTeam.key))
        .send({ data: { datasetId: upload.body.id }, model: { response: 'y', predictors: ['x'] } })
        .expect(404);
      expect(fit.body.type).toMatch(/not-found$/);
    });

    it('answers an unknown dataset id with 404, for reading and for fitting', async () => {
      const unknown = '7f1c2d3e-4b5a-4c6d-8e9f-0a1b2c3d4e5f';
      await request(app.getHttpServer()).get(`/v1/datasets/${unknown}/rows`).set(bearer(team.key)).expect(404);
      const fit = await request(app.getHttpServer())
        .post('/v1/fits')
        .set(bearer(team.key))
        .send({ data: { datasetId: unknown }, model: { response: 'y', predictors: ['x'] } })
        .expect(404);
      expect(fit.body.errors[0].pointer).toBe('#/data/datasetId');
    });

    it('deletes softly and writes the team audit log', async () => {
      const upload = await uploadCsv('x,y\n1,2\n2,4\n3,7\n', 'to-delete').expect(201);
      await request(app.getHttpServer()).delete(`/v1/datasets/${upload.body.id}`).set(bearer(team.key)).expect(204);
      await request(app.getHttpServer()).get(`/v1/datasets/${upload.body.id}`).set(bearer(team.key)).expect(404);
      const [row] = await connection(app).query(`SELECT deleted_at FROM datasets WHERE id = :id`, {
        replacements: { id: upload.body.id },
        plain: false,
        raw: true,
      });
      expect((row as Array<{ deleted_at: Date | null }>)[0]?.deleted_at).not.toBeNull();
      const audit = await team.owner.client.send('get', `/v1/teams/${team.id}/audit-events`);
      expect(audit.body.items.map((item: { action: string }) => item.action)).toContain('dataset.deleted');
    });

    it('paginates with a cursor and a Link header', async () => {
      for (const name of ['page-a', 'page-b', 'page-c']) await uploadCsv('x\n1\n', name).expect(201);
      const first = await request(app.getHttpServer()).get('/v1/datasets?limit=2').set(bearer(team.key)).expect(200);
      expect(first.body.items).toHaveLength(2);
      expect(first.headers.link).toMatch(/rel="next"/);
      const second = await request(app.getHttpServer())
        .get(`/v1/datasets?limit=2&cursor=${first.body.nextCursor}`)
        .set(bearer(team.key))
        .expect(200);
      const seen = new Set([...first.body.items, ...second.body.items].map((item: { id: string }) => item.id));
      expect(seen.size).toBe(first.body.items.length + second.body.items.length);
    });
  });
});
