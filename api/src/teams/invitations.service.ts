import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { AuditActor, AuditService } from '../audit/audit.service';
import { normalizeEmail } from '../auth/email-address';
import { PasswordHasher } from '../auth/password-hasher.service';
import { ClientInfo, SessionsService, StartedSession } from '../auth/sessions.service';
import { UsersService } from '../auth/users.service';
import { FieldProblem, ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { SessionAccount, TeamAccess } from '../common/request-context/request-principals';
import { createOpaqueToken, hashOpaqueToken } from '../common/security/opaque-token';
import { appConfig } from '../config/configuration';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { invitationMail } from '../mail/mail-templates';
import { AcceptInvitationDto, CreateInvitationDto, InvitationAcceptanceDto, InvitationDto, InvitationPreviewDto } from './dto/invitation.dto';
import { Invitation } from './models/invitation.model';
import { Membership } from './models/membership.model';
import { Team } from './models/team.model';

export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

type Actor = AuditActor & { userId: string; email: string };

@Injectable()
export class InvitationsService {
  constructor(
    @InjectModel(Invitation) private readonly invitations: typeof Invitation,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly sessions: SessionsService,
    private readonly audit: AuditService,
    private readonly mail: MailOutboxService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  async listOpen(team: TeamAccess): Promise<InvitationDto[]> {
    const rows = await this.invitations.findAll({
      where: { teamId: team.teamId, acceptedAt: null, revokedAt: null },
      order: [['createdAt', 'DESC']],
    });
    return rows.map(toDto);
  }

  /** A new invitation to the same address replaces the open one, so only the latest link works. */
  async create(team: TeamAccess, actor: Actor & { displayName?: string }, input: CreateInvitationDto): Promise<InvitationDto> {
    const email = normalizeEmail(input.email);
    const { token, tokenHash } = createOpaqueToken();
    const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS);
    const invitation = await this.sequelize.transaction(async (transaction) => {
      const existingUser = await this.users.findByEmail(email, transaction);
      if (existingUser && (await this.memberships.count({ where: { teamId: team.teamId, userId: existingUser.id }, transaction })) > 0) {
        throw new ProblemException(PROBLEM_TYPES.conflict, `${email} is already a member of this team.`, [
          { pointer: '#/email', detail: 'already a member' },
        ]);
      }
      await this.invitations.update(
        { revokedAt: new Date() },
        { where: { teamId: team.teamId, email, acceptedAt: null, revokedAt: null }, transaction },
      );
      const created = await this.invitations.create(
        { teamId: team.teamId, email, role: input.role, tokenHash, invitedByUserId: actor.userId, expiresAt },
        { transaction },
      );
      await this.audit.record(
        { teamId: team.teamId, action: 'invitation.created', actor, target: { type: 'invitation', id: created.id }, details: { email, role: input.role } },
        transaction,
      );
      await this.mail.enqueue(
        email,
        invitationMail({
          teamName: team.teamName,
          role: input.role,
          inviterName: actor.displayName ?? actor.email,
          acceptUrl: `${this.app.publicUrl}/invitations/accept#token=${token}`,
          expiresAt,
        }),
        transaction,
      );
      return created;
    });
    return toDto(invitation);
  }

  async revoke(team: TeamAccess, actor: Actor, invitationId: string): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const invitation = await this.invitations.findOne({
        where: { id: invitationId, teamId: team.teamId },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!invitation || invitation.revokedAt) {
        throw new ProblemException(PROBLEM_TYPES.notFound, `No open invitation with id ${invitationId} in this team.`);
      }
      if (invitation.acceptedAt) throw new ProblemException(PROBLEM_TYPES.conflict, 'This invitation was already accepted.');
      await invitation.update({ revokedAt: new Date() }, { transaction });
      await this.audit.record(
        { teamId: team.teamId, action: 'invitation.revoked', actor, target: { type: 'invitation', id: invitation.id }, details: { email: invitation.email } },
        transaction,
      );
    });
  }

  async preview(token: string): Promise<InvitationPreviewDto> {
    const invitation = await this.findUsable(token);
    const team = invitation.team;
    if (!team) throw linkNotFound();
    return {
      teamName: team.name,
      role: invitation.role,
      email: invitation.email,
      expiresAt: invitation.expiresAt.toISOString(),
      accountExists: (await this.users.findByEmail(invitation.email)) !== null,
    };
  }

  /**
   * Signed in: links the signed-in account, which must be the invited address. Not signed in: creates the
   * account (displayName and password required) and signs it in; if the address already has an account,
   * the caller must sign in first.
   */
  async accept(
    input: AcceptInvitationDto,
    account: SessionAccount | undefined,
    client: ClientInfo,
  ): Promise<{ result: InvitationAcceptanceDto; session?: StartedSession }> {
    const passwordHash = !account && input.password ? await this.hasher.hash(input.password) : undefined;
    return this.sequelize.transaction(async (transaction) => {
      const invitation = await this.findUsable(input.token, transaction);
      const team = invitation.team;
      if (!team) throw linkNotFound();
      let user = account ? await this.users.findById(account.userId, transaction) : await this.users.findByEmail(invitation.email, transaction);
      let session: StartedSession | undefined;
      if (account) {
        if (!user || user.email !== invitation.email) {
          throw new ProblemException(
            PROBLEM_TYPES.invitationEmailMismatch,
            `This invitation is for ${invitation.email}, but you are signed in as ${account.email}.`,
          );
        }
      } else if (user) {
        throw new ProblemException(
          PROBLEM_TYPES.signInRequired,
          `${invitation.email} already has an account: sign in as it, then accept the invitation again.`,
        );
      } else {
        const missing: FieldProblem[] = [];
        if (!input.displayName) missing.push({ pointer: '#/displayName', detail: 'is required to create the account' });
        if (!passwordHash) missing.push({ pointer: '#/password', detail: 'is required to create the account' });
        if (missing.length > 0) {
          throw new ProblemException(
            PROBLEM_TYPES.invalidRequest,
            'No account uses the invited address yet: send displayName and password to create it.',
            missing,
          );
        }
        user = await this.users.create({ email: invitation.email, displayName: input.displayName ?? '', passwordHash: passwordHash ?? '' }, transaction);
        session = await this.sessions.start(user, client, transaction);
      }
      if (!user) throw linkNotFound();
      const alreadyMember = await this.memberships.count({ where: { teamId: team.id, userId: user.id }, transaction });
      if (alreadyMember > 0) throw new ProblemException(PROBLEM_TYPES.conflict, `You are already a member of ${team.name}.`);
      await this.memberships.create({ teamId: team.id, userId: user.id, role: invitation.role }, { transaction });
      await invitation.update({ acceptedAt: new Date(), acceptedByUserId: user.id }, { transaction });
      await this.audit.record(
        {
          teamId: team.id,
          action: 'invitation.accepted',
          actor: { userId: user.id, email: user.email, ipAddress: client.ipAddress },
          target: { type: 'invitation', id: invitation.id },
          details: { role: invitation.role, accountCreated: session !== undefined },
        },
        transaction,
      );
      return {
        result: {
          teamId: team.id,
          teamName: team.name,
          role: invitation.role,
          account: { id: user.id, email: user.email, displayName: user.displayName },
          accountCreated: session !== undefined,
        },
        session,
      };
    });
  }

  private async findUsable(token: string, transaction?: Transaction): Promise<Invitation> {
    const invitation = await this.invitations.findOne({
      where: { tokenHash: hashOpaqueToken(token) },
      include: [Team],
      transaction,
      lock: transaction ? { level: transaction.LOCK.UPDATE, of: this.invitations } : undefined,
    });
    if (!invitation || invitation.revokedAt) throw linkNotFound();
    if (invitation.acceptedAt) {
      throw new ProblemException(PROBLEM_TYPES.linkUsed, 'This invitation was already accepted; sign in to reach the team.');
    }
    if (invitation.expiresAt.getTime() <= Date.now()) {
      throw new ProblemException(PROBLEM_TYPES.linkExpired, 'This invitation has expired; ask the team for a new one.');
    }
    return invitation;
  }
}

function linkNotFound(): ProblemException {
  return new ProblemException(PROBLEM_TYPES.linkNotFound, 'This invitation link is not valid (it may have been withdrawn or replaced).');
}

function toDto(invitation: Invitation): InvitationDto {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    status: invitation.expiresAt.getTime() <= Date.now() ? 'expired' : 'pending',
    invitedByUserId: invitation.invitedByUserId,
    createdAt: invitation.createdAt.toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

