import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsBoolean, IsIn, IsOptional, IsString } from 'class-validator';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../engine/functional-forms';
import { CommonFitOptionsDto, MAX_PREDICTORS } from './model-request.dto';

export const MAX_BATCH_RESPONSES = 20_000;

export class CreateBatchFitDto extends CommonFitOptionsDto {
  @ApiProperty({ type: [String], description: 'Response columns, each fitted against the shared predictors.', example: ['fund_a', 'fund_b'] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_BATCH_RESPONSES)
  @IsString({ each: true })
  responses: string[];

  @ApiProperty({ type: [String], description: 'Shared predictor columns.', example: ['benchmark'] })
  @IsArray()
  @ArrayMinSize(1)
  @ArrayMaxSize(MAX_PREDICTORS)
  @IsString({ each: true })
  predictors: string[];

  @ApiPropertyOptional({ enum: FUNCTIONAL_FORMS, default: 'lin-lin' })
  @IsOptional()
  @IsIn(FUNCTIONAL_FORMS)
  form?: FunctionalForm;

  @ApiPropertyOptional({ default: true })
  @IsOptional()
  @IsBoolean()
  intercept?: boolean;
}
