import { ProblemException } from '../problem-details/problem.exception';
import { decodeCursor, encodeCursor, nextPageLink } from './cursor';

describe('cursors', () => {
  it('round-trips a position', () => {
    expect(decodeCursor(encodeCursor({ before: '42' }), ['before'])).toEqual({ before: '42' });
  });

  it('rejects garbage and cursors missing a key with a problem pointing at #/cursor', () => {
    for (const cursor of ['%%%', Buffer.from('[1]').toString('base64url'), encodeCursor({ after: '1' })]) {
      try {
        decodeCursor(cursor, ['before']);
        throw new Error('expected a problem');
      } catch (error) {
        expect(error).toBeInstanceOf(ProblemException);
        expect((error as ProblemException).fieldErrors[0]?.pointer).toBe('#/cursor');
      }
    }
  });

  it('builds an RFC 8288 next link that keeps the other parameters', () => {
    expect(nextPageLink('https://api.example.test', '/v1/teams/t/audit-events', { limit: '2', action: undefined, cursor: 'abc' })).toBe(
      '<https://api.example.test/v1/teams/t/audit-events?limit=2&cursor=abc>; rel="next"',
    );
  });
});
