import { Body, Controller, Delete, Get, HttpCode, Param, Patch } from '@nestjs/common';
import { ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiParam, ApiTags } from '@nestjs/swagger';
import { AuditActor } from '../audit/audit.service';
import { CurrentActor, CurrentTeam, TeamPermissionRequired } from '../auth/auth.decorators';
import { TeamAccess } from '../common/request-context/request-principals';
import { ApiTeamIdParam } from '../common/request-context/team-id-param';
import { uuidParam } from '../common/request-context/uuid-param.pipe';
import { ChangeRoleDto, MemberDto, MemberListDto } from './dto/member.dto';
import { MembersService } from './members.service';

type Actor = AuditActor & { userId: string; email: string };

@ApiTags('teams')
@Controller('v1/teams/:teamId/members')
@ApiTeamIdParam()
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  @TeamPermissionRequired('members:read')
  @ApiOperation({ summary: 'List members' })
  @ApiOkResponse({ type: MemberListDto })
  async listMembers(@CurrentTeam() team: TeamAccess): Promise<MemberListDto> {
    return { items: await this.members.list(team) };
  }

  @Patch(':userId')
  @TeamPermissionRequired('members:manage')
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiOperation({ summary: "Change a member's role", description: "The owner's role changes only by ownership transfer." })
  @ApiOkResponse({ type: MemberDto })
  changeMemberRole(
    @CurrentTeam() team: TeamAccess,
    @CurrentActor() actor: Actor,
    @Param('userId', uuidParam('userId')) userId: string,
    @Body() body: ChangeRoleDto,
  ): Promise<MemberDto> {
    return this.members.changeRole(team, actor, userId, body.role);
  }

  @Delete(':userId')
  @HttpCode(204)
  @TeamPermissionRequired('members:manage')
  @ApiParam({ name: 'userId', format: 'uuid' })
  @ApiOperation({ summary: 'Remove a member', description: 'The owner cannot be removed.' })
  @ApiNoContentResponse({ description: 'Removed.' })
  async removeMember(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Param('userId', uuidParam('userId')) userId: string): Promise<void> {
    await this.members.remove(team, actor, userId);
  }
}
