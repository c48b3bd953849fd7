import { MAX_DELAY_MS, retryDelayMs } from './retry-schedule';

describe('retryDelayMs (exponential backoff with ±20 % jitter)', () => {
  const middle = () => 0.5;

  it('doubles from the base with each attempt', () => {
    expect([1, 2, 3, 4].map((attempt) => retryDelayMs(attempt, 5_000, middle))).toEqual([5_000, 10_000, 20_000, 40_000]);
  });

  it('stays within ±20 % of the nominal delay', () => {
    expect(retryDelayMs(2, 1_000, () => 0)).toBe(1_600);
    expect(retryDelayMs(2, 1_000, () => 0.999999)).toBe(2_400);
  });

  it('never waits longer than the cap (plus jitter)', () => {
    expect(retryDelayMs(40, 5_000, middle)).toBe(MAX_DELAY_MS);
    expect(MAX_DELAY_MS).toBe(3_600_000);
  });
});
