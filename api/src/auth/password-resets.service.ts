import { Inject, Injectable, Logger } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Op } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { createOpaqueToken, hashOpaqueToken } from '../common/security/opaque-token';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { appConfig } from '../config/configuration';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { passwordResetMail } from '../mail/mail-templates';
import { PasswordReset } from './models/password-reset.model';
import { PasswordHasher } from './password-hasher.service';
import { SessionsService } from './sessions.service';
import { SignInThrottleService } from './sign-in-throttle.service';
import { UsersService } from './users.service';

export const RESET_LINK_LIFETIME_MS = 30 * 60 * 1000;
/** At most one reset e-mail per account per minute, so the form cannot be used to flood an inbox. */
const RESET_REQUEST_INTERVAL_MS = 60 * 1000;

@Injectable()
export class PasswordResetsService {
  private readonly logger = new Logger('PasswordResets');
  private readonly pending = new Set<Promise<void>>();

  constructor(
    @InjectModel(PasswordReset) private readonly resets: typeof PasswordReset,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly users: UsersService,
    private readonly hasher: PasswordHasher,
    private readonly sessions: SessionsService,
    private readonly throttle: SignInThrottleService,
    private readonly mail: MailOutboxService,
    @Inject(appConfig.KEY) private readonly app: ConfigType<typeof appConfig>,
  ) {}

  /**
   * Answers at once and does the work afterwards, so neither the answer nor its timing tells whether the
   * address has an account.
   */
  request(email: string, ipAddress: string): void {
    const work = this.createAndSend(email, ipAddress)
      .catch((error: unknown) =>
        this.logger.error({ msg: 'password reset request failed', error: error instanceof Error ? error.message : String(error) }),
      )
      .finally(() => this.pending.delete(work));
    this.pending.add(work);
  }

  /** Waits for background reset requests (used by tests and at shutdown). */
  async settle(): Promise<void> {
    await Promise.all([...this.pending]);
  }

  private async createAndSend(email: string, ipAddress: string): Promise<void> {
    const user = await this.users.findByEmail(email);
    if (!user) return;
    const recent = await this.resets.count({
      where: { userId: user.id, usedAt: null, createdAt: { [Op.gt]: new Date(Date.now() - RESET_REQUEST_INTERVAL_MS) } },
    });
    if (recent > 0) return;
    const { token, tokenHash } = createOpaqueToken();
    const expiresAt = new Date(Date.now() + RESET_LINK_LIFETIME_MS);
    await this.sequelize.transaction(async (transaction) => {
      // A new link replaces older unused ones: only the latest e-mail works.
      await this.resets.destroy({ where: { userId: user.id, usedAt: null }, transaction });
      await this.resets.create({ userId: user.id, tokenHash, expiresAt, requestedFromIp: ipAddress }, { transaction });
      await this.mail.enqueue(
        user.email,
        passwordResetMail({
          displayName: user.displayName,
          resetUrl: `${this.app.publicUrl}/reset-password#token=${token}`,
          expiresAt,
        }),
        transaction,
      );
    });
  }

  /** Sets the new password, spends the link, and ends every session of the account. */
  async complete(token: string, newPassword: string): Promise<void> {
    const passwordHash = await this.hasher.hash(newPassword);
    await this.sequelize.transaction(async (transaction) => {
      const reset = await this.resets.findOne({
        where: { tokenHash: hashOpaqueToken(token) },
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      if (!reset) {
        throw new ProblemException(PROBLEM_TYPES.linkNotFound, 'This password-reset link is not valid; ask for a new one.');
      }
      if (reset.usedAt) {
        throw new ProblemException(PROBLEM_TYPES.linkUsed, 'This password-reset link was already used; ask for a new one.');
      }
      if (reset.expiresAt.getTime() <= Date.now()) {
        throw new ProblemException(PROBLEM_TYPES.linkExpired, 'This password-reset link has expired; ask for a new one.');
      }
      const user = await this.users.findById(reset.userId, transaction);
      if (!user) throw new ProblemException(PROBLEM_TYPES.linkNotFound, 'This password-reset link is not valid; ask for a new one.');
      await this.users.setPasswordHash(user.id, passwordHash, transaction);
      await reset.update({ usedAt: new Date() }, { transaction });
      await this.sessions.endAllForUser(user.id, transaction);
      await this.throttle.reset(user.email, transaction);
    });
  }
}
