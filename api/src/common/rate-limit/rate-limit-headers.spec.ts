import { rateLimitHeader, rateLimitPolicyHeader } from './rate-limit-headers';

describe('RateLimit header fields (IETF draft-ietf-httpapi-ratelimit-headers, structured-field lists)', () => {
  const policies = [
    { name: 'per-key', quota: 60, windowSeconds: 60, remaining: 12, resetSeconds: 31 },
    { name: 'per-team', quota: 120, windowSeconds: 60, remaining: -3, resetSeconds: 31 },
  ];

  it('lists each policy with its quota and window', () => {
    expect(rateLimitPolicyHeader(policies)).toBe('"per-key";q=60;w=60, "per-team";q=120;w=60');
  });

  it('never reports negative remaining quota', () => {
    expect(rateLimitHeader(policies)).toBe('"per-key";r=12;t=31, "per-team";r=0;t=31');
  });
});
