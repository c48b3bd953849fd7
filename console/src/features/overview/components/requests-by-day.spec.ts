import { describe, expect, it } from 'vitest';
import { lastDays } from '@/features/overview/components/requests-by-day';

describe('lastDays', () => {
  it('fills the days without requests with zeros and ends today (UTC)', () => {
    const days = lastDays([{ day: '2026-11-30', requests: 4, errors: 1 }], 3, new Date('2026-12-01T15:00:00Z'));
    expect(days).toEqual([
      { day: '2026-11-29', requests: 0, errors: 0 },
      { day: '2026-11-30', requests: 4, errors: 1 },
      { day: '2026-12-01', requests: 0, errors: 0 },
    ]);
  });
});
