import { Body, Controller, Delete, Get, HttpCode, Inject, Param, Post, Query, Req, Res } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import {
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { Readable } from 'node:stream';
import { AuditService } from '../audit/audit.service';
import { CSV_CONTENT_TYPES } from '../common/body-parsers/register-body-parsers';
import { nextPageLink } from '../common/pagination/cursor';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { CurrentPrincipal, Idempotent, PublicApi } from '../common/public-api/public-api.decorators';
import { PublicPrincipal } from '../common/public-api/public-principal';
import { appConfig } from '../config/configuration';
import { toDatasetDto } from './dataset-response';
import { DatasetsService } from './datasets.service';
import { CreateDatasetDto, UploadCsvQueryDto } from './dto/create-dataset.dto';
import { DatasetDto, DatasetListDto, DatasetRowsDto } from './dto/dataset.dto';
import { ListDatasetsQueryDto, ReadRowsQueryDto } from './dto/list-datasets-query.dto';

function actorLabel(principal: PublicPrincipal): string {
  return principal.keyId ? `key:${principal.keyId}` : `user:${principal.userId ?? 'unknown'}`;
}

/** Counts bytes of a streamed body and stops it with 413 past the upload limit. */
async function* limitBytes(source: AsyncIterable<Buffer>, limit: number): AsyncIterable<Buffer> {
  let total = 0;
  for await (const chunk of source) {
    total += chunk.byteLength;
    if (total > limit) {
      throw new ProblemException(
        PROBLEM_TYPES.payloadTooLarge,
        `The upload is larger than the limit of ${limit} bytes (LEASTLINE_UPLOAD_LIMIT_BYTES).`,
      );
    }
    yield chunk;
  }
}

@ApiTags('datasets')
@Controller('v1/datasets')
export class DatasetsController {
  constructor(
    private readonly datasets: DatasetsService,
    private readonly audit: AuditService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  @Post()
  @PublicApi('datasets:write')
  @Idempotent()
  @ApiOperation({
    operationId: 'createDataset',
    summary: 'Store a dataset from JSON columns or rows',
    description:
      'Stores a new immutable version of the named dataset. Numeric columns are detected (every non-empty value a number); ' +
      'null or "" is a missing value. The answer carries per-column summaries and the content hash.',
  })
  @ApiCreatedResponse({ type: DatasetDto })
  @ApiUnprocessableEntityResponse({ description: 'Unequal column lengths, no rows, non-finite numbers (problem details).' })
  async create(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CreateDatasetDto): Promise<DatasetDto> {
    const hasColumns = body.columns !== undefined;
    const hasRows = body.rows !== undefined;
    if (hasColumns === hasRows) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'Send exactly one of `columns` or `rows`.', [
        { pointer: hasColumns ? '#/rows' : '#/columns', detail: 'exactly one of columns or rows is required' },
      ]);
    }
    const columns = hasColumns ? this.checkColumns(body.columns ?? {}) : rowsToColumns(body.rows ?? []);
    const dataset = await this.datasets.createFromColumns(principal.teamId, { label: actorLabel(principal) }, body.name, columns);
    return toDatasetDto(dataset);
  }

  @Post('csv')
  @PublicApi('datasets:write')
  @Idempotent()
  @ApiOperation({
    operationId: 'uploadDatasetCsv',
    summary: 'Upload a CSV file as a dataset',
    description:
      'Send the file as `multipart/form-data` (one part named `file`) or as the raw body with `Content-Type: text/csv`. ' +
      'The first line is the header; UTF-8 (a byte-order mark is ignored); comma-separated unless `delimiter` says otherwise; ' +
      'empty cells are missing values. Files are streamed: up to LEASTLINE_UPLOAD_LIMIT_BYTES (2 GiB by default), answered ' +
      'with 413 beyond it. Data rows in error messages are numbered from 1 (the header is not counted).',
  })
  @ApiConsumes('multipart/form-data', 'text/csv')
  @ApiBody({
    description: 'The CSV file (multipart part `file`, or the whole body as text/csv).',
    schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } },
  })
  @ApiCreatedResponse({ type: DatasetDto })
  @ApiPayloadTooLargeResponse({ description: 'The file exceeds the upload limit (problem details).' })
  @ApiUnprocessableEntityResponse({
    description:
      'Empty file, missing or duplicate header names, wrong delimiter, a row with the wrong number of fields, not UTF-8 (problem details with `code` and `rows`).',
  })
  async uploadCsv(
    @CurrentPrincipal() principal: PublicPrincipal,
    @Query() query: UploadCsvQueryDto,
    @Req() request: FastifyRequest,
  ): Promise<DatasetDto> {
    const limit = this.app.uploadLimitBytes;
    let source: AsyncIterable<Buffer>;
    if (request.isMultipart()) {
      // The byte counter below answers 413 at the limit; the plugin's own cap sits just above it as a backstop.
      const part = await request.file({ limits: { fileSize: limit + 1 } });
      if (!part) {
        throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'The multipart body has no file part.', [
          { pointer: '#/file', detail: 'missing file part' },
        ]);
      }
      source = limitBytes(part.file, limit);
    } else if (CSV_CONTENT_TYPES.includes(String(request.headers['content-type'] ?? '').split(';')[0]?.trim() ?? '')) {
      source = limitBytes(request.body as Readable, limit);
    } else {
      throw new ProblemException(PROBLEM_TYPES.unsupportedMediaType, 'Send the CSV as multipart/form-data (part `file`) or as text/csv.');
    }
    const dataset = await this.datasets.createFromCsv(
      principal.teamId,
      { label: actorLabel(principal) },
      query.name,
      query.delimiter ?? ',',
      source,
    );
    return toDatasetDto(dataset);
  }

  @Get()
  @PublicApi('datasets:read')
  @ApiOperation({
    operationId: 'listDatasets',
    summary: 'List datasets, newest first',
    description: 'Cursor pagination: pass `nextCursor` as `cursor`; the `Link` header (rel="next") carries the same URL.',
  })
  @ApiOkResponse({ type: DatasetListDto })
  async list(
    @CurrentPrincipal() principal: PublicPrincipal,
    @Query() query: ListDatasetsQueryDto,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<DatasetListDto> {
    const limit = query.limit ?? 25;
    const page = await this.datasets.list(principal.teamId, { cursor: query.cursor, limit, name: query.name });
    if (page.nextCursor) {
      void reply.header(
        'Link',
        nextPageLink(this.app.publicUrl, '/v1/datasets', { cursor: page.nextCursor, limit: String(limit), name: query.name }),
      );
    }
    return { items: page.items.map(toDatasetDto), nextCursor: page.nextCursor };
  }

  @Get(':datasetId')
  @PublicApi('datasets:read')
  @ApiOperation({ operationId: 'getDataset', summary: 'A dataset’s metadata and column summaries' })
  @ApiOkResponse({ type: DatasetDto })
  @ApiNotFoundResponse({ description: 'No such dataset for this team (problem details).' })
  async get(@CurrentPrincipal() principal: PublicPrincipal, @Param('datasetId') datasetId: string): Promise<DatasetDto> {
    return toDatasetDto(await this.datasets.get(principal.teamId, datasetId));
  }

  @Get(':datasetId/rows')
  @PublicApi('datasets:read')
  @ApiOperation({ operationId: 'getDatasetRows', summary: 'A page of a dataset’s rows (offset paging; datasets never change)' })
  @ApiOkResponse({ type: DatasetRowsDto })
  @ApiNotFoundResponse({ description: 'No such dataset for this team (problem details).' })
  async rows(
    @CurrentPrincipal() principal: PublicPrincipal,
    @Param('datasetId') datasetId: string,
    @Query() query: ReadRowsQueryDto,
  ): Promise<DatasetRowsDto> {
    const offset = query.offset ?? 0;
    const limit = query.limit ?? 50;
    const page = await this.datasets.readRows(principal.teamId, datasetId, offset, limit);
    return {
      datasetId: page.dataset.id,
      columns: page.dataset.columns.map((column) => column.name),
      offset,
      limit,
      total: page.total,
      rows: page.rows,
    };
  }

  @Delete(':datasetId')
  @HttpCode(204)
  @PublicApi('datasets:write')
  @ApiOperation({
    operationId: 'deleteDataset',
    summary: 'Delete a dataset version',
    description: 'Soft delete: the dataset disappears from listings and cannot be fitted; the team audit log records it.',
  })
  @ApiNoContentResponse({ description: 'Deleted.' })
  @ApiNotFoundResponse({ description: 'No such dataset for this team (problem details).' })
  async remove(@CurrentPrincipal() principal: PublicPrincipal, @Param('datasetId') datasetId: string, @Req() request: FastifyRequest) {
    const dataset = await this.datasets.remove(principal.teamId, datasetId, { label: actorLabel(principal) });
    await this.audit.record({
      teamId: principal.teamId,
      action: 'dataset.deleted',
      actor: { keyId: principal.keyId, userId: principal.userId ?? null, ipAddress: request.ip },
      target: { type: 'dataset', id: dataset.id },
      details: { name: dataset.name, version: dataset.version, contentHash: dataset.contentHash },
    });
  }

  private checkColumns(columns: Record<string, unknown>): Record<string, (number | string | null)[]> {
    for (const [name, values] of Object.entries(columns)) {
      if (!Array.isArray(values) || values.some((value) => value !== null && typeof value !== 'number' && typeof value !== 'string')) {
        throw new ProblemException(PROBLEM_TYPES.invalidRequest, `Column "${name}" must be an array of numbers, strings or null.`, [
          { pointer: `#/columns/${name}`, detail: 'must be an array of numbers, strings or null' },
        ]);
      }
    }
    return columns as Record<string, (number | string | null)[]>;
  }
}

