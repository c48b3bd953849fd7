import { ExecutionContext, Injectable } from '@nestjs/common';
import { ThrottlerGuard, ThrottlerOptions } from '@nestjs/throttler';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { ProblemException } from '../problem-details/problem.exception';
import { PROBLEM_TYPES } from '../problem-details/problem-types';
import { principalOf } from '../public-api/public-principal';
import { rateLimitHeader, rateLimitPolicyHeader, PolicyState } from './rate-limit-headers';

type ThrottlerRequest = Parameters<ThrottlerGuard['handleRequest']>[0];

const POLICY_STATES = Symbol('leastline.rate-limit-states');

/**
 * The throttler guard with our answer shape: counters are per API key and per team (every route shares
 * them; see plan-limits.ts for the quotas), the IETF `RateLimit-Policy` / `RateLimit` fields on every
 * answer, and a 429 problem with `Retry-After` when a quota is spent. Runs after PublicApiGuard, which sets
 * the principal it counts against.
 */
@Injectable()
export class ApiRateLimitGuard extends ThrottlerGuard {
  protected override async handleRequest(requestProps: ThrottlerRequest): Promise<boolean> {
    const { context, limit, ttl, throttler, blockDuration, getTracker } = requestProps;
    const { req, res } = this.getRequestResponse(context);
    const tracker = await getTracker(req, context);
    const key = `${throttler.name ?? 'default'}:${tracker}`;
    const record = await this.storageService.increment(key, ttl, limit, blockDuration, throttler.name ?? 'default');
    const states = this.statesOf(req);
    states.push({
      name: throttler.name ?? 'default',
      quota: limit,
      windowSeconds: Math.round(ttl / 1000),
      remaining: limit - record.totalHits,
      resetSeconds: record.timeToExpire,
    });
    const reply = res as unknown as FastifyReply;
    void reply.header('RateLimit-Policy', rateLimitPolicyHeader(states));
    void reply.header('RateLimit', rateLimitHeader(states));
    if (record.isBlocked) {
      const retryAfter = String(Math.max(1, record.timeToBlockExpire));
      throw new ProblemException(
        PROBLEM_TYPES.rateLimited,
        `The ${throttler.name} quota of ${limit} requests per ${Math.round(ttl / 1000)} s is used up; retry in ${retryAfter} s.`,
        [],
        { policy: throttler.name },
        { 'Retry-After': retryAfter, 'RateLimit-Policy': rateLimitPolicyHeader(states), RateLimit: rateLimitHeader(states) },
      );
    }
    return true;
  }

  protected override async shouldSkip(context: ExecutionContext): Promise<boolean> {
    return principalOf(context.switchToHttp().getRequest<FastifyRequest>()) === undefined;
  }

  private statesOf(request: Record<string, unknown>): PolicyState[] {
    const holder = request as { [POLICY_STATES]?: PolicyState[] };
    holder[POLICY_STATES] ??= [];
    return holder[POLICY_STATES];
  }
}

export type { ThrottlerOptions };
