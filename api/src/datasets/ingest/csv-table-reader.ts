import { parse as parseCsvSync } from 'csv-parse/sync';
import { inferSchema, initParser, Parser } from 'udsv';
import { ColumnBuilder } from './column-builder';
import { IngestError } from './ingest-error';

export type CsvDelimiter = ',' | ';' | '\t' | '|';

export interface ReadTable {
  columns: ColumnBuilder[];
  rowCount: number;
}

const MAX_COLUMNS = 200;
/** Quoted files go through the general parser, which needs the whole text; cap what it may hold. */
const MAX_QUOTED_BYTES = 256 * 1024 * 1024;
const OTHER_DELIMITERS: CsvDelimiter[] = [';', '\t', '|', ','];

function describeDelimiter(delimiter: string): string {
  return delimiter === '\t' ? 'tab' : `"${delimiter}"`;
}

/**
 * Streams a CSV file into columns. Two well-known parsers share the work, chosen by measurement
 * (test/bench/csv-ingest.bench.mjs):
 * - files whose first block has no quote character (the usual numeric export) go through uDSV, the
 *   fastest parser measured (about 0.4× JSON.parse speed on the same numbers). uDSV does not report rows
 *   with too few or too many fields (it joins them with the next row), so in this mode any cell holding a
 *   delimiter, a quote or a line break is refused as a malformed row: without quoting, no legal cell can
 *   contain one;
 * - files with quotes go through csv-parse, which handles quoting and reports ragged rows exactly but is
 *   much slower.
 * Rows are numbered from 1 for the first data row (the header is not counted). Blank lines are skipped.
 */
export class CsvTableReader {
  private pending = '';
  private started = false;
  private quoted = false;
  private quotedText: string[] = [];
  private quotedBytes = 0;
  private parser: Parser | undefined;
  private columns: ColumnBuilder[] = [];
  private rowCount = 0;
  private failure: IngestError | undefined;

  constructor(private readonly delimiter: CsvDelimiter = ',') {}

  write(chunk: string): void {
    if (this.failure) throw this.failure;
    if (!this.started) {
      this.pending += chunk;
      // The header must be complete before the format can be judged.
      if (!/[\r\n]/.test(this.pending) && this.pending.length < 1024 * 1024) return;
      const first = this.pending;
      this.pending = '';
      this.begin(first);
      return;
    }
    this.consume(chunk);
  }

  end(): ReadTable {
    if (this.failure) throw this.failure;
    if (!this.started) {
      const first = this.pending;
      this.pending = '';
      if (first.replace(/^\uFEFF/, '').trim() === '') throw new IngestError('empty-file', 'The file is empty.');
      this.begin(first.endsWith('\n') ? first : `${first}\n`);
    }
    if (this.quoted) this.readQuoted();
    else this.parser?.end();
    if (this.failure) throw this.failure;
    if (this.rowCount === 0) throw new IngestError('no-data-rows', 'The file has a header but no data rows.');
    return { columns: this.columns, rowCount: this.rowCount };
  }

  private begin(first: string): void {
    this.started = true;
    const text = first.replace(/^\uFEFF/, '');
    if (text.trim() === '') throw new IngestError('empty-file', 'The file is empty.');
    const headerLine = text.split(/\r?\n|\r/, 1)[0] ?? '';
    if (headerLine.trim() === '') throw new IngestError('missing-header', 'The first line must be a header naming the columns.');
    this.quoted = text.includes('"');
    if (this.quoted) {
      this.quotedText.push(text);
      this.quotedBytes += text.length;
      return;
    }
    const names = headerLine.split(this.delimiter).map((name) => name.trim());
    this.setColumns(names, headerLine);
    const schema = inferSchema(text, { col: this.delimiter, encl: '' });
    this.parser = initParser(schema);
    this.consume(text);
  }

