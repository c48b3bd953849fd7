import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import { ENGINE_ERROR_CODES, EngineErrorCode } from '../../engine/errors';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../../engine/functional-forms';
import { FitResultDto } from './fit-result.dto';

/** Where a form stands among the fitted forms on each criterion (1 = best). */
export class FormRanksDto {
  @ApiProperty({ type: 'integer', description: 'Rank by aic, lowest first; a null aic (perfect fit) ranks first.', example: 1 })
  aic: number;

  @ApiProperty({ type: 'integer', description: 'Rank by bic, lowest first; a null bic (perfect fit) ranks first.', example: 1 })
  bic: number;

  @ApiProperty({ type: 'integer', description: 'Rank by rSquared, highest first.', example: 2 })
  rSquared: number;

  @ApiProperty({ type: 'integer', description: 'Rank by residualStandardError, lowest first.', example: 1 })
  residualStandardError: number;
}

/** One fitted form measured on the scale of y (engine: FormCriteria in compare-forms.ts). */
export class FormCriteriaDto {
  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: 'The functional form.', example: 'log-lin' })
  form: FunctionalForm;

  @ApiProperty({
    type: 'integer',
    description: 'Overall rank, 1 = best: the AIC rank (ties keep the request order of forms).',
    example: 1,
  })
  rank: number;

  @ApiProperty({
    type: Number,
    nullable: true,
    description:
      'Gaussian log-likelihood of y itself: for ln-y forms the Jacobian-adjusted value (ln-y log-likelihood − Σ ln y_i), ' +
      'otherwise the fit’s own. Null for a perfect fit.',
    example: 1342.8,
  })
  logLikelihood: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: '−2·logLikelihood + 2k on the scale of y, k = p + 1 (σ counted). Null for a perfect fit.',
    example: -2679.6,
  })
  aic: number | null;

  @ApiProperty({
    type: Number,
    nullable: true,
    description: '−2·logLikelihood + k·ln n on the scale of y, k = p + 1. Null for a perfect fit.',
    example: -2669.7,
  })
  bic: number | null;

  @ApiProperty({
    type: Number,
    description:
      '1 − Σ w_i (y_i − ŷ_i)² / total on the scale of y, ŷ back-transformed with Duan’s smearing for ln-y forms; total ' +
      'centred with an intercept, uncentred without one. Can be negative for a back-transformed fit.',
    example: 0.352,
  })
  rSquared: number;

  @ApiProperty({
    type: Number,
    description: '√(Σ w_i (y_i − ŷ_i)² / (n − p)) on the scale of y, with the same ŷ, in units of the response.',
    example: 0.00141,
  })
  residualStandardError: number;

  @ApiProperty({ type: () => FormRanksDto, description: 'Rank on each criterion among the fitted forms.' })
  ranks: FormRanksDto;
}

/** A requested form that could not be fitted (engine: SkippedForm). */
export class SkippedFormDto {
  @ApiProperty({ enum: FUNCTIONAL_FORMS, description: 'The functional form.', example: 'log-log' })
  form: FunctionalForm;

  @ApiProperty({
    enum: ENGINE_ERROR_CODES,
    description:
      'Engine error code that stopped it, for example non-positive-log-argument (a log of a value ≤ 0) or collinear-columns ' +
      '(predictors that become collinear after taking logs).',
    example: 'non-positive-log-argument',
  })
  code: EngineErrorCode;

  @ApiProperty({
    description: 'Human-readable explanation.',
    example: 'Column "ticket_size" needs a natural log for this form, but row 17 (0-based) holds 0, which is not positive.',
  })
  message: string;

  @ApiPropertyOptional({ description: 'Offending column, when the error names one.', example: 'ticket_size' })
  column?: string;

  @ApiPropertyOptional({ type: 'integer', description: 'Offending row (0-based), when the error names one.', example: 17 })
  row?: number;
}

/** Every allowed functional form fitted and ranked on criteria comparable across forms (engine: FormComparison). */
@ApiExtraModels(FitResultDto)
export class FormComparisonResultDto {
  @ApiProperty({
    enum: ['aic'],
    description: 'The criterion behind rank: AIC on the scale of y, lower is better.',
    example: 'aic',
  })
  rankedBy: 'aic';

  @ApiProperty({ type: [FormCriteriaDto], description: 'One entry per fitted form, best first.' })
  criteria: FormCriteriaDto[];

  @ApiProperty({
    type: 'object',
    additionalProperties: { $ref: getSchemaPath(FitResultDto) },
    description: 'Each fitted form’s full result (on its own model scale), keyed by form name (lin-lin, log-lin, lin-log, log-log).',
  })
  fits: Partial<Record<FunctionalForm, FitResultDto>>;

  @ApiProperty({ type: [SkippedFormDto], description: 'Requested forms that could not be fitted, with the error that stopped each.' })
  skipped: SkippedFormDto[];
}
