import { createHash } from 'node:crypto';
import { QueryTypes, Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ColumnBuilder } from '../ingest/column-builder';
import { summariseNumeric, summariseText } from '../ingest/column-summary';
import { StoredColumn } from '../models/dataset.model';
import { encodeNumericChunk, encodeTextChunk, VALUES_PER_CHUNK } from './column-codec';

/** Rows per INSERT: a few chunks at a time keeps each statement near 2 MB. */
const CHUNKS_PER_STATEMENT = 4;

export interface WrittenColumns {
  columns: StoredColumn[];
  contentHash: string;
  byteSize: number;
}

/**
 * Writes every column of a freshly read table as chunks inside the caller's transaction, and computes the
 * content hash (SHA-256 over each column's name, kind and stored bytes, in column order) on the way.
 */
export async function writeColumns(
  sequelize: Sequelize,
  transaction: Transaction,
  datasetId: string,
  builders: ColumnBuilder[],
): Promise<WrittenColumns> {
  const hash = createHash('sha256');
  const columns: StoredColumn[] = [];
  let byteSize = 0;
  let pending: { columnIndex: number; chunkIndex: number; payload: Buffer }[] = [];
  const flush = async () => {
    if (pending.length === 0) return;
    const placeholders = pending.map((_, i) => `($1, $${i * 3 + 2}, $${i * 3 + 3}, $${i * 3 + 4})`).join(', ');
    const bind: unknown[] = [datasetId];
    for (const chunk of pending) bind.push(chunk.columnIndex, chunk.chunkIndex, chunk.payload);
    await sequelize.query(`INSERT INTO dataset_chunks (dataset_id, column_index, chunk_index, payload) VALUES ${placeholders}`, {
      bind,
      transaction,
      type: QueryTypes.INSERT,
    });
    pending = [];
  };

  for (let columnIndex = 0; columnIndex < builders.length; columnIndex++) {
    const builder = builders[columnIndex] as ColumnBuilder;
    hash.update(`${builder.name}\u0000${builder.kind}\u0000`);
    const stored: StoredColumn = { name: builder.name, kind: builder.kind, summary: { count: 0, missing: 0, mean: null, standardDeviation: null, min: null, max: null } };
    if (builder.kind === 'numeric') {
      const values = builder.numericValues();
      stored.summary = summariseNumeric(values);
      for (let start = 0, chunkIndex = 0; start < values.length; start += VALUES_PER_CHUNK, chunkIndex++) {
        const payload = encodeNumericChunk(values.subarray(start, Math.min(values.length, start + VALUES_PER_CHUNK)));
        hash.update(payload);
        byteSize += payload.byteLength;
        pending.push({ columnIndex, chunkIndex, payload });
        if (pending.length >= CHUNKS_PER_STATEMENT) await flush();
      }
    } else {
      const values = builder.textValues();
      stored.summary = summariseText(values);
      if (builder.firstText) {
        stored.firstTextRow = builder.firstText.line;
        stored.firstTextValue = builder.firstText.value;
      }
      for (let start = 0, chunkIndex = 0; start < values.length; start += VALUES_PER_CHUNK, chunkIndex++) {
        const payload = encodeTextChunk(values.slice(start, start + VALUES_PER_CHUNK));
        hash.update(payload);
        byteSize += payload.byteLength;
        pending.push({ columnIndex, chunkIndex, payload });
        if (pending.length >= CHUNKS_PER_STATEMENT) await flush();
      }
    }
    columns.push(stored);
  }
  await flush();
  return { columns, contentHash: hash.digest('hex'), byteSize };
}
