import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { IsStrictlyBetween } from '../../common/validation/is-strictly-between';
import { IsPredictorList, MAX_PREDICTOR_POWER } from '../../common/validation/is-predictor-entry';
import type { PredictorEntry } from '../engine/fit-input';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../engine/functional-forms';
import { MISSING_VALUE_POLICIES, MissingValuePolicy } from '../model-data';

export const MAX_PREDICTORS = 100;

/** Where the numbers come from: inline columns, or a stored dataset (exactly one). */
export class DataSourceDto {
  @ApiPropertyOptional({
    description:
      'Columns by name, each an array of equal length. Numbers; null marks a missing value (see `missingValues`). ' +
      'Group columns for cluster-robust covariance may hold strings.',
    type: 'object',
    additionalProperties: { type: 'array', items: { oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true } },
    example: { chargeback_rate: [0.0041, 0.0062, 0.0055, 0.0089, 0.0102], ticket_size: [18.5, 42.0, 35.2, 77.9, 96.4] },
  })
  @ValidateIf((source: DataSourceDto) => source.datasetId === undefined)
  @IsObject({ message: 'columns must be an object of arrays (or send datasetId instead)' })
  columns?: Record<string, (number | string | null)[]>;

  @ApiPropertyOptional({ format: 'uuid', description: 'Id of a stored dataset of your team (instead of `columns`).' })
  @ValidateIf((source: DataSourceDto) => source.columns === undefined)
  @IsUUID('all', { message: 'datasetId must be a dataset id (UUID) (or send columns instead)' })
  datasetId?: string;
}

export class ModelSpecDto {
  @ApiProperty({ description: 'Response (dependent) column.', example: 'chargeback_rate' })
  @IsString()
  @MaxLength(200)
  response: string;

