import { Body, Controller, Get, Param, Post, Req } from '@nestjs/common';
import {
  ApiBody,
  ApiConsumes,
  ApiCreatedResponse,
  ApiExtraModels,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiPayloadTooLargeResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
  getSchemaPath,
} from '@nestjs/swagger';
import type { FastifyRequest } from 'fastify';
import { ARROW_REQUEST_METADATA_KEY, ARROW_STREAM_CONTENT_TYPE } from '../common/body-parsers/arrow-body';
import { CurrentPrincipal, Idempotent, PublicApi } from '../common/public-api/public-api.decorators';
import { PublicPrincipal } from '../common/public-api/public-principal';
import { CreateBatchFitDto } from './dto/batch-fit.dto';
import { CompareFormsDto } from './dto/compare-forms.dto';
import { CreateFitDto } from './dto/create-fit.dto';
import { CreatePredictionDto } from './dto/create-prediction.dto';
import {
  BatchFitResponseDto,
  FitResponseDto,
  FormComparisonResponseDto,
  PredictionResponseDto,
  RollingFitResponseDto,
  StoredResultResponseDto,
} from './dto/responses.dto';
import { CreateRollingFitDto } from './dto/rolling-fit.dto';
import { RegressionService } from './regression.service';

const ENGINE_REJECTION =
  'The data do not allow the model (problem details with `code`, e.g. collinear-columns, constant-column, non-positive-log-argument, too-few-observations, missing-values, unknown-column; `errors` point at the field or data cell).';

/** Documents the JSON body plus the compact Arrow IPC alternative for one request DTO. */
function JsonOrArrowBody(dto: new () => object) {
  return (target: object, key: string | symbol, descriptor: PropertyDescriptor) => {
    ApiExtraModels(dto)(target, key, descriptor);
    ApiConsumes('application/json', ARROW_STREAM_CONTENT_TYPE)(target, key, descriptor);
    ApiBody({
      description:
        `JSON, or an Apache Arrow IPC stream (${ARROW_STREAM_CONTENT_TYPE}) whose columns are the data and whose schema metadata ` +
        `"${ARROW_REQUEST_METADATA_KEY}" holds the rest of the request as JSON (without data.columns).`,
      schema: { $ref: getSchemaPath(dto) },
    })(target, key, descriptor);
  };
}

@ApiTags('regression')
@Controller('v1')
export class RegressionController {
  constructor(private readonly regression: RegressionService) {}

  @Post('fits')
  @PublicApi('fits:run')
  @Idempotent()
  @JsonOrArrowBody(CreateFitDto)
  @ApiOperation({
    operationId: 'createFit',
    summary: 'Fit a least-squares model',
    description:
      'Estimates the model on inline columns or a stored dataset and returns the full result: coefficients (classical), ANOVA, ' +
      'R², standard error of estimate, information criteria, effects in the form’s units, the inference block under the chosen ' +
      'covariance (with a Wald test of all slopes) and the assumption checks. The result is stored: fetch it again with ' +
      '`GET /v1/results/{resultId}`; `inputHash` and `engineVersion` identify exactly what was computed.',
  })
  @ApiCreatedResponse({ type: FitResponseDto })
  @ApiUnprocessableEntityResponse({ description: ENGINE_REJECTION })
  @ApiPayloadTooLargeResponse({ description: 'Body larger than the limit (64 MiB by default): store the data as a dataset or use the Arrow body.' })
  async createFit(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CreateFitDto, @Req() request: FastifyRequest) {
    return this.regression.fit({ principal, requestId: String(request.id) }, body);
  }

  @Post('form-comparisons')
  @PublicApi('fits:run')
  @Idempotent()
  @JsonOrArrowBody(CompareFormsDto)
  @ApiOperation({
    operationId: 'compareForms',
    summary: 'Fit and rank the functional forms',
    description:
      'Fits every requested form the data allow (lin-lin, log-lin, lin-log, log-log) and ranks them on criteria comparable across ' +
      'a transformed response: AIC and BIC of y itself (the log-likelihood of a ln y model is Jacobian-adjusted by −Σ ln y), ' +
      'and R² and the standard error recomputed on the original scale. Forms the data do not allow are listed with the reason.',
  })
  @ApiCreatedResponse({ type: FormComparisonResponseDto })
  @ApiUnprocessableEntityResponse({ description: ENGINE_REJECTION })
  async compareForms(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CompareFormsDto, @Req() request: FastifyRequest) {
    return this.regression.compareForms({ principal, requestId: String(request.id) }, body);
  }

