import { ApiProperty } from '@nestjs/swagger';

export class HealthStatusDto {
  @ApiProperty({ enum: ['ok'], description: 'The process is alive and serving requests.' })
  status: 'ok';

  @ApiProperty({ description: 'Version of the API build.', example: '0.1.0' })
  version: string;
}

export class ReadinessDto {
  @ApiProperty({ enum: ['ready'] })
  status: 'ready';

  @ApiProperty({ description: 'Round-trip time of the database check in milliseconds.', example: 2 })
  databaseMilliseconds: number;
}
