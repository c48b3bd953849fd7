import { lockDurationMs } from './sign-in-throttle-policy';

describe('lockDurationMs', () => {
  it('lets the first four failures through', () => {
    expect([0, 1, 2, 3, 4].map(lockDurationMs)).toEqual([0, 0, 0, 0, 0]);
  });

  it('locks for one minute at the fifth failure and doubles after that', () => {
    expect([5, 6, 7, 8].map(lockDurationMs)).toEqual([60_000, 120_000, 240_000, 480_000]);
  });

  it('never locks for more than an hour', () => {
    expect(lockDurationMs(50)).toBe(3_600_000);
  });
});
