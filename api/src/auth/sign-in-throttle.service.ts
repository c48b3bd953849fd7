import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { createHash } from 'node:crypto';
import { QueryTypes, Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { ProblemException } from '../common/problem-details/problem.exception';
import { PROBLEM_TYPES } from '../common/problem-details/problem-types';
import { normalizeEmail } from './email-address';
import { SignInThrottle } from './models/sign-in-throttle.model';
import { FAILURE_MEMORY_MS, lockDurationMs } from './sign-in-throttle-policy';

@Injectable()
export class SignInThrottleService {
  constructor(
    @InjectModel(SignInThrottle) private readonly throttles: typeof SignInThrottle,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {}

  static keyFor(email: string): string {
    return createHash('sha256').update(normalizeEmail(email), 'utf8').digest('hex');
  }

  /** Refuses before any password check while the address is locked (429 with Retry-After). */
  async assertNotLocked(email: string): Promise<void> {
    const row = await this.throttles.findByPk(SignInThrottleService.keyFor(email));
    const remainingMs = row?.lockedUntil ? row.lockedUntil.getTime() - Date.now() : 0;
    if (remainingMs > 0) {
      const seconds = Math.ceil(remainingMs / 1000);
      throw new ProblemException(
        PROBLEM_TYPES.signInThrottled,
        `Too many failed sign-ins for this address; try again in ${seconds} s or reset the password by e-mail.`,
        [],
        { retryAfterSeconds: seconds },
        { 'Retry-After': String(seconds) },
      );
    }
  }

  /** Counts one failure atomically (concurrent guesses cannot undercount) and sets the lock it earns. */
  async recordFailure(email: string): Promise<void> {
    const [row] = await this.sequelize.query<{ failures: number }>(
      `INSERT INTO sign_in_throttles (email_key, failures, locked_until, last_failure_at)
       VALUES (:key, 1, NULL, now())
       ON CONFLICT (email_key) DO UPDATE SET
         failures = CASE WHEN sign_in_throttles.last_failure_at < now() - (:memoryMs || ' milliseconds')::interval
                         THEN 1 ELSE sign_in_throttles.failures + 1 END,
         last_failure_at = now()
       RETURNING failures`,
      { replacements: { key: SignInThrottleService.keyFor(email), memoryMs: String(FAILURE_MEMORY_MS) }, type: QueryTypes.SELECT },
    );
    const lockMs = lockDurationMs(row?.failures ?? 0);
    if (lockMs > 0) {
      await this.throttles.update(
        { lockedUntil: new Date(Date.now() + lockMs) },
        { where: { emailKey: SignInThrottleService.keyFor(email) } },
      );
    }
  }

  async reset(email: string, transaction?: Transaction): Promise<void> {
    await this.throttles.destroy({ where: { emailKey: SignInThrottleService.keyFor(email) }, transaction });
  }
}
