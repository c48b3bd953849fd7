import { Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ApiKey } from './models/api-key.model';

const FLUSH_INTERVAL_MS = 10_000;

/**
 * "Last used at / from" without a write per request: the guard notes each use in memory and this writes
 * the latest use of each key every 10 seconds (and at shutdown). The console may therefore show a
 * last-used time up to that much behind.
 */
@Injectable()
export class ApiKeyUsageRecorder implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('ApiKeyUsage');
  private pending = new Map<string, { at: Date; ipAddress: string }>();
  private timer: NodeJS.Timeout | undefined;

  constructor(@InjectModel(ApiKey) private readonly keys: typeof ApiKey) {}

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => void this.flush(), FLUSH_INTERVAL_MS);
    this.timer.unref();
  }

  async onApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.flush();
  }

  note(keyId: string, ipAddress: string): void {
    this.pending.set(keyId, { at: new Date(), ipAddress });
  }

  async flush(): Promise<void> {
    if (this.pending.size === 0) return;
    const batch = this.pending;
    this.pending = new Map();
    for (const [keyId, use] of batch) {
      try {
        await this.keys.update({ lastUsedAt: use.at, lastUsedIp: use.ipAddress }, { where: { id: keyId } });
      } catch (error) {
        this.logger.warn({ msg: 'could not record key use', keyId, error: error instanceof Error ? error.message : String(error) });
      }
    }
  }
}
