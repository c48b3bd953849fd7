import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

export class UsageQueryDto {
  @ApiPropertyOptional({ description: 'First UTC day (YYYY-MM-DD), inclusive. Default: 29 days before `to`.', example: '2026-11-01' })
  @IsOptional()
  @Matches(DATE, { message: 'from must be a date as YYYY-MM-DD' })
  from?: string;

  @ApiPropertyOptional({ description: 'Last UTC day (YYYY-MM-DD), inclusive. Default: today.', example: '2026-11-30' })
  @IsOptional()
  @Matches(DATE, { message: 'to must be a date as YYYY-MM-DD' })
  to?: string;
}

export class UsageRowDto {
  @ApiProperty({ example: '2026-11-18', description: 'UTC day.' })
  day: string;

  @ApiProperty({ nullable: true, type: String, description: 'The key the calls were made with; null for console calls without a key.' })
  apiKeyId: string | null;

  @ApiProperty({ example: 'fits', description: 'Billable endpoint: fits, form-comparisons, predictions, batch-fits, rolling-fits.' })
  endpoint: string;

  @ApiProperty({ description: 'Billable calls.' })
  requests: number;

  @ApiProperty({ description: 'Units charged: models + ceil(observations / 10 000) per call.' })
  units: number;

  @ApiProperty({ description: 'Observations used.' })
  observations: number;
}

export class UsageTotalsDto {
  @ApiProperty()
  requests: number;

  @ApiProperty()
  units: number;

  @ApiProperty()
  observations: number;
}

export class UsageReportDto {
  @ApiProperty({ example: '2026-11-01' })
  from: string;

  @ApiProperty({ example: '2026-11-30' })
  to: string;

  @ApiProperty({ type: [UsageRowDto], description: 'One row per day, key and endpoint with any billable call.' })
  rows: UsageRowDto[];

  @ApiProperty({ type: UsageTotalsDto })
  totals: UsageTotalsDto;

  @ApiProperty({ description: 'The units rule, as applied.', example: 'units = models + ceil(observations / 10000), at least 1 per call' })
  unitsRule: string;
}

export class DailyRequestsDto {
  @ApiProperty({ example: '2026-11-18' })
  day: string;

  @ApiProperty({ description: 'Public-API requests, any outcome.' })
  requests: number;

  @ApiProperty({ description: 'Requests answered with status ≥ 400.' })
  errors: number;
}

export class RecentRequestDto {
  @ApiProperty({ example: 'POST' })
  method: string;

  @ApiProperty({ example: '/v1/fits' })
  route: string;

  @ApiProperty({ example: 201 })
  status: number;

  @ApiProperty({ description: 'Server time in milliseconds.', example: 12.4 })
  durationMs: number;

  @ApiProperty()
  requestId: string;

  @ApiProperty({ nullable: true, type: String })
  apiKeyId: string | null;

  @ApiProperty({ format: 'date-time' })
  at: string;
}

export class UsageOverviewDto {
  @ApiProperty({ example: 'growth' })
  plan: string;

  @ApiProperty({ description: 'First day of the current billing period (calendar month, UTC).', example: '2026-12-01' })
  periodStart: string;

  @ApiProperty({ description: 'Units used this period.' })
  unitsThisPeriod: number;

  @ApiProperty({ description: 'Units included in the plan per period.' })
  includedUnits: number;

  @ApiProperty({ type: [DailyRequestsDto], description: 'The last 30 days.' })
  requestsByDay: DailyRequestsDto[];

  @ApiProperty({ description: 'Share of the last 30 days’ requests answered with status ≥ 400 (0 when there were none).' })
  errorRate: number;

  @ApiProperty({ type: [RecentRequestDto], description: 'The 20 most recent public-API requests.' })
  recentRequests: RecentRequestDto[];
}
