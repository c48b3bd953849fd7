import { Global, Module, OnModuleDestroy, OnModuleInit } from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import { getConnectionToken, InjectConnection } from '@nestjs/sequelize';
import { ThrottlerModule } from '@nestjs/throttler';
import type { ExecutionContext } from '@nestjs/common';
import type { FastifyInstance, FastifyRequest } from 'fastify';
import { Sequelize } from 'sequelize-typescript';
import { ApiKeysModule } from '../../api-keys/api-keys.module';
import { AuthModule } from '../../auth/auth.module';
import { UsageModule } from '../../usage/usage.module';
import { UsageService } from '../../usage/usage.service';
import { IdempotencyService } from '../idempotency/idempotency.service';
import { IdempotentInterceptor } from '../idempotency/idempotent.interceptor';
import { ApiRateLimitGuard } from '../rate-limit/api-rate-limit.guard';
import { PgThrottlerStorage } from '../rate-limit/pg-throttler.storage';
import { limitsForPlan, RATE_LIMIT_WINDOW_MS } from '../rate-limit/plan-limits';
import { PublicApiGuard } from './public-api.guard';
import { principalOf } from './public-principal';

const HOUSEKEEPING_INTERVAL_MS = 60 * 60 * 1000;
/** The console's overview looks back 30 days; three months leaves room for support questions. */
const REQUEST_LOG_RETENTION_DAYS = 90;

function principalFrom(context: ExecutionContext) {
  return principalOf(context.switchToHttp().getRequest());
}

/**
 * Everything the public API shares: who is calling (PublicApiGuard), how often they may (throttler with a
 * PostgreSQL store shared by all processes), idempotent POSTs, and the request log behind the console's
 * overview. Global, so each feature module just uses @PublicApi().
 */
@Global()
@Module({
  imports: [
    ApiKeysModule,
    AuthModule,
    UsageModule,
    ThrottlerModule.forRootAsync({
      inject: [getConnectionToken()],
      useFactory: (sequelize: Sequelize) => ({
        storage: new PgThrottlerStorage(sequelize),
        throttlers: [
          {
            name: 'per-key',
            ttl: RATE_LIMIT_WINDOW_MS,
            limit: (context: ExecutionContext) => limitsForPlan(principalFrom(context)?.teamPlan).perKeyPerMinute,
            getTracker: (request: Record<string, unknown>) => {
              const principal = principalOf(request);
              return principal?.keyId ? `key:${principal.keyId}` : `console:${principal?.teamId}:${principal?.userId}`;
            },
          },
          {
            name: 'per-team',
            ttl: RATE_LIMIT_WINDOW_MS,
            limit: (context: ExecutionContext) => limitsForPlan(principalFrom(context)?.teamPlan).perTeamPerMinute,
            getTracker: (request: Record<string, unknown>) => `team:${principalOf(request)?.teamId}`,
          },
        ],
      }),
    }),
  ],
  providers: [PublicApiGuard, ApiRateLimitGuard, IdempotencyService, IdempotentInterceptor],
  exports: [PublicApiGuard, ApiRateLimitGuard, IdempotencyService, IdempotentInterceptor, ApiKeysModule, AuthModule, UsageModule, ThrottlerModule],
})
export class PublicApiModule implements OnModuleInit, OnModuleDestroy {
  private housekeeping: NodeJS.Timeout | undefined;

  constructor(
    private readonly adapterHost: HttpAdapterHost,
    private readonly usage: UsageService,
    private readonly idempotency: IdempotencyService,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {}

  onModuleDestroy(): void {
    clearInterval(this.housekeeping);
  }

  /**
   * Logs every public-API answer (any status) once the caller is known, for the console's overview. Reads of
   * the usage report itself are left out, so watching the overview does not fill it with its own requests.
   */
  onModuleInit(): void {
    this.housekeeping = setInterval(() => void this.tidy(), HOUSEKEEPING_INTERVAL_MS);
    this.housekeeping.unref();
    const fastify = this.adapterHost.httpAdapter?.getInstance() as FastifyInstance | undefined;
    if (!fastify) return;
    fastify.addHook('onResponse', async (request: FastifyRequest, reply) => {
      const principal = principalOf(request);
      const route = request.routeOptions.url ?? request.url.split('?')[0] ?? '';
      if (!principal || route.startsWith('/v1/usage')) return;
      try {
        await this.usage.logRequest({
          teamId: principal.teamId,
          apiKeyId: principal.keyId,
          method: request.method,
          route,
          status: reply.statusCode,
          durationMs: Math.round(reply.elapsedTime * 10) / 10,
          requestId: String(request.id),
        });
      } catch (error) {
        request.log.warn({ err: error }, 'request log write failed');
      }
    });
  }

  /** Forgets expired idempotency keys, old request-log lines and spent rate-limit windows (hourly). */
  private async tidy(): Promise<void> {
    try {
      await this.idempotency.forgetExpired();
      await this.usage.forgetOldRequests(REQUEST_LOG_RETENTION_DAYS);
      await new PgThrottlerStorage(this.sequelize).forgetSpentWindows();
    } catch {
      // Housekeeping is retried on the next tick; a database hiccup must not disturb serving.
    }
  }
}