/** Rows of objects → columns; the first row names the columns and later rows may not add new ones. */
function rowsToColumns(rows: Record<string, unknown>[]): Record<string, (number | string | null)[]> {
  const first = rows[0];
  if (!first || typeof first !== 'object') {
    throw new ProblemException(PROBLEM_TYPES.invalidRequest, '`rows` must hold at least one object.', [
      { pointer: '#/rows', detail: 'no rows' },
    ]);
  }
  const names = Object.keys(first);
  const columns: Record<string, (number | string | null)[]> = Object.fromEntries(names.map((name) => [name, []]));
  rows.forEach((row, index) => {
    if (!row || typeof row !== 'object' || Array.isArray(row)) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, `Row ${index} is not an object.`, [{ pointer: `#/rows/${index}`, detail: 'not an object' }]);
    }
    const extra = Object.keys(row).find((key) => !(key in columns));
    if (extra !== undefined) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, `Row ${index} has a field "${extra}" that the first row does not.`, [
        { pointer: `#/rows/${index}/${extra}`, detail: 'unknown field' },
      ]);
    }
    for (const name of names) {
      const value = (row as Record<string, unknown>)[name];
      if (value !== undefined && value !== null && typeof value !== 'number' && typeof value !== 'string') {
        throw new ProblemException(PROBLEM_TYPES.invalidRequest, `Row ${index} field "${name}" must be a number, a string or null.`, [
          { pointer: `#/rows/${index}/${name}`, detail: 'must be a number, a string or null' },
        ]);
      }
      (columns[name] as (number | string | null)[]).push((value ?? null) as number | string | null);
    }
  });
  return columns;
}