  @Post('predictions')
  @PublicApi('fits:run')
  @Idempotent()
  @JsonOrArrowBody(CreatePredictionDto)
  @ApiOperation({
    operationId: 'createPrediction',
    summary: 'Predict at new predictor values',
    description:
      'From a stored fit (`fitId`) or an inline specification (`data` + `model`). Each point gets the fitted value with a ' +
      'confidence interval for the mean and a prediction interval for a new observation, on the model’s scale and, for log-y ' +
      'forms, back on the original scale (the median exp(ŷ), the normal-theory mean and Duan’s smeared mean).',
  })
  @ApiCreatedResponse({ type: PredictionResponseDto })
  @ApiNotFoundResponse({ description: 'Unknown fitId for this team (problem details).' })
  @ApiUnprocessableEntityResponse({ description: `${ENGINE_REJECTION} Also: a point with the wrong number of values, or a non-positive value under a log form.` })
  async createPrediction(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CreatePredictionDto, @Req() request: FastifyRequest) {
    return this.regression.predict({ principal, requestId: String(request.id) }, body);
  }

  @Post('batch-fits')
  @PublicApi('fits:run')
  @Idempotent()
  @JsonOrArrowBody(CreateBatchFitDto)
  @ApiOperation({
    operationId: 'createBatchFit',
    summary: 'Fit many responses against one set of predictors',
    description:
      'One shared factorisation of the predictors, then each response’s full coefficient table, R² and F-test. A response the ' +
      'data do not allow (constant, non-finite, log of a non-positive value) is reported in its own entry; the rest are fitted.',
  })
  @ApiCreatedResponse({ type: BatchFitResponseDto })
  @ApiUnprocessableEntityResponse({ description: ENGINE_REJECTION })
  async createBatchFit(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CreateBatchFitDto, @Req() request: FastifyRequest) {
    return this.regression.batchFit({ principal, requestId: String(request.id) }, body);
  }

  @Post('rolling-fits')
  @PublicApi('fits:run')
  @Idempotent()
  @JsonOrArrowBody(CreateRollingFitDto)
  @ApiOperation({
    operationId: 'createRollingFit',
    summary: 'Rolling-window fits over a time-ordered series',
    description:
      'Refits the model in every window of `window` rows, moving `step` rows at a time, with updating cross-products (the cost ' +
      'grows with the series length, not length × window). Returns the coefficient path with classical standard errors, R² and ' +
      'the standard error of estimate per window.',
  })
  @ApiCreatedResponse({ type: RollingFitResponseDto })
  @ApiUnprocessableEntityResponse({ description: `${ENGINE_REJECTION} Also: a window longer than the series.` })
  async createRollingFit(@CurrentPrincipal() principal: PublicPrincipal, @Body() body: CreateRollingFitDto, @Req() request: FastifyRequest) {
    return this.regression.rollingFit({ principal, requestId: String(request.id) }, body);
  }

  @Get('results/:resultId')
  @PublicApi('fits:run')
  @ApiOperation({
    operationId: 'getResult',
    summary: 'Fetch a stored result again',
    description:
      'Any billable answer (fit, comparison, prediction, batch or rolling fit) as it was stored, with its specification and input ' +
      'hash. Per-row arrays of fits over more than 100,000 rows, and paths of rolling fits with more than 100,000 windows, are not kept.',
  })
  @ApiOkResponse({ type: StoredResultResponseDto })
  @ApiNotFoundResponse({ description: 'No such result for this team (problem details).' })
  async getResult(@CurrentPrincipal() principal: PublicPrincipal, @Param('resultId') resultId: string, @Req() request: FastifyRequest) {
    const stored = await this.regression.getResult({ principal, requestId: String(request.id) }, resultId);
    return {
      id: stored.id,
      kind: stored.kind,
      createdAt: stored.createdAt.toISOString(),
      engineVersion: stored.engineVersion,
      inputHash: stored.inputHash,
      requestId: stored.requestId,
      specification: stored.specification,
      ...stored.result,
    };
  }
}
