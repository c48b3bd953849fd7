/**
 * The IETF RateLimit header fields (draft-ietf-httpapi-ratelimit-headers): `RateLimit-Policy` lists each
 * policy as `"<name>";q=<quota>;w=<window seconds>`, `RateLimit` gives `"<name>";r=<remaining>;t=<seconds
 * until the window resets>`. Several policies appear as one comma-separated list.
 */
export interface PolicyState {
  name: string;
  quota: number;
  windowSeconds: number;
  remaining: number;
  resetSeconds: number;
}

export function rateLimitPolicyHeader(policies: PolicyState[]): string {
  return policies.map((policy) => `"${policy.name}";q=${policy.quota};w=${policy.windowSeconds}`).join(', ');
}

export function rateLimitHeader(policies: PolicyState[]): string {
  return policies.map((policy) => `"${policy.name}";r=${Math.max(0, policy.remaining)};t=${Math.max(0, policy.resetSeconds)}`).join(', ');
}
