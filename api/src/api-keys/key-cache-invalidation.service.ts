import { Inject, Injectable, Logger, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { InjectConnection } from '@nestjs/sequelize';
import { Client, Notification } from 'pg';
import { Sequelize } from 'sequelize-typescript';
import { databaseConfig } from '../config/configuration';

/** The PostgreSQL channel on which every API process hears about revoked, rotated or re-planned keys. */
export const KEY_CACHE_CHANNEL = 'leastline_key_cache';

export type KeyCacheEviction = { kind: 'key'; publicId: string } | { kind: 'team'; teamId: string };

type Evict = (eviction: KeyCacheEviction) => void;

const RECONNECT_DELAY_MS = 2_000;

/**
 * Makes revocation immediate across API processes: the process that revokes (or rotates, or changes a
 * plan) publishes an eviction with NOTIFY, and every process, itself included, LISTENs on a dedicated
 * connection and drops the entry from its key cache. Should the listening connection drop, the cache's
 * short TTL still bounds staleness while it reconnects.
 */
@Injectable()
export class KeyCacheInvalidation implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('KeyCacheInvalidation');
  private readonly listeners: Evict[] = [];
  private client: Client | undefined;
  private stopped = false;
  private reconnectTimer: NodeJS.Timeout | undefined;

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @Inject(databaseConfig.KEY) private readonly database: ConfigType<typeof databaseConfig>,
  ) {}

  onEviction(listener: Evict): void {
    this.listeners.push(listener);
  }

  /** Tells every process (this one included) to forget the entry; never fails the caller's action. */
  async publish(eviction: KeyCacheEviction): Promise<void> {
    for (const listener of this.listeners) listener(eviction);
    const payload = eviction.kind === 'key' ? `key:${eviction.publicId}` : `team:${eviction.teamId}`;
    try {
      await this.sequelize.query('SELECT pg_notify($1, $2)', { bind: [KEY_CACHE_CHANNEL, payload] });
    } catch (error) {
      this.logger.warn({ msg: 'key cache eviction not published; other processes rely on the cache TTL', error: String(error) });
    }
  }

  async onModuleInit(): Promise<void> {
    await this.listen();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.reconnectTimer);
    await this.client?.end().catch(() => undefined);
  }

  private async listen(): Promise<void> {
    if (this.stopped) return;
    const client = new Client({ connectionString: this.database.url, connectionTimeoutMillis: 3_000 });
    client.on('notification', (message: Notification) => this.receive(message));
    client.on('error', () => this.scheduleReconnect(client));
    client.on('end', () => this.scheduleReconnect(client));
    try {
      await client.connect();
      await client.query(`LISTEN ${KEY_CACHE_CHANNEL}`);
      this.client = client;
    } catch {
      // The database may be down at boot; the app still starts (readiness reports it) and we retry.
      this.scheduleReconnect(client);
    }
  }

  private scheduleReconnect(client: Client): void {
    if (this.stopped || this.reconnectTimer) return;
    if (this.client === client) this.client = undefined;
    void client.end().catch(() => undefined);
    this.reconnectTimer = setTimeout(() => {
      this.reconnectTimer = undefined;
      void this.listen();
    }, RECONNECT_DELAY_MS);
    this.reconnectTimer.unref();
  }

  private receive(message: Notification): void {
    if (message.channel !== KEY_CACHE_CHANNEL || !message.payload) return;
    const [kind, id] = message.payload.split(':', 2);
    if (!id) return;
    const eviction: KeyCacheEviction | undefined =
      kind === 'key' ? { kind: 'key', publicId: id } : kind === 'team' ? { kind: 'team', teamId: id } : undefined;
    if (eviction) for (const listener of this.listeners) listener(eviction);
  }
}