  @ApiProperty({
    description:
      'Predictors, in order. Each is a column name, or a power term `{ "column": "x", "power": 3 }` whose values ' +
      'Leastline computes from the raw column in extended precision (the coefficient is named `x^3`), so a ' +
      'polynomial keeps the digits that rounding each power before sending would lose. Power terms need the ' +
      'lin-lin or log-lin form; points of a prediction then give one value per distinct column.',
    type: 'array',
    items: {
      oneOf: [
        { type: 'string', minLength: 1, maxLength: 200 },
        {
          type: 'object',
          required: ['column', 'power'],
          additionalProperties: false,
          properties: {
            column: { type: 'string', minLength: 1, maxLength: 200 },
            power: { type: 'integer', minimum: 1, maximum: MAX_PREDICTOR_POWER },
          },
        },
      ],
    },
    example: ['ticket_size', { column: 'ticket_size', power: 2 }],
  })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_PREDICTORS)
  @IsPredictorList()
  predictors: PredictorEntry[];

  @ApiPropertyOptional({
    enum: FUNCTIONAL_FORMS,
    default: 'lin-lin',
    description:
      'lin-lin: y on x. log-lin: ln y on x. lin-log: y on ln x. log-log: ln y on ln x. Logs are natural logs; ' +
      'a non-positive value where a log is needed is an error naming the column and row.',
  })
  @IsOptional()
  @IsIn(FUNCTIONAL_FORMS)
  form?: FunctionalForm;

  @ApiPropertyOptional({ default: true, description: 'Estimate an intercept.' })
  @IsOptional()
  @IsBoolean()
  intercept?: boolean;

  @ApiPropertyOptional({ description: 'Column of positive weights for weighted least squares (minimises Σ wᵢ eᵢ²).' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  weights?: string;
}

export const COVARIANCE_CHOICES = ['classical', 'hc0', 'hc1', 'hc2', 'hc3', 'newey-west', 'cluster'] as const;

export class CovarianceChoiceDto {
  @ApiProperty({
    enum: COVARIANCE_CHOICES,
    description:
      'classical: s²(X\'WX)⁻¹. hc0: (X\'X)⁻¹X\' diag(e²) X(X\'X)⁻¹ (White). hc1: hc0 × n/(n−p). hc2: e²/(1−h). hc3: e²/(1−h)². ' +
      'newey-west: HAC with Bartlett weights 1 − l/(L+1). cluster: CR1 with factor G/(G−1)·(n−1)/(n−p); t-tests then use G−1 degrees of freedom.',
  })
  @IsIn(COVARIANCE_CHOICES)
  type: (typeof COVARIANCE_CHOICES)[number];

  @ApiPropertyOptional({
    description: 'newey-west only: the lag L, an integer ≥ 0, or "automatic" = floor(4·(n/100)^(2/9)) (the default).',
    oneOf: [{ type: 'integer', minimum: 0 }, { type: 'string', enum: ['automatic'] }],
  })
  @IsOptional()
  @ValidateIf((choice: CovarianceChoiceDto) => choice.lag !== 'automatic')
  @IsInt({ message: 'lag must be an integer ≥ 0 or "automatic"' })
  @Min(0)
  lag?: number | 'automatic';

  @ApiPropertyOptional({ description: 'newey-west only: multiply by n/(n−p) (default false).' })
  @IsOptional()
  @IsBoolean()
  smallSampleCorrection?: boolean;

  @ApiPropertyOptional({ description: 'cluster only: the column holding each row’s group (numbers or strings).' })
  @ValidateIf((choice: CovarianceChoiceDto) => choice.type === 'cluster')
  @IsString({ message: 'groupColumn must name the group column when type is "cluster"' })
  @MaxLength(200)
  groupColumn?: string;
}

export const DIAGNOSTIC_CHOICES = ['reset', 'breusch-pagan', 'white', 'durbin-watson', 'breusch-godfrey', 'jarque-bera', 'collinearity'] as const;

export class DiagnosticOptionsDto {
  @ApiPropertyOptional({ minimum: 2, maximum: 5, default: 3, description: 'RESET: highest power of the fitted values (ŷ², …, ŷ^k).' })
  @IsOptional()
  @IsInt()
  @Min(2)
  @Max(5)
  resetMaxPower?: number;

  @ApiPropertyOptional({ enum: ['studentised', 'original'], default: 'studentised', description: 'Breusch-Pagan: Koenker’s studentised LM (default) or the original.' })
  @IsOptional()
  @IsIn(['studentised', 'original'])
  breuschPaganVariant?: 'studentised' | 'original';

  @ApiPropertyOptional({ minimum: 1, default: 1, description: 'Breusch-Godfrey: highest residual lag.' })
  @IsOptional()
  @IsInt()
  @Min(1)
  breuschGodfreyLag?: number;

  @ApiPropertyOptional({ enum: ['lm', 'f'], default: 'lm', description: 'Breusch-Godfrey: n·R² chi-square (lm) or the F form.' })
  @IsOptional()
  @IsIn(['lm', 'f'])
  breuschGodfreyVariant?: 'lm' | 'f';

  @ApiPropertyOptional({ enum: ['positive', 'negative', 'two-sided'], default: 'positive', description: 'Durbin-Watson: the alternative tested.' })
  @IsOptional()
  @IsIn(['positive', 'negative', 'two-sided'])
  durbinWatsonAlternative?: 'positive' | 'negative' | 'two-sided';
}

/** Options every estimating endpoint shares. */
export class CommonFitOptionsDto {
  @ApiProperty({ type: DataSourceDto })
  @ValidateNested()
  @Type(() => DataSourceDto)
  data: DataSourceDto;

  @ApiPropertyOptional({
    exclusiveMinimum: true,
    minimum: 0,
    exclusiveMaximum: true,
    maximum: 1,
    default: 0.95,
    description: 'Level of confidence and prediction intervals, strictly between 0 and 1.',
  })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsStrictlyBetween(0, 1)
  confidenceLevel?: number;

  @ApiPropertyOptional({
    enum: MISSING_VALUE_POLICIES,
    default: 'reject',
    description:
      'reject: any missing value in the model’s columns is an error listing the rows (0-based). drop-rows: rows with a missing value in any used column are left out (listwise); the answer lists them.',
  })
  @IsOptional()
  @IsIn(MISSING_VALUE_POLICIES)
  missingValues?: MissingValuePolicy;
}
