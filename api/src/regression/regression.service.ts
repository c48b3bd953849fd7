import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { randomUUID } from 'node:crypto';
import { Sequelize } from 'sequelize-typescript';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { PublicPrincipal } from '../common/public-api/public-principal';
import { DatasetsService } from '../datasets/datasets.service';
import { rollingModels } from '../usage/billable-units';
import { UsageService } from '../usage/usage.service';
import { CompareFormsDto } from './dto/compare-forms.dto';
import { CreateBatchFitDto } from './dto/batch-fit.dto';
import { CreateFitDto } from './dto/create-fit.dto';
import { CreatePredictionDto } from './dto/create-prediction.dto';
import { ComparedModelDto } from './dto/compare-forms.dto';
import { CovarianceChoiceDto, DataSourceDto, ModelSpecDto } from './dto/model-request.dto';
import { CreateRollingFitDto } from './dto/rolling-fit.dto';
import { fitAndAnalyse, fitBatch, fitRolling, predictAt, predictionModelFor, PredictionModel } from './engine/analyse-model';
import type { CovarianceOption } from './engine/analyse-model';
import { compareForms } from './engine/compare-forms';
import { FitInput, predictorEntryColumn } from './engine/fit-input';
import type { PredictorEntry } from './engine/fit-input';
import { ENGINE_VERSION } from './engine/version';
import { runEngine } from './engine-problem';
import { inputHash } from './input-hash';
import { ColumnRequirement, PreparedData, prepareModelData, RawColumn } from './model-data';
import { StoredResult } from './models/stored-result.model';
import { RESULT_CAUTION } from './result-caution';

export type ResultKind = 'fit' | 'form-comparison' | 'prediction' | 'batch-fit' | 'rolling-fit';

/** Per-row arrays are kept in the stored copy only up to this many rows (answers always carry them). */
export const STORED_OBSERVATIONS_LIMIT = 100_000;
/** Per-row arrays in an answer: six numbers a row, so a million rows is already a large JSON answer. */
export const OBSERVATIONS_ANSWER_LIMIT = 1_000_000;

export interface CallContext {
  principal: PublicPrincipal;
  requestId: string;
}

export interface SourceDescription {
  kind: 'inline' | 'dataset';
  datasetId?: string;
  datasetName?: string;
  datasetVersion?: number;
  datasetContentHash?: string;
}

export interface RowAccounting {
  total: number;
  used: number;
  droppedCount: number;
  /** First 100 dropped rows (0-based). */
  dropped: number[];
}

interface StoredPredictionModel extends Omit<PredictionModel, 'coefficients' | 'covariance'> {
  coefficients: number[];
  covariance: number[][];
}

const DATA_POINTER = '#/data/columns';

/**
 * The public regression operations. Each call: load the data (inline or a stored dataset), apply the
 * missing-value policy, run the engine, then store the result and write its usage record in one
 * transaction (so a result exists exactly when its usage does).
 */
