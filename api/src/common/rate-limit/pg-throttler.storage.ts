import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { ThrottlerStorage } from '@nestjs/throttler';
import { QueryTypes } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/**
 * Fixed-window counters in PostgreSQL, so every API process counts against the same numbers. One atomic
 * upsert per check: a window that has ended restarts at 1. `timeToExpire` is in seconds, as the
 * throttler expects.
 */
@Injectable()
export class PgThrottlerStorage implements ThrottlerStorage {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async increment(key: string, ttl: number, limit: number): Promise<ThrottlerStorageRecord> {
    const [row] = await this.sequelize.query<{ hits: number; seconds_left: number }>(
      `INSERT INTO rate_limit_counters AS counter (counter_key, hits, window_ends_at)
       VALUES ($1, 1, clock_timestamp() + ($2 || ' milliseconds')::interval)
       ON CONFLICT (counter_key) DO UPDATE SET
         hits = CASE WHEN counter.window_ends_at <= clock_timestamp() THEN 1 ELSE counter.hits + 1 END,
         window_ends_at = CASE WHEN counter.window_ends_at <= clock_timestamp()
                               THEN clock_timestamp() + ($2 || ' milliseconds')::interval
                               ELSE counter.window_ends_at END
       RETURNING hits, CEIL(EXTRACT(EPOCH FROM (window_ends_at - clock_timestamp())))::int AS seconds_left`,
      { bind: [key, String(Math.round(ttl))], type: QueryTypes.SELECT },
    );
    const totalHits = Number(row?.hits ?? 1);
    const timeToExpire = Math.max(1, Number(row?.seconds_left ?? Math.ceil(ttl / 1000)));
    const isBlocked = totalHits > limit;
    return { totalHits, timeToExpire, isBlocked, timeToBlockExpire: isBlocked ? timeToExpire : 0 };
  }

  /** Drops counters whose window ended over an hour ago (a new window starts a new row anyway). */
  async forgetSpentWindows(): Promise<void> {
    await this.sequelize.query("DELETE FROM rate_limit_counters WHERE window_ends_at < now() - interval '1 hour'");
  }
}
