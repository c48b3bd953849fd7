// Regression engine benchmark, measured side by side in one run:
//  1. the engine's full-inference straight-line fit (fitModel: coefficients, standard errors, t, p,
//     intervals, ANOVA, R², information criteria) against a bare single pass that only sums the same two
//     Float64Arrays, for n = 1e5, 1e6 and 1e7 (target: at most 2x);
//  2. a 20-predictor fit for n = 1e5 and 1e6 against ml-matrix's own QR solve of the same system.
// Accuracy is printed beside the timings: NIST StRD Norris through the same straight-line path, and the
// agreement of the 20-predictor coefficients with ml-matrix.
//
// Run after building the API (`npm run build -w api`), from the repository root:
//   node test/bench/engine.bench.mjs
// Environment: ENGINE_DIST (path to the compiled engine's index.js), BENCH_ENGINE_SIMPLE_SIZES,
// BENCH_ENGINE_WIDE_SIZES (comma-separated row counts), BENCH_ENGINE_SKIP_ML_MATRIX=1.
// Data: invented series for a fictional card processor ("Ferrowick Pay"), from a seeded generator.
import { mulberry32 } from './seeded-random.mjs';
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const require = createRequire(import.meta.url);
const enginePath =
  process.env.ENGINE_DIST ?? fileURLToPath(new URL('../../api/dist/regression/engine/index.js', import.meta.url));
const engine = require(enginePath);
const { Matrix, QrDecomposition } = require('ml-matrix');

const sizes = (name, fallback) => (process.env[name] ?? fallback).split(',').filter(Boolean).map(Number);
const simpleSizes = sizes('BENCH_ENGINE_SIMPLE_SIZES', '100000,1000000,10000000');
const wideSizes = sizes('BENCH_ENGINE_WIDE_SIZES', '100000,1000000');
const skipMlMatrix = process.env.BENCH_ENGINE_SKIP_ML_MATRIX === '1';

function normalFrom(uniform) {
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

function best(fn, runs) {
  fn(); // warm-up
  let fastest = Infinity;
  let value;
  for (let r = 0; r < runs; r++) {
    const started = performance.now();
    value = fn();
    fastest = Math.min(fastest, performance.now() - started);
  }
  return { ms: fastest, value };
}

function barePass(x, y) {
  let sumX = 0;
  let sumY = 0;
  for (let i = 0; i < x.length; i++) {
    sumX += x[i];
    sumY += y[i];
  }
  return sumX + sumY;
}

const pad = (value, width) => String(value).padStart(width);
const lre = (computed, certified) => Math.min(15, -Math.log10(Math.abs(computed - certified) / Math.abs(certified)));

// ---------------------------------------------------------------- 1. straight line
console.log('Straight-line fit (full inference) vs a bare pass summing the same two Float64Arrays');
console.log(`${pad('n', 10)} ${pad('bare ms', 9)} ${pad('engine ms', 10)} ${pad('ratio', 6)} ${pad('engine Mrows/s', 15)}`);
for (const n of simpleSizes) {
  const uniform = mulberry32(20260101 + n);
  const normal = normalFrom(uniform);
  const ticket = new Float64Array(n);
  const fee = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    ticket[i] = 5 + 495 * uniform();
    fee[i] = 0.3 + 0.029 * ticket[i] + 0.5 * normal();
  }
  const runs = n >= 1e7 ? 5 : n >= 1e6 ? 9 : 25;
  const bare = best(() => barePass(ticket, fee), runs);
  const fit = best(
    () => engine.fitModel({ columns: { ticket, fee }, response: 'fee', predictors: ['ticket'] }),
    runs,
  );
  if (!(Math.abs(fit.value.coefficients[1].estimate - 0.029) < 0.01)) throw new Error('unexpected slope');
  console.log(
    `${pad(n.toExponential(0), 10)} ${pad(bare.ms.toFixed(2), 9)} ${pad(fit.ms.toFixed(2), 10)} ${pad(
      (fit.ms / bare.ms).toFixed(2),
      6,
    )} ${pad((n / fit.ms / 1e3).toFixed(0), 15)}`,
  );
}
const norris = JSON.parse(
  readFileSync(new URL('../../api/src/regression/engine/__fixtures__/nist-strd/Norris.json', import.meta.url), 'utf8'),
);
const norrisFit = engine.fitModel({ columns: { x: norris.data.x, y: norris.data.y }, response: 'y', predictors: ['x'] });
const certified = norris.certified_values;
const norrisLre = Math.min(
  ...certified.coefficients.map((c, j) => lre(norrisFit.coefficients[j].estimate, c.estimate)),
  ...certified.coefficients.map((c, j) => lre(norrisFit.coefficients[j].standardError, c.standard_deviation)),
  lre(norrisFit.residualStandardError, certified.residual_standard_deviation),
  lre(norrisFit.rSquared, certified.r_squared),
);
console.log(`Same path on NIST StRD Norris: minimum LRE ${norrisLre.toFixed(1)} (certified values)\n`);

