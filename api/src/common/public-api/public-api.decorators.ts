import { applyDecorators, createParamDecorator, ExecutionContext, UseGuards, UseInterceptors } from '@nestjs/common';
import { IdempotentInterceptor } from '../idempotency/idempotent.interceptor';
import { ApiBearerAuth, ApiForbiddenResponse, ApiHeader, ApiSecurity, ApiTooManyRequestsResponse, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { ApiKeyScope } from '../../api-keys/api-key-scopes';
import { API_KEY_BEARER_SECURITY, API_KEY_HEADER_SECURITY, RequireScopes } from '../../api-keys/api-key.decorators';
import { ApiRateLimitGuard } from '../rate-limit/api-rate-limit.guard';
import { PublicApiGuard } from './public-api.guard';
import { PublicPrincipal, principalOf } from './public-principal';

/**
 * Marks a public-API route: API key (or console session + team header) with the given scopes, then the
 * shared rate limits. Documents the security schemes and the 401/403/429 answers.
 */
export function PublicApi(...scopes: ApiKeyScope[]) {
  return applyDecorators(
    RequireScopes(...scopes),
    UseGuards(PublicApiGuard, ApiRateLimitGuard),
    ApiBearerAuth(API_KEY_BEARER_SECURITY),
    ApiSecurity(API_KEY_HEADER_SECURITY),
    ApiUnauthorizedResponse({ description: 'Missing, malformed, unknown, revoked, expired or rotated-out key (problem details).' }),
    ApiForbiddenResponse({ description: `The key lacks one of: ${scopes.join(', ') || 'none'} (problem details).` }),
    ApiTooManyRequestsResponse({
      description:
        'A per-key or per-team quota is used up (problem details). Every answer carries `RateLimit-Policy` and `RateLimit` (IETF draft fields); a 429 also carries `Retry-After` in seconds.',
    }),
  );
}

/** For POST routes: honours `Idempotency-Key` (IETF draft) and documents the header. */
export function Idempotent() {
  return applyDecorators(UseInterceptors(IdempotentInterceptor), IdempotencyKeyHeader());
}

function IdempotencyKeyHeader() {
  return ApiHeader({
    name: 'Idempotency-Key',
    required: false,
    description:
      'Any unique string (1-255 visible ASCII characters, e.g. a UUID). A retry with the same key and the same body returns the first answer ' +
      '(header `Idempotency-Replayed: true`) and is metered once; the same key with a different body is 422; a retry while the first request ' +
      'is still running is 409. Keys are remembered for 24 hours.',
  });
}

export const CurrentPrincipal = createParamDecorator((_data: unknown, context: ExecutionContext): PublicPrincipal => {
  const principal = principalOf(context.switchToHttp().getRequest());
  if (!principal) throw new Error('@CurrentPrincipal needs @PublicApi()');
  return principal;
});
