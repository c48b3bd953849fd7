import { Controller, Get } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import { API_VERSION } from '../version';
import { HealthStatusDto, ReadinessDto } from './dto/health-status.dto';
import { HealthService } from './health.service';

@ApiTags('health')
@Controller('v1/health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Get()
  @ApiOperation({ summary: 'Liveness', description: 'Answers while the process runs, whatever the database does.' })
  @ApiOkResponse({ type: HealthStatusDto })
  getLiveness(): HealthStatusDto {
    return { status: 'ok', version: API_VERSION };
  }

  @Get('ready')
  @ApiOperation({ summary: 'Readiness', description: 'Checks the database with a 3-second deadline.' })
  @ApiOkResponse({ type: ReadinessDto })
  @ApiServiceUnavailableResponse({ description: 'The database is unreachable (problem details).' })
  async getReadiness(): Promise<ReadinessDto> {
    return { status: 'ready', databaseMilliseconds: await this.health.checkDatabase() };
  }
}
