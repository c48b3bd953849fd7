// `npm test`: the same bootstrap as `npm start` with a throwaway database, then every suite. Ends with one
// plain line "N passed, N failed" summed over all suites, and exits non-zero on any failure.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';
import { buildApi, buildConsole, migrate, prepareStack } from './lib/stack.mjs';
import { ensureChromium } from './lib/dependencies.mjs';
import { ARTIFACTS_DIR, npmCommand, ROOT, runAsync, say } from './lib/repo.mjs';

const RESULTS_DIR = join(ARTIFACTS_DIR, 'test-results');

function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** Reads a jest or vitest JSON report (both use numPassedTests / numFailedTests). */
function readReport(file) {
  if (!existsSync(file)) return undefined;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  // A suite that fails to load (syntax error, missing module) has no tests but must still count as failing.
  const brokenSuites = (report.testResults ?? []).filter(
    (suite) => suite.status === 'failed' && (suite.assertionResults ?? []).length === 0,
  ).length;
  return { passed: report.numPassedTests ?? 0, failed: (report.numFailedTests ?? 0) + brokenSuites };
}

/**
 * The SDK's and the console's generated types must come from the committed OpenAPI document: regenerate
 * each into a scratch file and compare. Returns a description of the drift, or undefined.
 */
function checkGeneratedTypes() {
  const generator = join(ROOT, 'node_modules', 'openapi-typescript', 'bin', 'cli.js');
  const targets = [join(ROOT, 'sdk', 'src', 'api-schema.ts'), join(ROOT, 'console', 'src', 'lib', 'api-schema.d.ts')];
  const drift = [];
  for (const target of targets) {
    if (!existsSync(target)) continue;
    const scratch = join(RESULTS_DIR, `check-${target.endsWith('.d.ts') ? 'console' : 'sdk'}.ts`);
    const result = spawnSync(process.execPath, [generator, join(ROOT, 'openapi', 'openapi.json'), '--default-non-nullable', 'false', '-o', scratch], { cwd: ROOT, encoding: 'utf8' });
    if (result.status !== 0 || readFileSync(scratch, 'utf8') !== readFileSync(target, 'utf8')) drift.push(target.slice(ROOT.length + 1));
  }
  if (drift.length > 0) say(`generated types differ from openapi/openapi.json: ${drift.join(', ')} (run npm run generate -w sdk / npm run api-types -w console)`);
  return drift.length > 0 ? drift.join(', ') : undefined;
}

async function main() {
  const started = Date.now();
  rmSync(RESULTS_DIR, { recursive: true, force: true });
  mkdirSync(RESULTS_DIR, { recursive: true });
  const cluster = prepareStack();
  const database = `leastline_test_${process.pid}_${randomBytes(3).toString('hex')}`;
  cluster.ensureDatabase(database);
  const tally = [];
  const record = (name, passed, failed) => {
    tally.push({ name, passed, failed });
    say(`${name}: ${passed} passed, ${failed} failed`);
  };

  try {
    buildApi();
    buildConsole();
    const env = {
      ...process.env,
      NODE_ENV: 'test',
      LEASTLINE_DATABASE_URL: cluster.url(database),
      LEASTLINE_SESSION_SECRET: randomBytes(32).toString('base64url'),
      LEASTLINE_KEY_PEPPER: randomBytes(24).toString('base64url'),
      LEASTLINE_SMTP_URL: `smtp://127.0.0.1:${await freePort()}`,
      LEASTLINE_LOG_LEVEL: 'silent',
      LEASTLINE_CONSOLE_DIST: join(ROOT, 'console', 'dist'),
    };
    migrate(env, { seed: true });

    const drift = await runAsync(process.execPath, [join(ROOT, 'api', 'dist', 'openapi', 'write-openapi.js'), '--check'], { env });
    record('OpenAPI document is up to date', drift === 0 ? 1 : 0, drift === 0 ? 0 : 1);
    const sdkDrift = checkGeneratedTypes();
    record('SDK and console types match the OpenAPI document', sdkDrift ? 0 : 1, sdkDrift ? 1 : 0);

    const jestBin = join(ROOT, 'node_modules', 'jest', 'bin', 'jest.js');
    const suites = [
      { name: 'API unit tests', args: [jestBin, '--config', 'api/jest.unit.config.js'] },
      { name: 'API e2e tests', args: [jestBin, '--config', 'api/jest.e2e.config.js', '--runInBand'] },
      { name: 'SDK unit tests', args: [jestBin, '--config', 'sdk/jest.config.js'] },
    ];
    if (existsSync(join(ROOT, 'test', 'jest.config.js'))) {
      const chromium = ensureChromium();
      if (chromium) env.LEASTLINE_CHROMIUM = chromium;
      suites.push({ name: 'system tests', args: [jestBin, '--config', 'test/jest.config.js', '--runInBand'] });
    }
    for (const suite of suites) {
      const output = join(RESULTS_DIR, `${suite.name.replace(/\W+/g, '-')}.json`);
      const code = await runAsync(process.execPath, [...suite.args, '--json', `--outputFile=${output}`], { env });
      const report = readReport(output);
      if (!report) record(suite.name, 0, 1);
      else record(suite.name, report.passed, report.failed + (code !== 0 && report.failed === 0 ? 1 : 0));
    }

    const consoleOutput = join(RESULTS_DIR, 'console.json');
    const consoleCode = await runAsync(
      npmCommand(),
      ['run', '--silent', 'test', '-w', 'console', '--', '--reporter=default', '--reporter=json', `--outputFile=${consoleOutput}`],
      { env },
    );
    const consoleReport = readReport(consoleOutput);
    if (!consoleReport) record('console component tests', 0, 1);
    else record('console component tests', consoleReport.passed, consoleReport.failed + (consoleCode !== 0 && consoleReport.failed === 0 ? 1 : 0));
  } catch (error) {
    say(`test set-up failed: ${error.message}`);
    record('test set-up', 0, 1);
  } finally {
    cluster.dropDatabase(database);
    if (cluster.startedHere) cluster.stop();
  }

  const passed = tally.reduce((sum, entry) => sum + entry.passed, 0);
  const failed = tally.reduce((sum, entry) => sum + entry.failed, 0);
  say(`finished in ${Math.round((Date.now() - started) / 1000)} s`);
  for (const entry of tally) say(`  ${entry.failed === 0 ? 'ok  ' : 'FAIL'} ${entry.name}: ${entry.passed} passed, ${entry.failed} failed`);
  process.stdout.write(`${passed} passed, ${failed} failed\n`);
  process.exit(failed === 0 && passed > 0 ? 0 : 1);
}

main();
