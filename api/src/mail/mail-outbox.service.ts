import { Inject, Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Transporter } from 'nodemailer';
import { QueryTypes, Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { mailConfig } from '../config/configuration';
import { createMailTransport } from './mail-transport';
import { RenderedMail } from './mail-templates';
import { OutboxMessage } from './models/outbox-message.model';
import { MAX_ATTEMPTS, retryDelayMs } from './retry-schedule';

/** How long a claimed message stays invisible to other workers while one process sends it. */
const CLAIM_LEASE_MS = 60_000;
const BATCH_SIZE = 20;

/**
 * The outbox: `enqueue` writes the message in the caller's transaction (so it exists exactly when the
 * action committed) and then nudges delivery without waiting for it. A loop delivers due messages with
 * backoff. Several API processes can run the loop: rows are claimed with FOR UPDATE SKIP LOCKED and a lease,
 * so each message is sent by one of them (at least once if a process dies mid-send).
 */
@Injectable()
export class MailOutboxService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('MailOutbox');
  private transport: Transporter | undefined;
  private timer: NodeJS.Timeout | undefined;
  private running: Promise<number> | undefined;
  private rerunRequested = false;
  private stopped = false;

  constructor(
    @InjectModel(OutboxMessage) private readonly messages: typeof OutboxMessage,
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(mailConfig.KEY) private readonly config: ConfigType<typeof mailConfig>,
  ) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => this.nudge(), this.config.pollIntervalMs);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.running?.catch(() => undefined);
    this.transport?.close();
  }

  async enqueue(recipient: string, mail: RenderedMail, transaction?: Transaction): Promise<void> {
    await this.messages.create(
      { template: mail.template, recipient, subject: mail.subject, textBody: mail.text, nextAttemptAt: new Date() },
      { transaction },
    );
    if (transaction) transaction.afterCommit(() => this.nudge());
    else this.nudge();
  }

  /** Starts a delivery pass unless one is running (then it asks for one more pass afterwards). */
  nudge(): void {
    if (this.stopped) return;
    if (this.running) {
      this.rerunRequested = true;
      return;
    }
    this.running = this.deliverDue()
      .catch((error: unknown) => {
        this.logger.warn({ msg: 'mail delivery pass failed', error: error instanceof Error ? error.message : String(error) });
        return 0;
      })
      .finally(() => {
        this.running = undefined;
        if (this.rerunRequested && !this.stopped) {
          this.rerunRequested = false;
          this.nudge();
        }
      });
  }

  /** Waits for the delivery pass in progress, if any (tests and shutdown use it). */
  async settle(): Promise<void> {
    while (this.running) await this.running.catch(() => undefined);
  }

  /** Sends every due message once; returns how many were delivered. */
  async deliverDue(): Promise<number> {
    let delivered = 0;
    for (;;) {
      const batch = await this.claimBatch();
      if (batch.length === 0) return delivered;
      for (const message of batch) {
        if (await this.attempt(message)) delivered += 1;
      }
      if (batch.length < BATCH_SIZE || this.stopped) return delivered;
    }
  }

  private async claimBatch(): Promise<OutboxMessage[]> {
    const rows = await this.sequelize.query<{ id: string }>(
      `UPDATE mail_outbox SET next_attempt_at = now() + (:leaseMs || ' milliseconds')::interval
       WHERE id IN (
         SELECT id FROM mail_outbox
         WHERE sent_at IS NULL AND abandoned_at IS NULL AND next_attempt_at <= now()
         ORDER BY next_attempt_at
         LIMIT :limit
         FOR UPDATE SKIP LOCKED)
       RETURNING id`,
      { replacements: { leaseMs: String(CLAIM_LEASE_MS), limit: BATCH_SIZE }, type: QueryTypes.SELECT },
    );
    if (rows.length === 0) return [];
    return this.messages.findAll({ where: { id: rows.map((row) => row.id) } });
  }

  private async attempt(message: OutboxMessage): Promise<boolean> {
    const attempts = message.attempts + 1;
    try {
      this.transport ??= createMailTransport(this.config.smtpUrl);
      await this.transport.sendMail({
        from: this.config.from,
        to: message.recipient,
        subject: message.subject,
        text: message.textBody,
        headers: { 'X-Leastline-Template': message.template },
      });
      // The body may hold a one-time link; once delivered there is no reason to keep it at rest.
      await message.update({ attempts, sentAt: new Date(), lastError: null, textBody: '' });
      return true;
    } catch (error) {
      const reason = error instanceof Error ? error.message : String(error);
      const abandoned = attempts >= MAX_ATTEMPTS;
      await message.update({
        attempts,
        lastError: reason.slice(0, 2000),
        nextAttemptAt: new Date(Date.now() + retryDelayMs(attempts, this.config.retryBaseMs)),
        abandonedAt: abandoned ? new Date() : null,
      });
      this.logger.warn({ msg: 'mail not delivered', template: message.template, attempts, abandoned, reason });
      return false;
    }
  }
}
