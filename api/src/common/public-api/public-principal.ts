/**
 * Who is calling the public API: an API key, or a signed-in console user acting through one of the team's
 * keys (the playground). Set on the request by PublicApiGuard; everything downstream (limits, metering,
 * idempotency, team scoping) reads only this.
 */
export interface PublicPrincipal {
  teamId: string;
  teamPlan: string;
  /** The key the call is attributed to (usage, limits); null only for console calls without a key. */
  keyId: string | null;
  scopes: readonly string[];
  via: 'api-key' | 'console';
  /** The signed-in user, for console calls. */
  userId?: string;
}

export interface RequestWithPrincipal {
  publicPrincipal?: PublicPrincipal;
}

export function principalOf(request: unknown): PublicPrincipal | undefined {
  return (request as RequestWithPrincipal).publicPrincipal;
}
