import { Body, Controller, Delete, Get, HttpCode, Param, Post, Res, UseGuards } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiGoneResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiParam,
  ApiSecurity,
  ApiTags,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { AuditActor } from '../audit/audit.service';
import { SESSION_COOKIE, sessionCookieOptions } from '../auth/auth-cookies';
import {
  ClientAddress,
  CSRF_SECURITY,
  CurrentAccount,
  CurrentActor,
  CurrentTeam,
  OptionalAccount,
  TeamPermissionRequired,
} from '../auth/auth.decorators';
import { OptionalSessionGuard } from '../auth/session.guard';
import { SessionViewService } from '../auth/session-view.service';
import { ClientInfo } from '../auth/sessions.service';
import { SessionAccount, TeamAccess } from '../common/request-context/request-principals';
import { ApiTeamIdParam } from '../common/request-context/team-id-param';
import { uuidParam } from '../common/request-context/uuid-param.pipe';
import {
  AcceptInvitationDto,
  CreateInvitationDto,
  InvitationAcceptanceDto,
  InvitationDto,
  InvitationListDto,
  InvitationPreviewDto,
  InvitationTokenDto,
} from './dto/invitation.dto';
import { InvitationsService } from './invitations.service';

type Actor = AuditActor & { userId: string; email: string };

@ApiTags('teams')
@Controller('v1/teams/:teamId/invitations')
@ApiTeamIdParam()
export class TeamInvitationsController {
  constructor(private readonly invitations: InvitationsService) {}

  @Get()
  @TeamPermissionRequired('invitations:manage')
  @ApiOperation({ summary: 'List open invitations' })
  @ApiOkResponse({ type: InvitationListDto })
  async listInvitations(@CurrentTeam() team: TeamAccess): Promise<InvitationListDto> {
    return { items: await this.invitations.listOpen(team) };
  }

  @Post()
  @TeamPermissionRequired('invitations:manage')
  @ApiOperation({
    summary: 'Invite someone by e-mail',
    description: 'E-mails a one-time link valid for 7 days. A new invitation to the same address replaces the open one.',
  })
  @ApiCreatedResponse({ type: InvitationDto })
  @ApiConflictResponse({ description: 'The address is already a member.' })
  createInvitation(
    @CurrentTeam() team: TeamAccess,
    @CurrentActor() actor: Actor,
    @CurrentAccount() account: SessionAccount,
    @Body() body: CreateInvitationDto,
  ): Promise<InvitationDto> {
    return this.invitations.create(team, { ...actor, displayName: account.displayName }, body);
  }

  @Delete(':invitationId')
  @HttpCode(204)
  @TeamPermissionRequired('invitations:manage')
  @ApiParam({ name: 'invitationId', format: 'uuid' })
  @ApiOperation({ summary: 'Withdraw an invitation', description: 'Its link stops working at once.' })
  @ApiNoContentResponse({ description: 'Withdrawn.' })
  async withdrawInvitation(
    @CurrentTeam() team: TeamAccess,
    @CurrentActor() actor: Actor,
    @Param('invitationId', uuidParam('invitationId')) invitationId: string,
  ): Promise<void> {
    await this.invitations.revoke(team, actor, invitationId);
  }
}

/** The invitee's side. The token travels in the body, never in a URL that access logs would keep. */
@ApiTags('teams')
@Controller('v1/invitations')
export class InvitationAcceptanceController {
  constructor(
    private readonly invitations: InvitationsService,
    private readonly sessionView: SessionViewService,
  ) {}

  @Post('preview')
  @HttpCode(200)
  @ApiOperation({ summary: 'Look at an invitation before accepting', description: 'Changes nothing.' })
  @ApiOkResponse({ type: InvitationPreviewDto })
  @ApiNotFoundResponse({ description: 'The token matches no open invitation.' })
  @ApiGoneResponse({ description: 'The invitation expired or was already accepted.' })
  previewInvitation(@Body() body: InvitationTokenDto): Promise<InvitationPreviewDto> {
    return this.invitations.preview(body.token);
  }

  @Post('acceptance')
  @UseGuards(OptionalSessionGuard)
  @ApiSecurity(CSRF_SECURITY)
  @ApiOperation({
    summary: 'Accept an invitation',
    description:
      'Signed in as the invited address: joins the team. Not signed in and the address has no account: send ' +
      'displayName and password; the account is created, joins the team and is signed in (session cookie).',
  })
  @ApiCreatedResponse({ type: InvitationAcceptanceDto })
  @ApiUnauthorizedResponse({ description: 'The address has an account: sign in first.' })
  @ApiForbiddenResponse({ description: 'Signed in as another address, or the CSRF token is wrong.' })
  @ApiNotFoundResponse({ description: 'The token matches no open invitation.' })
  @ApiGoneResponse({ description: 'The invitation expired or was already accepted.' })
  async acceptInvitation(
    @Body() body: AcceptInvitationDto,
    @OptionalAccount() account: SessionAccount | undefined,
    @ClientAddress() client: ClientInfo,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<InvitationAcceptanceDto> {
    const { result, session } = await this.invitations.accept(body, account, client);
    if (session) reply.setCookie(SESSION_COOKIE, session.token, sessionCookieOptions(this.sessionView.secureCookies, session.expiresAt));
    return result;
  }
}
