import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMinSize, IsArray, IsIn, IsOptional, ValidateNested } from 'class-validator';
import { FUNCTIONAL_FORMS, FunctionalForm } from '../engine/functional-forms';
import { CommonFitOptionsDto, ModelSpecDto } from './model-request.dto';

export class ComparedModelDto extends OmitType(ModelSpecDto, ['form'] as const) {}

export class CompareFormsDto extends CommonFitOptionsDto {
  @ApiProperty({ type: ComparedModelDto })
  @ValidateNested()
  @Type(() => ComparedModelDto)
  model: ComparedModelDto;

  @ApiPropertyOptional({ enum: FUNCTIONAL_FORMS, isArray: true, description: 'Forms to compare (default: all four).' })
  @IsOptional()
  @IsArray()
  @ArrayMinSize(1)
  @IsIn(FUNCTIONAL_FORMS, { each: true })
  forms?: FunctionalForm[];
}
