import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Min, ValidateNested } from 'class-validator';
import { CommonFitOptionsDto, ModelSpecDto } from './model-request.dto';

export class RollingModelDto extends OmitType(ModelSpecDto, ['weights'] as const) {}

export class CreateRollingFitDto extends CommonFitOptionsDto {
  @ApiProperty({ type: RollingModelDto, description: 'The model refitted in every window (no weights).' })
  @ValidateNested()
  @Type(() => RollingModelDto)
  model: RollingModelDto;

  @ApiProperty({ minimum: 2, description: 'Rows per window, in the order the data are given (time order).', example: 250 })
  @IsInt()
  @Min(2)
  window: number;

  @ApiPropertyOptional({ minimum: 1, default: 1, description: 'Rows the window moves each time.' })
  @IsOptional()
  @IsInt()
  @Min(1)
  step?: number;
}
