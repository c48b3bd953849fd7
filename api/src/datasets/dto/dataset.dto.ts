import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class DatasetColumnDto {
  @ApiProperty({ example: 'ticket_size' })
  name: string;

  @ApiProperty({
    enum: ['numeric', 'text'],
    description: 'numeric when every non-empty cell is a plain decimal number; otherwise text.',
  })
  kind: 'numeric' | 'text';

  @ApiProperty({ description: 'Cells with a value.', example: 5000 })
  count: number;

  @ApiProperty({ description: 'Empty cells (missing values).', example: 0 })
  missing: number;

  @ApiProperty({ nullable: true, type: Number, description: 'Mean of the values (numeric columns only).' })
  mean: number | null;

  @ApiProperty({
    nullable: true,
    type: Number,
    description: 'Sample standard deviation, n − 1 denominator (numeric columns with at least two values).',
  })
  standardDeviation: number | null;

  @ApiProperty({ nullable: true, type: Number })
  min: number | null;

  @ApiProperty({ nullable: true, type: Number })
  max: number | null;

  @ApiPropertyOptional({ description: 'For a text column: the 1-based data row of its first non-number.' })
  firstTextRow?: number;

  @ApiPropertyOptional({ description: 'For a text column: that first non-number (up to 80 characters).' })
  firstTextValue?: string;
}

export class DatasetDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'quillfeather-settlements' })
  name: string;

  @ApiProperty({ description: 'Each upload under the same name is a new version, starting at 1.', example: 1 })
  version: number;

  @ApiProperty({
    description: 'SHA-256 (hex) over each column name, kind and stored bytes, in order: identical content, identical hash.',
  })
  contentHash: string;

  @ApiProperty({ example: 5000 })
  rowCount: number;

  @ApiProperty({ description: 'Bytes stored for the column data.' })
  byteSize: number;

  @ApiProperty({ enum: ['csv', 'json'] })
  source: 'csv' | 'json';

  @ApiProperty({ nullable: true, type: String, description: 'Who uploaded it (key or user).' })
  createdBy: string | null;

  @ApiProperty({ format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: [DatasetColumnDto] })
  columns: DatasetColumnDto[];
}

export class DatasetListDto {
  @ApiProperty({ type: [DatasetDto] })
  items: DatasetDto[];

  @ApiProperty({ nullable: true, type: String, description: 'Pass as `cursor` for the next page; null on the last page.' })
  nextCursor: string | null;
}

export class DatasetRowsDto {
  @ApiProperty({ format: 'uuid' })
  datasetId: string;

  @ApiProperty({ type: [String], description: 'Column names, in the order of each row.' })
  columns: string[];

  @ApiProperty({ description: '0-based index of the first row returned.' })
  offset: number;

  @ApiProperty()
  limit: number;

  @ApiProperty({ description: 'Rows in the dataset.' })
  total: number;

  @ApiProperty({
    type: 'array',
    items: { type: 'array', items: { oneOf: [{ type: 'number' }, { type: 'string' }], nullable: true } },
    description: 'Rows; null marks a missing value.',
  })
  rows: (number | string | null)[][];
}
