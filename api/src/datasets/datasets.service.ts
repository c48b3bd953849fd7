import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { randomUUID } from 'node:crypto';
import { Op, WhereOptions } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { decodeCursor, encodeCursor, invalidCursor } from '../common/pagination/cursor';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { ColumnBuilder } from './ingest/column-builder';
import { CsvDelimiter, CsvTableReader } from './ingest/csv-table-reader';
import { IngestError } from './ingest/ingest-error';
import { Dataset, StoredColumn } from './models/dataset.model';
import { LoadedColumn, readColumn, readRowPage } from './storage/dataset-reader';
import { writeColumns } from './storage/dataset-writer';

export interface DatasetActor {
  /** Who acted, as shown in listings and the audit log (e.g. "key:abc123" or "user:<id>"). */
  label: string;
}

export interface DatasetPage {
  items: Dataset[];
  nextCursor: string | null;
}

export interface LoadedDataset {
  dataset: Dataset;
  columns: Map<string, LoadedColumn>;
}

const MAX_ROWS_PER_PAGE = 1000;

function datasetCursor(dataset: Dataset): string {
  return encodeCursor({ createdAt: dataset.createdAt.toISOString(), id: dataset.id });
}

function readDatasetCursor(cursor: string): { createdAt: Date; id: string } {
  const position = decodeCursor(cursor, ['createdAt', 'id']);
  const createdAt = new Date(position.createdAt as string);
  if (Number.isNaN(createdAt.getTime()) || !/^[0-9a-f-]{36}$/.test(position.id as string)) throw invalidCursor();
  return { createdAt, id: position.id as string };
}

/** Upload problems keep their own code so clients can branch on it. */
function ingestProblem(error: IngestError): ProblemException {
  const fieldErrors = [
    ...(error.details.rows ?? []).map((row) => ({ pointer: `#/file/rows/${row}`, detail: error.message })),
    ...(error.details.columns ?? []).map((column) => ({ pointer: `#/file/columns/${column}`, detail: error.message })),
  ];
  return new ProblemException(PROBLEM_TYPES.unprocessable, error.message, fieldErrors, {
    code: error.code,
    ...(error.details.rows ? { rows: error.details.rows } : {}),
  });
}

/**
 * Datasets: immutable, versioned tables owned by one team. Every query is scoped by team id, so another
 * team's dataset id is indistinguishable from an unknown one (404).
 */
