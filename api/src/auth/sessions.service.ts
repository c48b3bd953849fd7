import { Inject, Injectable } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { Op, Transaction } from 'sequelize';
import { AuditService } from '../audit/audit.service';
import { createOpaqueToken, hashOpaqueToken, OPAQUE_TOKEN_PATTERN } from '../common/security/opaque-token';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { SessionAccount } from '../common/request-context/request-principals';
import { securityConfig } from '../config/configuration';
import { TeamAccessService } from '../teams/access/team-access.service';
import { SESSION_LIFETIME_MS } from './auth-cookies';
import { Session } from './models/session.model';
import { User } from './models/user.model';
import { PasswordHasher } from './password-hasher.service';
import { SignInThrottleService } from './sign-in-throttle.service';
import { UsersService } from './users.service';

export interface ClientInfo {
  ipAddress: string;
  userAgent?: string;
}

export interface StartedSession {
  token: string;
  expiresAt: Date;
  account: SessionAccount;
}

/**
 * Server-side sessions: the cookie holds 256 random bits, the table holds their SHA-256, so signing out
 * (or a password reset) ends a session everywhere at once.
 */
@Injectable()
export class SessionsService {
  constructor(
    @InjectModel(Session) private readonly sessions: typeof Session,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly throttle: SignInThrottleService,
    private readonly teamAccess: TeamAccessService,
    private readonly audit: AuditService,
    @Inject(securityConfig.KEY) readonly security: ConfigType<typeof securityConfig>,
  ) {}

  /**
   * Wrong password and unknown address give the same 401 after the same amount of work; both count
   * towards the lockout of that address.
   */
  async signIn(email: string, password: string, client: ClientInfo): Promise<StartedSession> {
    await this.throttle.assertNotLocked(email);
    const user = await this.users.findByEmail(email);
    const valid = await this.hasher.verify(password, user?.passwordHash);
    if (!user || !valid) {
      await this.throttle.recordFailure(email);
      throw new ProblemException(PROBLEM_TYPES.invalidCredentials, 'The e-mail address or password is not correct.');
    }
    await this.throttle.reset(email);
    const started = await this.start(user, client);
    const memberships = await this.teamAccess.listMemberships(user.id);
    await this.audit.recordMany(
      memberships.map((membership) => ({
        teamId: membership.teamId,
        action: 'session.signed-in' as const,
        actor: { userId: user.id, email: user.email, ipAddress: client.ipAddress },
        details: { userAgent: client.userAgent ?? null },
      })),
    );
    return started;
  }

  async start(user: User, client: ClientInfo, transaction?: Transaction): Promise<StartedSession> {
    const { token, tokenHash } = createOpaqueToken();
    const expiresAt = new Date(Date.now() + SESSION_LIFETIME_MS);
    const session = await this.sessions.create(
      {
        tokenHash,
        userId: user.id,
        ipAddress: client.ipAddress,
        userAgent: client.userAgent?.slice(0, 300) ?? null,
        expiresAt,
      },
      { transaction },
    );
    return {
      token,
      expiresAt,
      account: { userId: user.id, email: user.email, displayName: user.displayName, sessionId: session.id },
    };
  }

  /** The account behind a cookie value, or undefined for anything unknown, expired or malformed. */
  async resolve(token: string): Promise<(SessionAccount & { expiresAt: Date }) | undefined> {
    if (!OPAQUE_TOKEN_PATTERN.test(token)) return undefined;
    const session = await this.sessions.findOne({
      where: { tokenHash: hashOpaqueToken(token), expiresAt: { [Op.gt]: new Date() } },
    });
    if (!session) return undefined;
    const user = await this.users.findById(session.userId);
    if (!user) return undefined;
    return {
      userId: user.id,
      email: user.email,
      displayName: user.displayName,
      sessionId: session.id,
      expiresAt: session.expiresAt,
    };
  }

  async end(sessionId: string): Promise<void> {
    await this.sessions.destroy({ where: { id: sessionId } });
  }

  async endAllForUser(userId: string, transaction?: Transaction): Promise<void> {
    await this.sessions.destroy({ where: { userId }, transaction });
  }

  async expiryOf(sessionId: string): Promise<Date | undefined> {
    return (await this.sessions.findByPk(sessionId))?.expiresAt;
  }
}
