import { PROBLEM_TYPES, problemTypeForStatus } from './problem-types';

describe('problem type catalogue', () => {
  it('maps bare statuses to the generic types, not to a specific one listed nearby', () => {
    expect(problemTypeForStatus(401).slug).toBe('unauthenticated');
    expect(problemTypeForStatus(403).slug).toBe('forbidden');
    expect(problemTypeForStatus(404).slug).toBe('not-found');
    expect(problemTypeForStatus(429).slug).toBe('rate-limited');
  });

  it('uses each slug once', () => {
    const slugs = Object.values(PROBLEM_TYPES).map((type) => type.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
  });
});