@Injectable()
export class DatasetsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Dataset) private readonly datasets: typeof Dataset,
  ) {}

  /** Reads a CSV stream (bytes) and stores it as a new version of `name`. */
  async createFromCsv(
    teamId: string,
    actor: DatasetActor,
    name: string,
    delimiter: CsvDelimiter,
    chunks: AsyncIterable<Buffer>,
  ): Promise<Dataset> {
    const reader = new CsvTableReader(delimiter);
    const decoder = new TextDecoder('utf-8', { fatal: true });
    let table;
    try {
      try {
        for await (const chunk of chunks) reader.write(decoder.decode(chunk, { stream: true }));
        reader.write(decoder.decode());
      } catch (error) {
        if (error instanceof TypeError && /encoded data|decode/i.test(error.message)) {
          throw new IngestError('not-utf8', 'The file is not valid UTF-8 text.');
        }
        throw error;
      }
      table = reader.end();
    } catch (error) {
      if (error instanceof IngestError) throw ingestProblem(error);
      throw error;
    }
    return this.store(teamId, actor, name, 'csv', table.columns, table.rowCount);
  }

  /** Stores JSON columns `{ name: [values] }` (numbers, strings or null for missing). */
  async createFromColumns(
    teamId: string,
    actor: DatasetActor,
    name: string,
    columns: Record<string, (number | string | null)[]>,
  ): Promise<Dataset> {
    const names = Object.keys(columns);
    if (names.length === 0) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'At least one column is required.', [
        { pointer: '#/columns', detail: 'no columns' },
      ]);
    }
    const length = (columns[names[0] as string] ?? []).length;
    const builders: ColumnBuilder[] = [];
    for (const columnName of names) {
      const values = columns[columnName] as (number | string | null)[];
      if (values.length !== length) {
        throw new ProblemException(
          PROBLEM_TYPES.invalidRequest,
          `Column "${columnName}" has ${values.length} values; "${names[0]}" has ${length}. All columns must have the same length.`,
          [{ pointer: `#/columns/${columnName}`, detail: `expected ${length} values` }],
        );
      }
      const builder = new ColumnBuilder(columnName);
      for (let i = 0; i < values.length; i++) {
        const value = values[i];
        if (typeof value === 'number' && !Number.isFinite(value)) {
          throw new ProblemException(PROBLEM_TYPES.invalidRequest, `Column "${columnName}" row ${i + 1} is not a finite number.`, [
            { pointer: `#/columns/${columnName}/${i}`, detail: 'not finite' },
          ]);
        }
        builder.push(value === null || value === undefined ? '' : String(value), i + 1);
      }
      builders.push(builder);
    }
    if (length === 0) {
      throw new ProblemException(PROBLEM_TYPES.unprocessable, 'The dataset has no rows.', [], { code: 'no-data-rows' });
    }
    return this.store(teamId, actor, name, 'json', builders, length);
  }

  private async store(
    teamId: string,
    actor: DatasetActor,
    name: string,
    source: 'csv' | 'json',
    builders: ColumnBuilder[],
    rowCount: number,
  ): Promise<Dataset> {
    return this.sequelize.transaction(async (transaction) => {
      // Serialise versions of one name per team: two uploads at once still get distinct version numbers.
      await this.sequelize.query('SELECT pg_advisory_xact_lock(hashtext($1))', { bind: [`${teamId}/${name}`], transaction });
      const latest = (await this.datasets.max('version', { where: { teamId, name }, transaction })) as number | null;
      const dataset = await this.datasets.create(
        {
          id: randomUUID(),
          teamId,
          name,
          version: (latest ?? 0) + 1,
          contentHash: 'pending',
          rowCount: String(rowCount),
          byteSize: '0',
          columns: [],
          source,
          createdBy: actor.label,
          createdAt: new Date(),
        },
        { transaction },
      );
      const written = await writeColumns(this.sequelize, transaction, dataset.id, builders);
      dataset.contentHash = written.contentHash;
      dataset.byteSize = String(written.byteSize);
      dataset.columns = written.columns;
      await dataset.save({ transaction });
      return dataset;
    });
  }

  async list(teamId: string, options: { cursor?: string; limit: number; name?: string }): Promise<DatasetPage> {
    const where: WhereOptions<Dataset> = { teamId, deletedAt: null } as WhereOptions<Dataset>;
    const conditions: WhereOptions<Dataset>[] = [where];
    if (options.name) conditions.push({ name: options.name });
    if (options.cursor) {
      const { createdAt, id } = readDatasetCursor(options.cursor);
      conditions.push({
        [Op.or]: [{ createdAt: { [Op.lt]: createdAt } }, { createdAt, id: { [Op.lt]: id } }],
      } as WhereOptions<Dataset>);
    }
    const rows = await this.datasets.findAll({
      where: { [Op.and]: conditions },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
      limit: options.limit + 1,
    });
    const items = rows.slice(0, options.limit);
    const last = items[items.length - 1];
    return { items, nextCursor: rows.length > options.limit && last ? datasetCursor(last) : null };
  }

  async get(teamId: string, datasetId: string, pointer = '#/datasetId'): Promise<Dataset> {
    const dataset = /^[0-9a-f-]{36}$/i.test(datasetId)
      ? await this.datasets.findOne({ where: { id: datasetId, teamId, deletedAt: null } as WhereOptions<Dataset> })
      : null;
    if (!dataset) {
      throw new ProblemException(PROBLEM_TYPES.notFound, `No dataset with id "${datasetId}" exists for this team.`, [
        { pointer, detail: 'unknown dataset' },
      ]);
    }
    return dataset;
  }

  async readRows(teamId: string, datasetId: string, offset: number, limit: number) {
    const dataset = await this.get(teamId, datasetId);
    const total = Number(dataset.rowCount);
    const count = Math.max(0, Math.min(limit, MAX_ROWS_PER_PAGE, total - offset));
    const rows =
      count === 0
        ? []
        : await readRowPage(
            this.sequelize,
            dataset.id,
            dataset.columns.map((column, index) => ({ index, kind: column.kind })),
            offset,
            count,
          );
    return { dataset, rows, total };
  }

  /** Soft delete; returns the dataset as it was so the caller can audit it. */
  async remove(teamId: string, datasetId: string, actor: DatasetActor): Promise<Dataset> {
    const dataset = await this.get(teamId, datasetId);
    dataset.deletedAt = new Date();
    dataset.deletedBy = actor.label;
    await dataset.save();
    return dataset;
  }

  /**
   * Loads the named columns of a dataset for a fit. Unknown names are a 422 naming each; the caller
   * decides what to do with text columns and missing values.
   */
  async loadColumns(teamId: string, datasetId: string, names: string[], pointer = '#/columns'): Promise<LoadedDataset> {
    const dataset = await this.get(teamId, datasetId, '#/data/datasetId');
    const index = new Map<string, { column: StoredColumn; position: number }>();
    dataset.columns.forEach((column, position) => index.set(column.name, { column, position }));
    const unknown = names.filter((name) => !index.has(name));
    if (unknown.length > 0) {
      throw new ProblemException(
        PROBLEM_TYPES.unprocessable,
        `Dataset "${dataset.name}" v${dataset.version} has no column ${unknown.map((n) => `"${n}"`).join(', ')}. ` +
          `Its columns are: ${dataset.columns.map((c) => c.name).join(', ')}.`,
        unknown.map((name) => ({ pointer, detail: `unknown column "${name}"` })),
        { code: 'unknown-column' },
      );
    }
    const columns = new Map<string, LoadedColumn>();
    for (const name of new Set(names)) {
      const { column, position } = index.get(name) as { column: StoredColumn; position: number };
      columns.set(name, await readColumn(this.sequelize, dataset.id, position, column.kind, Number(dataset.rowCount)));
    }
    return { dataset, columns };
  }
}
