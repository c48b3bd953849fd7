import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsArray, IsIn, IsObject, IsOptional, IsString, Length, Matches } from 'class-validator';

export const DATASET_NAME_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]{0,119}$/;

export class CreateDatasetDto {
  @ApiProperty({
    description: 'Dataset name; uploading again under the same name makes a new version.',
    example: 'quillfeather-settlements',
    pattern: DATASET_NAME_PATTERN.source,
  })
  @IsString()
  @Length(1, 120)
  @Matches(DATASET_NAME_PATTERN, { message: 'name must start with a letter or digit and use only letters, digits, ".", "_" or "-"' })
  name: string;

  @ApiPropertyOptional({
    description: 'Columns by name, each an array of equal length; numbers, strings, or null for missing.',
    type: 'object',
    additionalProperties: { type: 'array', items: { oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true } },
    example: { ticket_size: [12.5, 80, 43.2], chargeback_rate: [0.004, 0.011, 0.007] },
  })
  @IsOptional()
  @IsObject()
  columns?: Record<string, (number | string | null)[]>;

  @ApiPropertyOptional({
    description: 'Rows as objects; the first row names the columns. Use either `columns` or `rows`.',
    type: 'array',
    items: { type: 'object', additionalProperties: { oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true } },
  })
  @IsOptional()
  @IsArray()
  rows?: Record<string, number | string | null>[];
}

export class UploadCsvQueryDto {
  @ApiProperty({ description: 'Dataset name (see the JSON form).', example: 'quillfeather-settlements' })
  @IsString()
  @Length(1, 120)
  @Matches(DATASET_NAME_PATTERN, { message: 'name must start with a letter or digit and use only letters, digits, ".", "_" or "-"' })
  name: string;

  @ApiPropertyOptional({ enum: [',', ';', '\t', '|'], default: ',', description: 'Field delimiter of the CSV file.' })
  @IsOptional()
  @IsIn([',', ';', '\t', '|'])
  delimiter?: ',' | ';' | '\t' | '|';
}
