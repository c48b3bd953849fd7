import { ApiExtraModels, ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { ENGINE_ERROR_CODES, EngineErrorCode } from '../../engine/errors';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../../engine/functional-forms';
import { CoefficientRowDto, WaldTestDto } from './coefficient-inference.dto';
import { FORM_DESCRIPTION } from './fit-result.dto';

/** One response fitted against the shared predictors (engine: BatchResponseFit in batch-fit.ts). */
export class BatchResponseFitDto {
  @ApiProperty({ description: 'Response column name.', example: 'chargeback_rate_visa' })
  response: string;

  @ApiProperty({ enum: ['fitted'], description: 'The response was fitted.', example: 'fitted' })
  status: 'fitted';

  @ApiProperty({
    type: [CoefficientRowDto],
    description: 'Classical coefficient table: covariance s²(X′X)⁻¹, s² = RSS/(n − p), t on n − p degrees of freedom; in `terms` order.',
  })
  coefficients: CoefficientRowDto[];

  @ApiProperty({ type: Number, description: 'RSS = Σ (y_i − ŷ_i)² on the model’s scale.', example: 0.000398 })
  residualSumOfSquares: number;

  @ApiProperty({ type: Number, description: 's = √(RSS/(n − p)), in units of the response on the model’s scale.', example: 0.00142 })
  residualStandardError: number;

  @ApiProperty({
    type: Number,
    description: '1 − RSS/total: total centred Σ (y − ȳ)² with an intercept, uncentred Σ y² without one.',
    example: 0.351,
  })
  rSquared: number;

  @ApiProperty({
    type: Number,
    description: '1 − (1 − rSquared)·(n − 1)/(n − p) with an intercept, 1 − (1 − rSquared)·n/(n − p) without one. Can be negative.',
    example: 0.3477,
  })
  adjustedRSquared: number;

  @ApiProperty({
    type: () => WaldTestDto,
    nullable: true,
    description:
      'F-test that every slope (every coefficient without an intercept) is 0 under the classical covariance; equal to the ' +
      'analysis-of-variance F. Null when that covariance is not positive definite (a perfect fit).',
  })
  fTest: WaldTestDto | null;
}

/** One response that could not be fitted; the others still are (engine: BatchResponseFailure). */
export class BatchResponseFailureDto {
  @ApiProperty({ description: 'Response column name.', example: 'chargeback_rate_amex' })
  response: string;

  @ApiProperty({ enum: ['failed'], description: 'The response could not be fitted.', example: 'failed' })
  status: 'failed';

  @ApiProperty({
    enum: ENGINE_ERROR_CODES,
    description:
      'Engine error code about this response alone: missing-column, length-mismatch, non-finite-value, non-positive-log-argument (log-y forms) or constant-response.',
    example: 'constant-response',
  })
  code: EngineErrorCode;

  @ApiProperty({ description: 'Human-readable explanation.', example: 'Response "chargeback_rate_amex" does not vary, so R^2 and the F-test are not defined.' })
  message: string;

  @ApiProperty({ type: 'integer', nullable: true, description: 'Offending row (0-based) when the problem is one value; null otherwise.', example: null })
  row: number | null;
}

/** Many responses against one shared set of predictors, factorised once (engine: BatchFitResult). */
@ApiExtraModels(BatchResponseFitDto, BatchResponseFailureDto)
export class BatchFitResultDto {
  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: FORM_DESCRIPTION, example: 'lin-lin' })
  form: FunctionalForm;

  @ApiProperty({ type: 'integer', description: 'n: rows, shared by every response.', example: 200 })
  observationCount: number;

  @ApiProperty({ type: 'integer', description: 'p: coefficients per response, the intercept included.', example: 2 })
  coefficientCount: number;

  @ApiProperty({ type: 'integer', description: 'n − p.', example: 198 })
  residualDegreesOfFreedom: number;

  @ApiProperty({ type: Number, description: 'Level of every confidence interval, strictly between 0 and 1.', example: 0.95 })
  confidenceLevel: number;

  @ApiProperty({
    type: [String],
    description: 'Coefficient names in design order, "(intercept)" first when present; every coefficient table follows it.',
    example: ['(intercept)', 'ticket_size'],
  })
  terms: string[];

  @ApiProperty({
    type: 'array',
    items: { oneOf: [{ $ref: getSchemaPath(BatchResponseFitDto) }, { $ref: getSchemaPath(BatchResponseFailureDto) }] },
    description: 'One entry per response, in request order; status fitted or failed tells them apart.',
  })
  fits: (BatchResponseFitDto | BatchResponseFailureDto)[];
}
