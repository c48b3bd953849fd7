import { Controller, Get, Query, Req, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { CurrentTeam, TeamPermissionRequired } from '../auth/auth.decorators';
import { TeamAccess } from '../common/request-context/request-principals';
import { ApiTeamIdParam } from '../common/request-context/team-id-param';
import { AuditService } from './audit.service';
import { AuditEventPageDto } from './dto/audit-event.dto';
import { ListAuditEventsQueryDto } from './dto/list-audit-events-query.dto';

@ApiTags('audit')
@Controller('v1/teams/:teamId/audit-events')
export class AuditEventsController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @TeamPermissionRequired('audit:read')
  @ApiTeamIdParam()
  @ApiOperation({
    summary: 'Read the audit log',
    description: 'Newest first, cursor-paginated; a `Link: <…>; rel="next"` header accompanies every page but the last.',
  })
  @ApiOkResponse({ type: AuditEventPageDto })
  async listAuditEvents(
    @CurrentTeam() team: TeamAccess,
    @Query() query: ListAuditEventsQueryDto,
    @Req() request: FastifyRequest,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<AuditEventPageDto> {
    const path = request.url.split('?')[0] ?? request.url;
    const { page, link } = await this.audit.list(team.teamId, query, path);
    if (link) reply.header('Link', link);
    return page;
  }
}