// ---------------------------------------------------------------- 2. twenty predictors
console.log('20-predictor least squares (intercept + 20 columns) vs ml-matrix QrDecomposition.solve');
console.log(
  `${pad('n', 10)} ${pad('solve ms', 9)} ${pad('fitModel ms', 12)} ${pad('ml-matrix ms', 13)} ${pad('speed-up', 9)} ${pad(
    'max rel diff',
    13,
  )}`,
);
const p = 20;
for (const n of wideSizes) {
  const uniform = mulberry32(7 + n);
  const normal = normalFrom(uniform);
  const names = Array.from({ length: p }, (_, j) => `merchant_feature_${j + 1}`);
  const columns = {};
  const list = [];
  for (let j = 0; j < p; j++) {
    const column = new Float64Array(n);
    for (let i = 0; i < n; i++) column[i] = 100 * (j + 1) + (j + 1) * normal();
    columns[names[j]] = column;
    list.push(column);
  }
  const settlement = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let value = 12 + normal();
    for (let j = 0; j < p; j++) value += ((j % 5) - 2) * 0.05 * list[j][i];
    settlement[i] = value;
  }
  columns.settlement = settlement;
  const design = {
    names: [engine.INTERCEPT_NAME, ...names],
    columns: [new Float64Array(n).fill(1), ...list],
    n,
    hasIntercept: true,
  };
  const runs = n >= 1e6 ? 3 : 7;
  const solve = best(() => engine.solveLeastSquares(design, settlement), runs);
  const fit = best(() => engine.fitModel({ columns, response: 'settlement', predictors: names }), runs);
  let mlMs = Number.NaN;
  let difference = Number.NaN;
  if (!skipMlMatrix) {
    const rows = new Array(n);
    for (let i = 0; i < n; i++) {
      const row = new Array(p + 1);
      row[0] = 1;
      for (let j = 0; j < p; j++) row[j + 1] = list[j][i];
      rows[i] = row;
    }
    const X = new Matrix(rows);
    const Y = Matrix.columnVector(Array.from(settlement));
    const started = performance.now();
    const coefficients = new QrDecomposition(X).solve(Y).getColumn(0);
    mlMs = performance.now() - started;
    difference = Math.max(
      ...coefficients.map((c, j) => Math.abs(c - solve.value.coefficients[j]) / Math.max(Math.abs(c), 1e-300)),
    );
  }
  console.log(
    `${pad(n.toExponential(0), 10)} ${pad(solve.ms.toFixed(1), 9)} ${pad(fit.ms.toFixed(1), 12)} ${pad(
      mlMs.toFixed(0),
      13,
    )} ${pad((mlMs / solve.ms).toFixed(1), 9)} ${pad(difference.toExponential(1), 13)}  (${solve.value.method})`,
  );
  if (n === wideSizes[0]) {
    // Accuracy of the fast path: against the double-double refined solver on the same system.
    const started = performance.now();
    const refined = engine.solveLeastSquares(design, settlement, { method: 'householder-refined' });
    const refinedMs = performance.now() - started;
    const gap = Math.max(
      ...Array.from(refined.coefficients, (c, j) => Math.abs(c - solve.value.coefficients[j]) / Math.abs(c)),
    );
    console.log(
      `${pad('', 10)} tall-skinny vs double-double refined solve (${refinedMs.toFixed(0)} ms): max relative coefficient difference ${gap.toExponential(1)}`,
    );
  }
}
