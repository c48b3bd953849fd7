import { Controller, Get, Query } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { CurrentPrincipal, PublicApi } from '../common/public-api/public-api.decorators';
import { PublicPrincipal } from '../common/public-api/public-principal';
import { limitsForPlan } from '../common/rate-limit/plan-limits';
import { OBSERVATIONS_PER_UNIT } from './billable-units';
import { UsageOverviewDto, UsageQueryDto, UsageReportDto } from './dto/usage.dto';
import { UsageService } from './usage.service';

const MAX_RANGE_DAYS = 366;
const DAY_MS = 86_400_000;

function isoDay(date: Date): string {
  return date.toISOString().slice(0, 10);
}

@ApiTags('usage')
@Controller('v1/usage')
export class UsageController {
  constructor(private readonly usage: UsageService) {}

  @Get()
  @PublicApi('usage:read')
  @ApiOperation({
    operationId: 'getUsage',
    summary: 'Metered usage by day, key and endpoint',
    description: `Billable calls in [from, to] (UTC days, both inclusive; at most ${MAX_RANGE_DAYS} days). Each call is metered exactly once.`,
  })
  @ApiOkResponse({ type: UsageReportDto })
  async report(@CurrentPrincipal() principal: PublicPrincipal, @Query() query: UsageQueryDto): Promise<UsageReportDto> {
    const to = query.to ? new Date(`${query.to}T00:00:00Z`) : new Date(`${isoDay(new Date())}T00:00:00Z`);
    const from = query.from ? new Date(`${query.from}T00:00:00Z`) : new Date(to.getTime() - 29 * DAY_MS);
    if (Number.isNaN(from.getTime()) || Number.isNaN(to.getTime())) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, 'from and to must be real calendar dates.', [
        { pointer: Number.isNaN(from.getTime()) ? '#/from' : '#/to', detail: 'not a calendar date' },
      ]);
    }
    const days = Math.round((to.getTime() - from.getTime()) / DAY_MS) + 1;
    if (days < 1 || days > MAX_RANGE_DAYS) {
      throw new ProblemException(PROBLEM_TYPES.invalidRequest, `The range must be 1 to ${MAX_RANGE_DAYS} days with from ≤ to.`, [
        { pointer: '#/from', detail: `range of ${days} days` },
      ]);
    }
    const rows = await this.usage.summary(principal.teamId, isoDay(from), isoDay(new Date(to.getTime() + DAY_MS)));
    const totals = rows.reduce(
      (sum, row) => ({ requests: sum.requests + row.requests, units: sum.units + row.units, observations: sum.observations + row.observations }),
      { requests: 0, units: 0, observations: 0 },
    );
    return {
      from: isoDay(from),
      to: isoDay(to),
      rows,
      totals,
      unitsRule: `units = models + ceil(observations / ${OBSERVATIONS_PER_UNIT}), at least 1 per call`,
    };
  }

  @Get('overview')
  @PublicApi('usage:read')
  @ApiOperation({
    operationId: 'getUsageOverview',
    summary: 'This period’s units, requests by day, error rate and recent requests',
  })
  @ApiOkResponse({ type: UsageOverviewDto })
  async overview(@CurrentPrincipal() principal: PublicPrincipal): Promise<UsageOverviewDto> {
    const now = new Date();
    const [unitsThisPeriod, requestsByDay, recent] = await Promise.all([
      this.usage.unitsThisMonth(principal.teamId),
      this.usage.requestsByDay(principal.teamId, 30),
      this.usage.recentRequests(principal.teamId, 20),
    ]);
    const requests = requestsByDay.reduce((sum, day) => sum + day.requests, 0);
    const errors = requestsByDay.reduce((sum, day) => sum + day.errors, 0);
    return {
      plan: principal.teamPlan,
      periodStart: `${now.toISOString().slice(0, 7)}-01`,
      unitsThisPeriod,
      includedUnits: limitsForPlan(principal.teamPlan).monthlyUnits,
      requestsByDay,
      errorRate: requests === 0 ? 0 : errors / requests,
      recentRequests: recent.map((entry) => ({
        method: entry.method,
        route: entry.route,
        status: entry.status,
        durationMs: entry.durationMs,
        requestId: entry.requestId,
        apiKeyId: entry.apiKeyId,
        at: entry.createdAt.toISOString(),
      })),
    };
  }
}
