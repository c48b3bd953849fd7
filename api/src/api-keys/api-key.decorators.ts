import { applyDecorators, createParamDecorator, ExecutionContext, SetMetadata, UseGuards } from '@nestjs/common';
import { ApiBearerAuth, ApiForbiddenResponse, ApiSecurity, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { ApiKeyScope } from './api-key-scopes';
import { ApiKeyGuard, REQUIRED_SCOPES } from './api-key.guard';
import { ApiPrincipal } from './api-principal';

export const API_KEY_BEARER_SECURITY = 'apiKeyBearer';
export const API_KEY_HEADER_SECURITY = 'apiKeyHeader';

/** Scopes the key must hold for this handler (or every handler of the class). */
export const RequireScopes = (...scopes: ApiKeyScope[]) => SetMetadata(REQUIRED_SCOPES, scopes);

/** Everything a public-API route needs: the guard, the scopes, and the OpenAPI security entries. */
export function ApiKeyAuth(...scopes: ApiKeyScope[]) {
  return applyDecorators(
    UseGuards(ApiKeyGuard),
    RequireScopes(...scopes),
    ApiBearerAuth(API_KEY_BEARER_SECURITY),
    ApiSecurity(API_KEY_HEADER_SECURITY),
    ApiUnauthorizedResponse({ description: 'Missing, malformed, unknown, revoked, expired or rotated-out key (problem details).' }),
    ...(scopes.length > 0 ? [ApiForbiddenResponse({ description: `The key lacks one of: ${scopes.join(', ')} (problem details).` })] : []),
  );
}

export const CurrentApiPrincipal = createParamDecorator((_data: unknown, context: ExecutionContext): ApiPrincipal => {
  const principal = context.switchToHttp().getRequest<{ user?: ApiPrincipal }>().user;
  if (!principal) throw new Error('@CurrentApiPrincipal needs ApiKeyGuard');
  return principal;
});
