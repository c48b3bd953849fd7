import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { tableFromArrays, tableToIPC } from 'apache-arrow';
import request from 'supertest';
import norris from '../src/regression/engine/__fixtures__/nist-strd/Norris.json';
import filip from '../src/regression/engine/__fixtures__/nist-strd/Filip.json';
import epochMilliseconds from '../src/regression/engine/__fixtures__/exact/epoch-milliseconds.json';
import { cleanUp } from './support/accounts';
import { bearer, KeyedTeam, logRelativeError, teamWithKey, usageRows } from './support/public-api';
import { createTestApp } from './support/test-app';

interface Certified {
  coefficients: { estimate: number; standard_deviation: number }[];
  residual_standard_deviation: number;
  r_squared: number;
}

describe('public API: fits, comparisons, predictions, batch and rolling fits', () => {
  let app: NestFastifyApplication;
  let team: KeyedTeam;
  const post = (path: string, body: unknown, key = team.key) => request(app.getHttpServer()).post(path).set(bearer(key)).send(body as object);

  beforeAll(async () => {
    app = await createTestApp();
    team = await teamWithKey(app, 'regression');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
  });

  describe('POST /v1/fits', () => {
    it('reproduces the NIST StRD Norris certified values to at least 9 digits (LRE), source: NIST StRD Norris', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: norris.data.x, y: norris.data.y } },
        model: { response: 'y', predictors: ['x'] },
      }).expect(201);
      const certified = norris.certified_values as Certified;
      const fit = response.body.fit;
      certified.coefficients.forEach((coefficient, index) => {
        expect(logRelativeError(fit.coefficients[index].estimate, coefficient.estimate)).toBeGreaterThanOrEqual(9);
        expect(logRelativeError(fit.coefficients[index].standardError, coefficient.standard_deviation)).toBeGreaterThanOrEqual(9);
      });
      expect(logRelativeError(fit.residualStandardError, certified.residual_standard_deviation)).toBeGreaterThanOrEqual(9);
      expect(logRelativeError(fit.rSquared, certified.r_squared)).toBeGreaterThanOrEqual(9);
      expect(response.body).toMatchObject({ kind: 'fit', engineVersion: expect.any(String), inputHash: expect.stringMatching(/^[0-9a-f]{64}$/) });
      expect(response.body.caution).toMatch(/not financial advice/i);
      expect(response.body.diagnostics).toHaveProperty('jarqueBera');
    });

    it('returns the same numbers for an Arrow IPC body as for JSON, with the same input hash', async () => {
      const spec = { model: { response: 'y', predictors: ['x'] } };
      const json = await post('/v1/fits', { ...spec, data: { columns: { x: norris.data.x, y: norris.data.y } } }).expect(201);
      const table = tableFromArrays({ x: Float64Array.from(norris.data.x), y: Float64Array.from(norris.data.y) });
      table.schema.metadata.set('leastline.request', JSON.stringify(spec));
      const arrow = await request(app.getHttpServer())
        .post('/v1/fits')
        .set(bearer(team.key))
        .set('Content-Type', 'application/vnd.apache.arrow.stream')
        .send(Buffer.from(tableToIPC(table, 'stream')))
        .expect(201);
      expect(arrow.body.fit.coefficients).toEqual(json.body.fit.coefficients);
      expect(arrow.body.inputHash).toBe(json.body.inputHash);
    });

    it('stores the result: GET /v1/results/{id} returns it, and predictions can use its id', async () => {
      const fit = await post('/v1/fits', {
        data: { columns: { ticket: [10, 20, 30, 40, 50, 60], fee: [0.61, 0.9, 1.22, 1.49, 1.83, 2.1] } },
        model: { response: 'fee', predictors: ['ticket'] },
      }).expect(201);
      const again = await request(app.getHttpServer()).get(`/v1/results/${fit.body.id}`).set(bearer(team.key)).expect(200);
      expect(again.body.fit.coefficients).toEqual(fit.body.fit.coefficients);
      expect(again.body.inputHash).toBe(fit.body.inputHash);
      const prediction = await post('/v1/predictions', { fitId: fit.body.id, points: [[35]] }).expect(201);
      const [b0, b1] = fit.body.fit.coefficients.map((row: { estimate: number }) => row.estimate);
      expect(prediction.body.prediction.predictions[0].modelScale.estimate).toBeCloseTo(b0 + b1 * 35, 10);
    });

    it('HC3 standard errors and prediction standard errors on epoch-millisecond timestamps match the exact rational reference to 1e-10 (source: generate-exact-references.mjs)', async () => {
      const fixture = epochMilliseconds;
      const relative = (value: number, reference: string) => Math.abs(value - Number(reference)) / Math.abs(Number(reference));
      const response = await post('/v1/fits', {
        data: { columns: fixture.columns },
        model: { response: fixture.response, predictors: fixture.predictors },
        covariance: { type: 'hc3' },
        diagnostics: ['breusch-pagan', 'reset'],
      }).expect(201);
      expect(response.body.inference.covariance.type).toBe('hc3');
      response.body.inference.coefficients.forEach((row: { standardError: number }, j: number) => {
        expect(relative(row.standardError, fixture.reference.standardErrors.hc3[j]!)).toBeLessThanOrEqual(1e-10);
      });
      response.body.fit.coefficients.forEach((row: { standardError: number }, j: number) => {
        expect(relative(row.standardError, fixture.reference.classicalStandardErrors[j]!)).toBeLessThanOrEqual(1e-10);
      });
      expect(Object.keys(response.body.diagnostics).sort()).toEqual(['breuschPagan', 'reset']);
      expect(relative(response.body.diagnostics.reset.statistic, fixture.reference.checks.reset.statistic)).toBeLessThanOrEqual(1e-10);
      expect(relative(response.body.diagnostics.breuschPagan.statistic, fixture.reference.checks.breuschPaganStudentised.statistic)).toBeLessThanOrEqual(1e-10);
      // The stored fit keeps its working coordinates: a later prediction by id is as exact as the fit.
      const prediction = await post('/v1/predictions', { fitId: response.body.id, points: fixture.points }).expect(201);
      prediction.body.prediction.predictions.forEach((entry: { modelScale: { estimate: number; standardErrorOfMean: number } }, k: number) => {
        const expected = fixture.reference.predictions.hc3[k]!;
        expect(relative(entry.modelScale.estimate, expected.estimate)).toBeLessThanOrEqual(1e-10);
        expect(relative(entry.modelScale.standardErrorOfMean, expected.standardErrorOfMean)).toBeLessThanOrEqual(1e-10);
      });
    });

    it('fits the NIST StRD Filip degree-10 polynomial from power terms to LRE >= 9 on every coefficient and standard error (source: NIST StRD Filip)', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: filip.data.x, y: filip.data.y } },
        model: { response: 'y', predictors: Array.from({ length: 10 }, (_, k) => ({ column: 'x', power: k + 1 })) },
        diagnostics: 'none',
      }).expect(201);
      const rows = response.body.fit.coefficients as { term: string; estimate: number; standardError: number }[];
      expect(rows.map((row) => row.term)).toEqual(['(intercept)', 'x', ...Array.from({ length: 9 }, (_, k) => `x^${k + 2}`)]);
      filip.certified_values.coefficients.forEach((certified: { estimate: number; standard_deviation: number }, j: number) => {
        expect(logRelativeError(rows[j]!.estimate, certified.estimate)).toBeGreaterThanOrEqual(9);
        expect(logRelativeError(rows[j]!.standardError, certified.standard_deviation)).toBeGreaterThanOrEqual(9);
      });
      const prediction = await post('/v1/predictions', { fitId: response.body.id, points: [[-5]] }).expect(201);
      const expected = rows.reduce((sum, row, j) => sum + row.estimate * Math.pow(-5, j), 0);
      expect(Math.abs(prediction.body.prediction.predictions[0].modelScale.estimate - expected)).toBeLessThanOrEqual(1e-9 * Math.abs(expected));
    });

    it('refuses a malformed power term, naming the entry', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: [1, 2, 3, 4, 5], y: [1, 4, 9, 16, 26] } },
        model: { response: 'y', predictors: ['x', { column: 'x', power: 0 }] },
      }).expect(400);
      expect(response.body.errors).toEqual([expect.objectContaining({ pointer: '#/model/predictors/1', detail: expect.stringMatching(/"power" must be an integer from 1 to 20/) })]);
      const logForm = await post('/v1/fits', {
        data: { columns: { x: [1, 2, 3, 4, 5, 6], y: [1, 4, 9, 16, 26, 35] } },
        model: { response: 'y', predictors: ['x', { column: 'x', power: 2 }], form: 'log-log' },
      }).expect(422);
      expect(logForm.body.errors[0].pointer).toMatch(/^#\/model\/predictors\/1/);
    });

    it('drops rows listwise when asked and lists them (0-based)', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: [1, 2, null, 4, 5, 6], y: [2.1, 3.9, 6.2, null, 10.1, 11.8] } },
        model: { response: 'y', predictors: ['x'] },
        missingValues: 'drop-rows',
      }).expect(201);
      expect(response.body.rows).toMatchObject({ total: 6, used: 4, droppedCount: 2, dropped: [2, 3] });
    });
  });

  describe('bad input', () => {
    it('rejects wrong types with a JSON Pointer per field', async () => {
      const response = await post('/v1/fits', { data: { columns: { x: [1, 2, 3] } }, model: { response: 7, predictors: 'x' } }).expect(400);
      const pointers = response.body.errors.map((error: { pointer: string }) => error.pointer);
      expect(pointers).toEqual(expect.arrayContaining(['#/model/response', '#/model/predictors']));
      expect(response.headers['content-type']).toMatch(/problem\+json/);
    });

    it('rejects unknown fields instead of ignoring them', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: [1, 2, 3], y: [1, 2, 4] } },
        model: { response: 'y', predictors: ['x'] },
        formula: 'y ~ x',
      }).expect(400);
      expect(response.body.errors[0].pointer).toBe('#/formula');
    });

    it('names a missing column', async () => {
      const response = await post('/v1/fits', { data: { columns: { x: [1, 2, 3], y: [1, 2, 4] } }, model: { response: 'y', predictors: ['z'] } }).expect(422);
      expect(response.body).toMatchObject({ code: 'unknown-column' });
      expect(response.body.errors[0].pointer).toBe('#/model/predictors/0');
    });

    it('rejects missing values by default, listing the rows', async () => {
      const response = await post('/v1/fits', { data: { columns: { x: [1, 2, 3, 4], y: [1, null, 4, 5] } }, model: { response: 'y', predictors: ['x'] } }).expect(422);
      expect(response.body).toMatchObject({ code: 'missing-values', rows: [1] });
    });

    it('names the column and row of a non-positive value under a log form', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { rate: [0.5, 1.2, 0, 2.5, 3.1], balance: [10, 14, 15, 21, 26] } },
        model: { response: 'balance', predictors: ['rate'], form: 'log-log' },
      }).expect(422);
      expect(response.body).toMatchObject({ code: 'non-positive-log-argument', column: 'rate', row: 2 });
    });

    it('names collinear predictors', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { fee_count: [1, 2, 3, 4, 5], fee_total: [2, 4, 6, 8, 10], y: [1.1, 2.3, 2.9, 4.2, 5.1] } },
        model: { response: 'y', predictors: ['fee_count', 'fee_total'] },
      }).expect(422);
      expect(response.body.code).toBe('collinear-columns');
      expect(response.body.detail).toMatch(/fee_total|fee_count/);
    });

    it('rejects a confidence level outside (0, 1)', async () => {
      const response = await post('/v1/fits', {
        data: { columns: { x: [1, 2, 3], y: [1, 2, 4] } },
        model: { response: 'y', predictors: ['x'] },
        confidenceLevel: 1,
      }).expect(400);
      expect(response.body.errors[0].pointer).toBe('#/confidenceLevel');
    });

    it('answers an unknown stored result with 404', async () => {
      await request(app.getHttpServer()).get('/v1/results/00000000-0000-4000-8000-000000000000').set(bearer(team.key)).expect(404);
    });

    it('answers a mistyped key with 401 problem details', async () => {
      const broken = `${team.key.slice(0, -1)}${team.key.endsWith('a') ? 'b' : 'a'}`;
      const response = await post('/v1/fits', {}, broken).expect(401);
      expect(response.headers['content-type']).toMatch(/problem\+json/);
    });
  });

  describe('POST /v1/form-comparisons', () => {
    it('ranks all four forms on positive data', async () => {
      const rate = [0.5, 0.75, 1, 1.25, 1.5, 1.75, 2, 2.25, 2.5, 2.75];
      const balance = rate.map((r, i) => 100 * r ** 0.8 * (1 + 0.01 * ((i % 3) - 1)));
      const response = await post('/v1/form-comparisons', {
        data: { columns: { rate, balance } },
        model: { response: 'balance', predictors: ['rate'] },
      }).expect(201);
      expect(response.body.comparison.criteria).toHaveLength(4);
      expect(response.body.comparison.criteria[0].form).toBe('log-log');
    });
  });

  describe('POST /v1/batch-fits and /v1/rolling-fits', () => {
    it('gives each response of a batch the same coefficients as its own fit', async () => {
      const benchmark = [0.01, -0.02, 0.015, 0.03, -0.01, 0.005, 0.02, -0.025];
      const fundA = benchmark.map((r, i) => 0.001 + 1.2 * r + 0.002 * Math.sin(i));
      const fundB = benchmark.map((r, i) => -0.002 + 0.7 * r + 0.003 * Math.cos(i));
      const batch = await post('/v1/batch-fits', {
        data: { columns: { benchmark, fund_a: fundA, fund_b: fundB } },
        responses: ['fund_a', 'fund_b'],
        predictors: ['benchmark'],
      }).expect(201);
      const single = await post('/v1/fits', {
        data: { columns: { benchmark, fund_b: fundB } },
        model: { response: 'fund_b', predictors: ['benchmark'] },
        diagnostics: 'none',
      }).expect(201);
      const fromBatch = batch.body.batch.fits[1].coefficients[1];
      expect(fromBatch.estimate).toBeCloseTo(single.body.fit.coefficients[1].estimate, 12);
      expect(fromBatch.standardError).toBeCloseTo(single.body.fit.coefficients[1].standardError, 12);
    });

    it('returns one coefficient path entry per window and refuses a window longer than the series', async () => {
      const x = Array.from({ length: 30 }, (_, i) => i + 1);
      const y = x.map((v, i) => 2 + 0.5 * v + 0.1 * Math.sin(i));
      const rolling = await post('/v1/rolling-fits', { data: { columns: { x, y } }, model: { response: 'y', predictors: ['x'] }, window: 10, step: 5 }).expect(201);
      expect(rolling.body.rolling.windowCount).toBe(5);
      const tooLong = await post('/v1/rolling-fits', { data: { columns: { x, y } }, model: { response: 'y', predictors: ['x'] }, window: 31 }).expect(422);
      expect(tooLong.body.errors[0].pointer).toBe('#/window');
    });
  });

  describe('metering', () => {
    it('writes exactly one usage record per billable call, none for rejected ones', async () => {
      const before = (await usageRows(app, team.id)).length;
      const ok = await post('/v1/fits', { data: { columns: { x: [1, 2, 3, 4], y: [2, 4.1, 5.9, 8.2] } }, model: { response: 'y', predictors: ['x'] } }).expect(201);
      await post('/v1/fits', { data: { columns: { x: [1, 2, 3, 4] } }, model: { response: 'y', predictors: ['x'] } }).expect(422);
      const rows = await usageRows(app, team.id);
      expect(rows).toHaveLength(before + 1);
      expect(rows[rows.length - 1]).toMatchObject({ endpoint: 'fits', result_id: ok.body.id, request_id: ok.headers['x-request-id'] });
      expect(ok.body.usage.units).toBe(2);
    });
  });
});