@Injectable()
export class RegressionService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(StoredResult) private readonly results: typeof StoredResult,
    private readonly datasets: DatasetsService,
    private readonly usage: UsageService,
  ) {}

  async fit(context: CallContext, body: CreateFitDto) {
    const model = body.model;
    const requirements = this.requirements(model.response, model.predictors, model.weights, body.covariance);
    const { data, source } = await this.loadData(context, body.data, requirements, body.missingValues ?? 'reject');
    if (body.includeObservations && data.rowsUsed > OBSERVATIONS_ANSWER_LIMIT) {
      throw new ProblemException(
        PROBLEM_TYPES.invalidRequest,
        `Per-row results are returned for fits of up to ${OBSERVATIONS_ANSWER_LIMIT.toLocaleString('en')} rows; this fit uses ${data.rowsUsed.toLocaleString('en')}. ` +
          'Leave includeObservations off (the diagnostics summarise the residuals).',
        [{ pointer: '#/includeObservations', detail: `allowed up to ${OBSERVATIONS_ANSWER_LIMIT} rows` }],
      );
    }
    const engineInput = { ...fitInputOf(model, data, body.confidenceLevel), includeObservations: body.includeObservations ?? false };
    const covariance = this.covarianceOption(body.covariance, data);
    const diagnostics = body.diagnostics === 'none' ? [] : (body.diagnostics ?? 'all');
    const { fit, analysis, snapshot } = runEngine(
      () =>
        fitAndAnalyse({
          ...engineInput,
          ...(covariance ? { covariance } : {}),
          diagnostics,
          significanceLevel: body.significanceLevel,
          diagnosticOptions: body.diagnosticOptions,
        }),
      DATA_POINTER,
    );
    const { diagnostics: diagnosticsBlock, ...inferenceBlock } = analysis;
    const specification = this.specificationOf(body);
    const answer = {
      source,
      rows: this.rowAccounting(data),
      specification,
      fit,
      inference: inferenceBlock,
      diagnostics: diagnosticsBlock,
      caution: RESULT_CAUTION,
    };
    const stored = data.rowsUsed > STORED_OBSERVATIONS_LIMIT && fit.observations ? { ...answer, fit: { ...fit, observations: undefined } } : answer;
    return this.store(context, 'fit', 'fits', { models: 1, observations: data.rowsUsed }, specification, data, answer, stored, {
      predictionModel: this.serialiseModel(snapshot.model),
      confidenceLevel: snapshot.confidenceLevel,
      covariance: snapshot.covariance,
    });
  }

  async getResult(context: CallContext, resultId: string) {
    const stored = /^[0-9a-f-]{36}$/i.test(resultId) ? await this.results.findOne({ where: { id: resultId, teamId: context.principal.teamId } }) : null;
    if (!stored) {
      throw new ProblemException(PROBLEM_TYPES.notFound, `No stored result with id "${resultId}" exists for this team.`, [
        { pointer: '#/resultId', detail: 'unknown result' },
      ]);
    }
    return stored;
  }

  async compareForms(context: CallContext, body: CompareFormsDto) {
    const model = body.model;
    const requirements = this.requirements(model.response, model.predictors, model.weights);
    const { data, source } = await this.loadData(context, body.data, requirements, body.missingValues ?? 'reject');
    const comparison = runEngine(
      () =>
        compareForms({ ...fitInputOf(model, data, body.confidenceLevel), ...(body.forms ? { forms: body.forms } : {}) }),
      DATA_POINTER,
    );
    const specification = this.specificationOf(body);
    const answer = { source, rows: this.rowAccounting(data), specification, comparison, caution: RESULT_CAUTION };
    const models = Object.keys(comparison.fits).length;
    return this.store(context, 'form-comparison', 'form-comparisons', { models, observations: data.rowsUsed * models }, specification, data, answer);
  }

  async predict(context: CallContext, body: CreatePredictionDto) {
    if (body.fitId !== undefined && (body.data !== undefined || body.model !== undefined)) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'Send either fitId, or data and model — not both.', [
        { pointer: '#/fitId', detail: 'not allowed together with data/model' },
      ]);
    }
    if (body.fitId !== undefined) return this.predictFromStoredFit(context, body);
    const model = body.model as NonNullable<CreatePredictionDto['model']>;
    const requirements = this.requirements(model.response, model.predictors, model.weights, body.covariance);
    const { data, source } = await this.loadData(context, body.data as DataSourceDto, requirements, body.missingValues ?? 'reject');
    const covariance = this.covarianceOption(body.covariance, data);
    const snapshot = runEngine(
      () =>
        predictionModelFor({ ...fitInputOf(model, data, body.confidenceLevel), ...(covariance ? { covariance } : {}) }),
      DATA_POINTER,
    );
    const prediction = runEngine(() => predictAt(snapshot.model, body.points, snapshot.confidenceLevel), DATA_POINTER);
    const specification = this.specificationOf(body);
    const answer = { source, rows: this.rowAccounting(data), specification, covariance: snapshot.covariance, prediction, caution: RESULT_CAUTION };
    return this.store(context, 'prediction', 'predictions', { models: 1, observations: data.rowsUsed + body.points.length }, specification, data, answer);
  }

  private async predictFromStoredFit(context: CallContext, body: CreatePredictionDto) {
    const stored = await this.getResult(context, body.fitId as string);
    const snapshot = stored.modelSnapshot as
      | { predictionModel: StoredPredictionModel; confidenceLevel: number; covariance: unknown }
      | null;
    if (stored.kind !== 'fit' || !snapshot) {
      throw new ProblemException(PROBLEM_TYPES.unprocessable, `Result "${stored.id}" is a ${stored.kind}, not a fit; predict from a fit id.`, [
        { pointer: '#/fitId', detail: 'not a fit' },
      ]);
    }
    const model: PredictionModel = {
      ...snapshot.predictionModel,
      coefficients: Float64Array.from(snapshot.predictionModel.coefficients),
      covariance: snapshot.predictionModel.covariance.map((row) => Float64Array.from(row)),
    };
    const level = body.confidenceLevel ?? snapshot.confidenceLevel;
    const prediction = runEngine(() => predictAt(model, body.points, level), DATA_POINTER);
    const specification = this.specificationOf(body);
    const answer = {
      source: { kind: 'stored-fit', fitId: stored.id, fitInputHash: stored.inputHash },
      specification,
      covariance: snapshot.covariance,
      prediction,
      caution: RESULT_CAUTION,
    };
    const data: PreparedData = { numeric: {}, labels: {}, rowsUsed: 0, rowsDropped: [], rowsTotal: 0 };
    return this.store(context, 'prediction', 'predictions', { models: 0, observations: body.points.length }, specification, data, answer, answer, null, {
      points: body.points,
      fitId: stored.id,
    });
  }

  async batchFit(context: CallContext, body: CreateBatchFitDto) {
    const requirements: ColumnRequirement[] = [
      ...body.responses.map((name, index) => ({ name, pointer: `#/responses/${index}`, kind: 'numeric' as const })),
      ...body.predictors.map((name, index) => ({ name, pointer: `#/predictors/${index}`, kind: 'numeric' as const })),
    ];
    const { data, source } = await this.loadData(context, body.data, dedupe(requirements), body.missingValues ?? 'reject');
    const batch = runEngine(
      () =>
        fitBatch({
          columns: data.numeric,
          responses: body.responses,
          predictors: body.predictors,
          intercept: body.intercept ?? true,
          form: body.form ?? 'lin-lin',
          confidenceLevel: body.confidenceLevel ?? 0.95,
        }),
      DATA_POINTER,
    );
    const specification = this.specificationOf(body);
    const answer = { source, rows: this.rowAccounting(data), specification, batch, caution: RESULT_CAUTION };
    return this.store(
      context,
      'batch-fit',
      'batch-fits',
      { models: body.responses.length, observations: data.rowsUsed * body.responses.length },
      specification,
      data,
      answer,
    );
  }

  async rollingFit(context: CallContext, body: CreateRollingFitDto) {
    const model = body.model;
    if ((body.missingValues ?? 'reject') === 'drop-rows') {
      throw new ProblemException(
        PROBLEM_TYPES.invalidRequest,
        'Rolling fits need every row in time order: missingValues must be "reject" (fill gaps before sending).',
        [{ pointer: '#/missingValues', detail: 'only "reject" is allowed for rolling fits' }],
      );
    }
    const powerTerm = model.predictors.findIndex((entry) => typeof entry !== 'string');
    if (powerTerm >= 0) {
      throw new ProblemException(
        PROBLEM_TYPES.invalidRequest,
        'Rolling fits take plain columns as predictors; power terms are available in fits and predictions.',
        [{ pointer: `#/model/predictors/${powerTerm}`, detail: 'a power term is not allowed in a rolling fit' }],
      );
    }
    const requirements = this.requirements(model.response, model.predictors);
    const { data, source } = await this.loadData(context, body.data, requirements, 'reject');
    const rolling = runEngine(
      () =>
        fitRolling({
          columns: data.numeric,
          response: model.response,
          predictors: model.predictors as string[],
          intercept: model.intercept ?? true,
          form: model.form ?? 'lin-lin',
          window: body.window,
          step: body.step ?? 1,
        }),
      DATA_POINTER,
    );
    const specification = this.specificationOf(body);
    const answer = { source, rows: this.rowAccounting(data), specification, rolling, caution: RESULT_CAUTION };
    const stored =
      rolling.windowCount > STORED_OBSERVATIONS_LIMIT
        ? { ...answer, rolling: { ...rolling, coefficientPath: [], windowStart: [], residualStandardError: [], rSquared: [], pathOmitted: true } }
        : answer;
    return this.store(
      context,
      'rolling-fit',
      'rolling-fits',
      { models: rollingModels(rolling.windowCount), observations: data.rowsUsed },
      specification,
      data,
      answer,
      stored,
    );
  }

  private requirements(response: string, predictors: PredictorEntry[], weights?: string, covariance?: CovarianceChoiceDto): ColumnRequirement[] {
    const list: ColumnRequirement[] = [
      { name: response, pointer: '#/model/response', kind: 'numeric' },
      ...predictors.map((entry, index) => ({
        name: predictorEntryColumn(entry),
        pointer: typeof entry === 'string' ? `#/model/predictors/${index}` : `#/model/predictors/${index}/column`,
        kind: 'numeric' as const,
      })),
    ];
    if (weights) list.push({ name: weights, pointer: '#/model/weights', kind: 'numeric' });
    if (covariance?.type === 'cluster' && covariance.groupColumn) {
      list.push({ name: covariance.groupColumn, pointer: '#/covariance/groupColumn', kind: 'label' });
    }
    return dedupe(list);
  }

  private covarianceOption(choice: CovarianceChoiceDto | undefined, data: PreparedData): CovarianceOption | undefined {
    if (!choice) return undefined;
    const option: CovarianceOption = { type: choice.type };
    if (choice.lag !== undefined) option.lag = choice.lag;
    if (choice.smallSampleCorrection !== undefined) option.smallSampleCorrection = choice.smallSampleCorrection;
    if (choice.type === 'cluster' && choice.groupColumn) option.groups = data.labels[choice.groupColumn] ?? [];
    return option;
  }

  private async loadData(
    context: CallContext,
    source: DataSourceDto,
    requirements: ColumnRequirement[],
    policy: 'reject' | 'drop-rows',
  ): Promise<{ data: PreparedData; source: SourceDescription }> {
    if (source.columns !== undefined && source.datasetId !== undefined) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'Send either data.columns or data.datasetId, not both.', [
        { pointer: '#/data/datasetId', detail: 'not allowed together with columns' },
      ]);
    }
    if (source.datasetId !== undefined) {
      const loaded = await this.datasets.loadColumns(
        context.principal.teamId,
        source.datasetId,
        requirements.map((requirement) => requirement.name),
        '#/model',
      );
      const columns: Record<string, RawColumn> = Object.fromEntries(loaded.columns);
      return {
        data: prepareModelData(columns, requirements, policy, DATA_POINTER),
        source: {
          kind: 'dataset',
          datasetId: loaded.dataset.id,
          datasetName: loaded.dataset.name,
          datasetVersion: loaded.dataset.version,
          datasetContentHash: loaded.dataset.contentHash,
        },
      };
    }
    const columns = source.columns ?? {};
    for (const [name, values] of Object.entries(columns)) {
      if (!Array.isArray(values) && !((values as unknown) instanceof Float64Array)) {
        throw new ProblemException(PROBLEM_TYPES.invalidRequest, `data.columns.${name} must be an array.`, [
          { pointer: `${DATA_POINTER}/${name}`, detail: 'must be an array of numbers or null' },
        ]);
      }
    }
    return { data: prepareModelData(columns as Record<string, RawColumn>, requirements, policy, DATA_POINTER), source: { kind: 'inline' } };
  }

  private rowAccounting(data: PreparedData): RowAccounting {
    return { total: data.rowsTotal, used: data.rowsUsed, droppedCount: data.rowsDropped.length, dropped: data.rowsDropped.slice(0, 100) };
  }

  /** The request without its data columns: what was asked, for the record and the audit hash. */
  private specificationOf(body: object): Record<string, unknown> {
    const { data, ...rest } = body as { data?: DataSourceDto } & Record<string, unknown>;
    return JSON.parse(JSON.stringify({ ...rest, ...(data?.datasetId ? { data: { datasetId: data.datasetId } } : {}) }));
  }

  private serialiseModel(model: PredictionModel): StoredPredictionModel {
    return { ...model, coefficients: Array.from(model.coefficients), covariance: model.covariance.map((row) => Array.from(row)) };
  }

  private async store(
    context: CallContext,
    kind: ResultKind,
    endpoint: string,
    work: { models: number; observations: number },
    specification: Record<string, unknown>,
    data: PreparedData,
    answer: Record<string, unknown>,
    storedAnswer: Record<string, unknown> = answer,
    modelSnapshot: Record<string, unknown> | null = null,
    extraHashInput: unknown = undefined,
  ) {
    const id = randomUUID();
    const hash = inputHash({ specification, extra: extraHashInput ?? null }, data.numeric, data.labels);
    const createdAt = new Date();
    const envelope = { id, kind, createdAt: createdAt.toISOString(), engineVersion: ENGINE_VERSION, inputHash: hash, requestId: context.requestId };
    const usage = await this.sequelize.transaction(async (transaction) => {
      await this.results.create(
        {
          id,
          teamId: context.principal.teamId,
          kind,
          engineVersion: ENGINE_VERSION,
          inputHash: hash,
          specification,
          result: storedAnswer,
          modelSnapshot,
          requestId: context.requestId,
          apiKeyId: context.principal.keyId,
          createdAt,
        },
        { transaction },
      );
      return this.usage.record(
        { teamId: context.principal.teamId, apiKeyId: context.principal.keyId, endpoint, requestId: context.requestId, resultId: id, ...work },
        transaction,
      );
    });
    return { ...envelope, usage: { units: usage.units, observations: work.observations }, ...answer };
  }
}

/** The engine's fit input for a model specification and prepared columns (request defaults applied). */
function fitInputOf(model: ModelSpecDto | ComparedModelDto, data: PreparedData, confidenceLevel: number | undefined): FitInput {
  return {
    columns: data.numeric,
    response: model.response,
    predictors: model.predictors,
    intercept: model.intercept ?? true,
    ...(model.weights ? { weights: model.weights } : {}),
    ...('form' in model && model.form ? { form: model.form } : {}),
    confidenceLevel: confidenceLevel ?? 0.95,
  };
}

function dedupe(requirements: ColumnRequirement[]): ColumnRequirement[] {
  const seen = new Set<string>();
  return requirements.filter((requirement) => (seen.has(requirement.name) ? false : (seen.add(requirement.name), true)));
}
