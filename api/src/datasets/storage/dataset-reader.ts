import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { decodeNumericChunk, decodeTextChunk, VALUES_PER_CHUNK } from './column-codec';

export type LoadedColumn = Float64Array | (string | null)[];

/**
 * Reads whole columns back, one chunk at a time (no JSON copy of the data is ever built for numeric
 * columns: each chunk is copied once into the column's Float64Array).
 */
export async function readColumn(
  sequelize: Sequelize,
  datasetId: string,
  columnIndex: number,
  kind: 'numeric' | 'text',
  rowCount: number,
): Promise<LoadedColumn> {
  const chunkCount = Math.ceil(rowCount / VALUES_PER_CHUNK);
  const numeric = kind === 'numeric' ? new Float64Array(rowCount) : undefined;
  const texts: (string | null)[] = [];
  // Fetch in groups so a 10-million-row column never sits in memory twice as driver buffers.
  const group = 16;
  for (let first = 0; first < chunkCount; first += group) {
    const rows = await sequelize.query<{ chunk_index: number; payload: Buffer }>(
      `SELECT chunk_index, payload FROM dataset_chunks
        WHERE dataset_id = $1 AND column_index = $2 AND chunk_index >= $3 AND chunk_index < $4
        ORDER BY chunk_index`,
      { bind: [datasetId, columnIndex, first, first + group], type: QueryTypes.SELECT },
    );
    for (const row of rows) {
      if (numeric) decodeNumericChunk(row.payload, numeric, row.chunk_index * VALUES_PER_CHUNK);
      else texts.push(...decodeTextChunk(row.payload));
    }
  }
  return numeric ?? texts;
}

/** Reads one page of rows across the given columns (for previews): only the chunks that page touches. */
export async function readRowPage(
  sequelize: Sequelize,
  datasetId: string,
  columns: { index: number; kind: 'numeric' | 'text' }[],
  offset: number,
  limit: number,
): Promise<(number | string | null)[][]> {
  const firstChunk = Math.floor(offset / VALUES_PER_CHUNK);
  const lastChunk = Math.floor((offset + limit - 1) / VALUES_PER_CHUNK);
  const rows: (number | string | null)[][] = Array.from({ length: limit }, () => []);
  for (const column of columns) {
    const chunks = await sequelize.query<{ chunk_index: number; payload: Buffer }>(
      `SELECT chunk_index, payload FROM dataset_chunks
        WHERE dataset_id = $1 AND column_index = $2 AND chunk_index BETWEEN $3 AND $4 ORDER BY chunk_index`,
      { bind: [datasetId, column.index, firstChunk, lastChunk], type: QueryTypes.SELECT },
    );
    for (const chunk of chunks) {
      const base = chunk.chunk_index * VALUES_PER_CHUNK;
      let values: ArrayLike<number | string | null>;
      if (column.kind === 'numeric') {
        const decoded = new Float64Array(chunk.payload.byteLength / 8);
        decodeNumericChunk(chunk.payload, decoded, 0);
        values = decoded;
      } else {
        values = decodeTextChunk(chunk.payload);
      }
      for (let i = 0; i < values.length; i++) {
        const row = base + i - offset;
        if (row < 0 || row >= limit) continue;
        const value = values[i] as number | string | null;
        (rows[row] as (number | string | null)[])[column.index] = typeof value === 'number' && Number.isNaN(value) ? null : value;
      }
    }
  }
  return rows;
}
