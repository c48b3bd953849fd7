// Dataset scale benchmark against a running API (started by `npm run bench`): streams a 10-million-row ×
// 3-column CSV of invented settlement data to POST /v1/datasets/csv, fits it by dataset id, and prints the
// throughput, the fit time and the API process's peak memory. Never part of `npm test`.
import { mulberry32 } from './seeded-random.mjs';
import { readFileSync } from 'node:fs';

const base = process.env.LEASTLINE_BENCH_URL;
const key = process.env.LEASTLINE_BENCH_KEY;
const apiPid = Number(process.env.LEASTLINE_BENCH_API_PID);
const rows = Number(process.env.BENCH_DATASET_ROWS ?? 10_000_000);
if (!base || !key) throw new Error('run through `npm run bench` (it starts the API and passes its URL and key)');


/** Invented series: settlement delay (days) against ticket size and a merchant risk score. */
function* csvChunks() {
  const random = mulberry32(42);
  yield 'settlement_delay,ticket_size,risk_score\n';
  const perChunk = 20_000;
  for (let start = 0; start < rows; start += perChunk) {
    const lines = [];
    for (let i = start; i < Math.min(rows, start + perChunk); i++) {
      const ticket = Math.round(random() * 50000) / 100;
      const risk = Math.round(random() * 1000) / 1000;
      const delay = Math.round((1.2 + 0.004 * ticket + 2.5 * risk + (random() - 0.5)) * 1000) / 1000;
      lines.push(`${delay},${ticket},${risk}`);
    }
    yield `${lines.join('\n')}\n`;
  }
}

function peakMemoryMb(pid) {
  try {
    const status = readFileSync(`/proc/${pid}/status`, 'utf8');
    const match = /VmHWM:\s+(\d+) kB/.exec(status);
    return match ? Number(match[1]) / 1024 : NaN;
  } catch {
    return NaN;
  }
}

const encoder = new TextEncoder();
let bytes = 0;
const body = new ReadableStream({
  start() {},
  pull(controller) {
    const next = iterator.next();
    if (next.done) controller.close();
    else {
      const chunk = encoder.encode(next.value);
      bytes += chunk.byteLength;
      controller.enqueue(chunk);
    }
  },
});
const iterator = csvChunks();
const headers = { Authorization: `Bearer ${key}` };

const uploadStarted = performance.now();
const upload = await fetch(`${base}/v1/datasets/csv?name=bench-settlements`, {
  method: 'POST',
  headers: { ...headers, 'Content-Type': 'text/csv' },
  body,
  duplex: 'half',
});
const uploadMs = performance.now() - uploadStarted;
const dataset = await upload.json();
if (upload.status !== 201) throw new Error(`upload answered ${upload.status}: ${JSON.stringify(dataset)}`);

async function fit(diagnostics) {
  const started = performance.now();
  const response = await fetch(`${base}/v1/fits`, {
    method: 'POST',
    headers: { ...headers, 'Content-Type': 'application/json' },
    body: JSON.stringify({
      data: { datasetId: dataset.id },
      model: { response: 'settlement_delay', predictors: ['ticket_size', 'risk_score'] },
      diagnostics,
    }),
  });
  const result = await response.json();
  if (response.status !== 201) throw new Error(`fit answered ${response.status}: ${JSON.stringify(result)}`);
  return { ms: performance.now() - started, result };
}
const plain = await fit('none');
const checked = await fit('all');

console.log(`Dataset scale: ${rows.toLocaleString('en')} rows × 3 columns (invented settlement data)`);
console.log(`  CSV upload (streamed, text/csv)   ${(bytes / 1e6).toFixed(0)} MB in ${(uploadMs / 1000).toFixed(1)} s = ${(bytes / 1e6 / (uploadMs / 1000)).toFixed(1)} MB/s, stored ${(dataset.byteSize / 1e6).toFixed(0)} MB as float64 chunks`);
console.log(`  fit by dataset id, no checks      ${(plain.ms / 1000).toFixed(2)} s (load from PostgreSQL + solve + store)`);
console.log(`  fit by dataset id, all checks     ${(checked.ms / 1000).toFixed(2)} s`);
console.log(`  coefficients                      ${plain.result.fit.coefficients.map((c) => `${c.term}=${c.estimate.toFixed(6)}`).join('  ')}`);
console.log(`  API process peak resident memory  ${peakMemoryMb(apiPid).toFixed(0)} MB (raw data: ${((rows * 3 * 8) / 1e6).toFixed(0)} MB as float64)`);
