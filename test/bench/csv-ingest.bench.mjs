// CSV ingest benchmark: the same 1e6 × 2 numeric table parsed by several well-known CSV parsers, against
// JSON.parse of the same numbers, measured side by side in one run. Prints MB/s and the ratio to JSON.parse.
// The dataset upload path uses the parser this benchmark shows fastest (target: at least 1/3 of JSON.parse).
import { mulberry32 } from './seeded-random.mjs';
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const rows = Number(process.env.BENCH_CSV_ROWS ?? 1_000_000);

// Invented series from a seeded generator (mulberry32): ticket sizes and settlement fees of a fictional processor.
const random = mulberry32(20261202);
const ticket = new Float64Array(rows);
const fee = new Float64Array(rows);
for (let i = 0; i < rows; i++) {
  ticket[i] = Math.round(random() * 500000) / 100;
  fee[i] = Math.round((0.3 + 0.029 * ticket[i] + random() * 0.5) * 10000) / 10000;
}
let csv = 'ticket_size,fee\n';
const lines = new Array(rows);
for (let i = 0; i < rows; i++) lines[i] = `${ticket[i]},${fee[i]}`;
csv += lines.join('\n') + '\n';
const json = JSON.stringify({ ticket_size: Array.from(ticket), fee: Array.from(fee) });
const megabytes = Buffer.byteLength(csv) / 1e6;

function time(name, fn, bytes, runs = 3) {
  if (runs > 1) fn(); // warm-up
  let best = Infinity;
  let checksum = 0;
  for (let r = 0; r < runs; r++) {
    const started = performance.now();
    checksum = fn();
    best = Math.min(best, performance.now() - started);
  }
  return { name, ms: best, mbPerSecond: bytes / 1e6 / (best / 1000), checksum };
}

function checksumColumns(a, b) {
  let sum = 0;
  for (let i = 0; i < a.length; i += 9973) sum += Number(a[i]) + Number(b[i]);
  return Math.round(sum * 100) / 100;
}

const results = [];
results.push(time('JSON.parse (columns)', () => {
  const parsed = JSON.parse(json);
  return checksumColumns(parsed.ticket_size, parsed.fee);
}, Buffer.byteLength(json)));

const { initParser, inferSchema } = require('udsv');
results.push(time('uDSV typedCols', () => {
  const parser = initParser(inferSchema(csv));
  const [a, b] = parser.typedCols(csv);
  return checksumColumns(a, b);
}, Buffer.byteLength(csv)));

const { parse: csvParseSync } = require('csv-parse/sync');
results.push(time('csv-parse (cast)', () => {
  const records = csvParseSync(csv, { from_line: 2, cast: (value) => Number(value) });
  const a = records.map((r) => r[0]);
  const b = records.map((r) => r[1]);
  return checksumColumns(a, b);
}, Buffer.byteLength(csv), 1));

const d3 = await import('d3-dsv');
results.push(time('d3-dsv csvParseRows + Number', () => {
  const records = d3.csvParseRows(csv);
  const a = new Float64Array(records.length - 1);
  const b = new Float64Array(records.length - 1);
  for (let i = 1; i < records.length; i++) {
    a[i - 1] = Number(records[i][0]);
    b[i - 1] = Number(records[i][1]);
  }
  return checksumColumns(a, b);
}, Buffer.byteLength(csv)));

const Papa = require('papaparse');
results.push(time('papaparse dynamicTyping', () => {
  const { data } = Papa.parse(csv, { dynamicTyping: true, skipEmptyLines: true });
  const a = data.slice(1).map((r) => r[0]);
  const b = data.slice(1).map((r) => r[1]);
  return checksumColumns(a, b);
}, Buffer.byteLength(csv)));

// The upload path itself: streamed in 64 KiB pieces, typed and checked cell by cell.
const { CsvTableReader } = require('../../api/dist/datasets/ingest/csv-table-reader.js');
results.push(time('Leastline upload reader', () => {
  const reader = new CsvTableReader(',');
  for (let i = 0; i < csv.length; i += 65536) reader.write(csv.slice(i, i + 65536));
  const table = reader.end();
  return checksumColumns(table.columns[0].numericValues(), table.columns[1].numericValues());
}, Buffer.byteLength(csv)));

const baseline = results[0];
console.log(`CSV ingest: ${rows} rows × 2 columns, CSV ${megabytes.toFixed(1)} MB (best of 3 after a warm-up; csv-parse once, it is slow)`);
console.log('parser                          time ms    MB/s   speed vs JSON.parse   checksum');
for (const r of results) {
  console.log(
    `${r.name.padEnd(30)} ${r.ms.toFixed(0).padStart(8)} ${r.mbPerSecond.toFixed(1).padStart(7)}   ${(baseline.ms / r.ms).toFixed(2).padStart(8)}×            ${r.checksum}`,
  );
}
