import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { PageQueryDto } from '../../common/pagination/page-query.dto';
import { IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export class ListDatasetsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ description: 'Only versions of this name.' })
  @IsOptional()
  @IsString()
  @MaxLength(120)
  name?: string;
}

export class ReadRowsQueryDto {
  @ApiPropertyOptional({ minimum: 0, default: 0, description: '0-based index of the first row.' })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(0)
  offset?: number;

  @ApiPropertyOptional({ minimum: 1, maximum: 1000, default: 50 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(1000)
  limit?: number;
}
