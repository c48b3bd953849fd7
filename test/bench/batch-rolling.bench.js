// Batch and rolling least-squares benchmark, measured side by side in one run against the naive
// approach (a separate full fit per response, or per window). Requires the compiled engine:
// `npm run build -w api` first.
//
// Invented data from a seeded generator (mulberry32 + Box-Muller): daily returns of fictional
// instruments against one fictional benchmark index.
'use strict';

const path = require('node:path');

const engine = path.join(__dirname, '../../api/dist/regression/engine');
const { fitBatch } = require(path.join(engine, 'batch-fit'));
const { fitRolling } = require(path.join(engine, 'rolling-fit'));
const { solveLeastSquares, INTERCEPT_NAME } = require(path.join(engine, 'least-squares'));

const BATCH_RESPONSES = Number(process.env.BENCH_BATCH_RESPONSES ?? 5000);
const BATCH_ROWS = Number(process.env.BENCH_BATCH_ROWS ?? 1000);
const ROLLING_ROWS = Number(process.env.BENCH_ROLLING_ROWS ?? 1_000_000);
const WINDOW = Number(process.env.BENCH_WINDOW ?? 250);
const NAIVE_WINDOW_SAMPLE = Number(process.env.BENCH_NAIVE_WINDOWS ?? 5000);

function seeded(seed) {
  let state = seed | 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const normal = () => {
    let u = uniform();
    while (u === 0) u = uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
  return { uniform, normal };
}

function seconds(fn) {
  const started = performance.now();
  const value = fn();
  return { value, seconds: (performance.now() - started) / 1000 };
}

function format(value) {
  return value >= 100 ? value.toFixed(0) : value >= 1 ? value.toFixed(2) : value.toFixed(4);
}

// ------------------------------------------------------------------ batch
{
  const random = seeded(20261202);
  const benchmark = new Float64Array(BATCH_ROWS);
  for (let i = 0; i < BATCH_ROWS; i++) benchmark[i] = 0.01 * random.normal();
  const columns = { benchmark };
  const responses = [];
  for (let k = 0; k < BATCH_RESPONSES; k++) {
    const beta = 0.5 + random.uniform();
    const values = new Float64Array(BATCH_ROWS);
    for (let i = 0; i < BATCH_ROWS; i++) values[i] = 0.0002 + beta * benchmark[i] + 0.005 * random.normal();
    const name = `instrument-${k}`;
    columns[name] = values;
    responses.push(name);
  }
  fitBatch({ columns, predictors: ['benchmark'], responses: responses.slice(0, 50) }); // warm-up
  const batch = seconds(() => fitBatch({ columns, predictors: ['benchmark'], responses }));

  const design = { names: [INTERCEPT_NAME, 'benchmark'], columns: [new Float64Array(BATCH_ROWS).fill(1), benchmark], n: BATCH_ROWS, hasIntercept: true };
  for (let k = 0; k < 50; k++) solveLeastSquares(design, columns[responses[k]]); // warm-up
  const naive = seconds(() => responses.map((name) => solveLeastSquares(design, columns[name]).coefficients));

  let largest = 0;
  batch.value.fits.forEach((fit, k) => {
    largest = Math.max(largest, Math.abs(fit.coefficients[1].estimate - naive.value[k][1]));
  });
  console.log(`batch fits: ${BATCH_RESPONSES} responses x n = ${BATCH_ROWS}, one shared predictor + intercept`);
  console.log(`  shared factorisation (full coefficient tables): ${format(batch.seconds)} s`);
  console.log(`  naive full fit per response (coefficients only): ${format(naive.seconds)} s`);
  console.log(`  ratio naive / batch: ${format(naive.seconds / batch.seconds)}x   (largest slope difference ${largest.toExponential(2)})`);
}

// ------------------------------------------------------------------ rolling
{
  const random = seeded(7);
  const benchmark = new Float64Array(ROLLING_ROWS);
  const stock = new Float64Array(ROLLING_ROWS);
  for (let i = 0; i < ROLLING_ROWS; i++) {
    benchmark[i] = 0.01 * random.normal();
    stock[i] = 0.0001 + 1.1 * benchmark[i] + 0.006 * random.normal();
  }
  const columns = { benchmark, stock };
  const rolling = seconds(() => fitRolling({ columns, response: 'stock', predictors: ['benchmark'], window: WINDOW, step: 1 }));
  const windowCount = rolling.value.windowCount;

  // Naive: a full fit of every window. Timed on an evenly spread sample of windows and extrapolated.
  const sample = Math.min(NAIVE_WINDOW_SAMPLE, windowCount);
  const stride = Math.max(1, Math.floor(windowCount / sample));
  const ones = new Float64Array(WINDOW).fill(1);
  const fitWindow = (start) => {
    const design = { names: [INTERCEPT_NAME, 'benchmark'], columns: [ones, benchmark.subarray(start, start + WINDOW)], n: WINDOW, hasIntercept: true };
    return solveLeastSquares(design, stock.subarray(start, start + WINDOW)).coefficients[1];
  };
  for (let w = 0; w < 200; w++) fitWindow(w); // warm-up
  let largest = 0;
  const naiveSample = seconds(() => {
    let timed = 0;
    for (let w = 0; w < windowCount && timed < sample; w += stride, timed++) {
      const slope = fitWindow(w);
      largest = Math.max(largest, Math.abs(slope - rolling.value.coefficientPath[1].estimates[w]));
    }
    return timed;
  });
  const naiveSeconds = (naiveSample.seconds / naiveSample.value) * windowCount;
  console.log(`rolling fits: n = ${ROLLING_ROWS}, window ${WINDOW}, step 1 (${windowCount} windows)`);
  console.log(`  updating sums (coefficients, standard errors, R^2 per window): ${format(rolling.seconds)} s`);
  console.log(
    `  naive full fit per window: ${format(naiveSeconds)} s (extrapolated from ${naiveSample.value} sampled windows, ${format(naiveSample.seconds)} s)`,
  );
  console.log(`  ratio naive / rolling: ${format(naiveSeconds / rolling.seconds)}x   (largest slope difference ${largest.toExponential(2)})`);
}