  private setColumns(names: string[], headerLine: string): void {
    if (names.length === 1) {
      const other = OTHER_DELIMITERS.find((candidate) => candidate !== this.delimiter && headerLine.includes(candidate));
      if (other) {
        throw new IngestError(
          'wrong-delimiter',
          `The header has one column but contains ${describeDelimiter(other)}; the file looks ${describeDelimiter(other)}-delimited. ` +
            `Send comma-separated values or set delimiter to ${describeDelimiter(other)}.`,
        );
      }
    }
    if (names.length > MAX_COLUMNS) {
      throw new IngestError('too-many-columns', `The file has ${names.length} columns; the limit is ${MAX_COLUMNS}.`);
    }
    const emptyAt = names.findIndex((name) => name === '');
    if (emptyAt >= 0) {
      throw new IngestError('empty-header', `Column ${emptyAt + 1} has an empty name in the header.`, { columns: [String(emptyAt + 1)] });
    }
    const seen = new Set<string>();
    const duplicates = new Set<string>();
    for (const name of names) {
      if (seen.has(name)) duplicates.add(name);
      seen.add(name);
    }
    if (duplicates.size > 0) {
      const list = [...duplicates];
      throw new IngestError('duplicate-header', `Column names must be unique; repeated: ${list.map((n) => `"${n}"`).join(', ')}.`, {
        columns: list,
      });
    }
    this.columns = names.map((name) => new ColumnBuilder(name));
  }

  private consume(chunk: string): void {
    if (this.quoted) {
      this.quotedBytes += chunk.length;
      if (this.quotedBytes > MAX_QUOTED_BYTES) {
        this.failure = new IngestError(
          'malformed-row',
          `Files with quoted values are limited to ${MAX_QUOTED_BYTES / 1024 / 1024} MiB; remove the quotes or upload JSON rows.`,
        );
        throw this.failure;
      }
      this.quotedText.push(chunk);
      return;
    }
    const parser = this.parser as Parser;
    const width = this.columns.length;
    parser.chunk<string[]>(chunk, parser.stringArrs, (row) => {
      if (this.failure) return false;
      if (row.length === 1 && row[0] === '') return undefined;
      this.rowCount += 1;
      if (row.length !== width) {
        this.failure = new IngestError('malformed-row', `Data row ${this.rowCount} has ${row.length} fields; the header has ${width}.`, {
          rows: [this.rowCount],
        });
        return false;
      }
      for (let c = 0; c < width; c++) {
        const cell = row[c] as string;
        const column = this.columns[c] as ColumnBuilder;
        column.push(cell, this.rowCount);
        if (column.kind === 'text' && (cell.includes(this.delimiter) || /[\r\n"]/.test(cell))) {
          this.failure = new IngestError(
            'malformed-row',
            `Data row ${this.rowCount} does not have ${width} fields (a row is short, long, or holds an unexpected quote).`,
            { rows: [this.rowCount] },
          );
          return false;
        }
      }
      return undefined;
    });
    if (this.failure) throw this.failure;
  }

  private readQuoted(): void {
    const text = this.quotedText.join('');
    this.quotedText = [];
    let records: string[][];
    try {
      records = parseCsvSync(text, { delimiter: this.delimiter, skip_empty_lines: true, relax_column_count: false });
    } catch (error) {
      const lines = (error as { lines?: number }).lines;
      const row = typeof lines === 'number' ? Math.max(1, lines - 1) : undefined;
      throw new IngestError('malformed-row', `The file could not be read as CSV: ${(error as Error).message}`, {
        rows: row === undefined ? [] : [row],
      });
    }
    const [header, ...rows] = records;
    if (!header) throw new IngestError('missing-header', 'The first line must be a header naming the columns.');
    this.setColumns(
      header.map((name) => name.trim()),
      header.join(this.delimiter),
    );
    for (const row of rows) {
      this.rowCount += 1;
      for (let c = 0; c < this.columns.length; c++) (this.columns[c] as ColumnBuilder).push(row[c] ?? '', this.rowCount);
    }
  }
}
