import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsNumber, IsOptional, IsUUID, ValidateIf, ValidateNested } from 'class-validator';
import { IsStrictlyBetween } from '../../common/validation/is-strictly-between';
import { CovarianceChoiceDto, DataSourceDto, ModelSpecDto } from './model-request.dto';
import { MISSING_VALUE_POLICIES, MissingValuePolicy } from '../model-data';
import { IsIn } from 'class-validator';

export const MAX_PREDICTION_POINTS = 10_000;

export class CreatePredictionDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'A stored fit to predict from (instead of `data` + `model`).' })
  @ValidateIf((body: CreatePredictionDto) => body.data === undefined && body.model === undefined)
  @IsUUID('all', { message: 'fitId must be a fit id, or send data and model instead' })
  fitId?: string;

  @ApiPropertyOptional({ type: DataSourceDto, description: 'Data to fit first (with `model`), when no `fitId` is given.' })
  @ValidateIf((body: CreatePredictionDto) => body.fitId === undefined)
  @ValidateNested()
  @Type(() => DataSourceDto)
  data?: DataSourceDto;

  @ApiPropertyOptional({ type: ModelSpecDto })
  @ValidateIf((body: CreatePredictionDto) => body.fitId === undefined)
  @ValidateNested()
  @Type(() => ModelSpecDto)
  model?: ModelSpecDto;

  @ApiPropertyOptional({ type: CovarianceChoiceDto, description: 'With data + model: the covariance behind the intervals (default classical).' })
  @IsOptional()
  @ValidateNested()
  @Type(() => CovarianceChoiceDto)
  covariance?: CovarianceChoiceDto;

  @ApiProperty({
    description:
      'Points to predict at: one list of predictor values per point, in the order of the model’s predictors, on the original scale ' +
      '(the model’s form applies any logs). When the predictors include power terms, give one value per distinct column, in order ' +
      'of first appearance (Leastline raises it to each term’s power).',
    type: 'array',
    items: { type: 'array', items: { type: 'number' } },
    example: [[25], [60]],
  })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_PREDICTION_POINTS)
  points: number[][];

  @ApiPropertyOptional({ default: 0.95, description: 'Interval level, strictly between 0 and 1 (for a stored fit, defaults to the fit’s level).' })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @IsStrictlyBetween(0, 1)
  confidenceLevel?: number;

  @ApiPropertyOptional({ enum: MISSING_VALUE_POLICIES, default: 'reject' })
  @IsOptional()
  @IsIn(MISSING_VALUE_POLICIES)
  missingValues?: MissingValuePolicy;
}
