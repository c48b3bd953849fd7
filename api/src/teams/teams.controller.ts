import { Body, Controller, Delete, Get, HttpCode, Patch, Post, Put } from '@nestjs/common';
import { ApiConflictResponse, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { AuditActor } from '../audit/audit.service';
import { CurrentActor, CurrentTeam, SignedIn, TeamPermissionRequired } from '../auth/auth.decorators';
import { TeamAccess } from '../common/request-context/request-principals';
import { ApiTeamIdParam } from '../common/request-context/team-id-param';
import { ChangePlanDto, CreateTeamDto, TeamDto, TeamListDto, TransferOwnershipDto, UpdateTeamDto } from './dto/team.dto';
import { TeamsService } from './teams.service';

type Actor = AuditActor & { userId: string; email: string };

@ApiTags('teams')
@Controller('v1/teams')
export class TeamsController {
  constructor(private readonly teams: TeamsService) {}

  @Get()
  @SignedIn()
  @ApiOperation({ summary: 'List your teams', description: 'Every team the signed-in account belongs to, with its role.' })
  @ApiOkResponse({ type: TeamListDto })
  async listTeams(@CurrentActor() actor: Actor): Promise<TeamListDto> {
    return { items: await this.teams.listForUser(actor.userId) };
  }

  @Post()
  @SignedIn()
  @ApiOperation({ summary: 'Create a team', description: 'The signed-in account becomes its owner.' })
  @ApiCreatedResponse({ type: TeamDto })
  @ApiConflictResponse({ description: 'The slug is taken.' })
  createTeam(@CurrentActor() actor: Actor, @Body() body: CreateTeamDto): Promise<TeamDto> {
    return this.teams.create(actor, body);
  }

  @Get(':teamId')
  @TeamPermissionRequired('team:read')
  @ApiTeamIdParam()
  @ApiOperation({ summary: 'Get a team' })
  @ApiOkResponse({ type: TeamDto })
  getTeam(@CurrentTeam() team: TeamAccess): Promise<TeamDto> {
    return this.teams.get(team);
  }

  @Patch(':teamId')
  @TeamPermissionRequired('team:update')
  @ApiTeamIdParam()
  @ApiOperation({ summary: 'Rename a team or change its settings' })
  @ApiOkResponse({ type: TeamDto })
  updateTeam(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Body() body: UpdateTeamDto): Promise<TeamDto> {
    return this.teams.update(team, actor, body);
  }

  @Delete(':teamId')
  @HttpCode(204)
  @TeamPermissionRequired('team:delete')
  @ApiTeamIdParam()
  @ApiOperation({ summary: 'Delete a team', description: 'Removes the team with its members, invitations, keys and audit log.' })
  @ApiNoContentResponse({ description: 'Deleted.' })
  async deleteTeam(@CurrentTeam() team: TeamAccess): Promise<void> {
    await this.teams.delete(team);
  }

  @Post(':teamId/ownership-transfer')
  @HttpCode(204)
  @TeamPermissionRequired('team:transfer-ownership')
  @ApiTeamIdParam()
  @ApiOperation({ summary: 'Transfer ownership', description: 'The named member becomes owner; you become admin.' })
  @ApiNoContentResponse({ description: 'Transferred.' })
  async transferOwnership(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Body() body: TransferOwnershipDto): Promise<void> {
    await this.teams.transferOwnership(team, actor, body.newOwnerUserId);
  }

  @Put(':teamId/plan')
  @TeamPermissionRequired('plan:manage')
  @ApiTeamIdParam()
  @ApiOperation({ summary: 'Change the plan' })
  @ApiOkResponse({ type: TeamDto })
  changePlan(@CurrentTeam() team: TeamAccess, @CurrentActor() actor: Actor, @Body() body: ChangePlanDto): Promise<TeamDto> {
    return this.teams.changePlan(team, actor, body.plan);
  }
}
