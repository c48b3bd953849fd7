import { describe, expect, it } from 'vitest';
import { daysIn, lastDays, rangeProblem } from '@/features/usage/model/date-range';
import { totalsBy, totalsByDay } from '@/features/usage/model/usage-aggregates';
import { csvField, usageCsv } from '@/features/usage/model/usage-csv';

// Invented metering rows of a fictional team.
const rows = [
  { day: '2026-11-02', apiKeyId: 'key-a', endpoint: 'fits', requests: 3, units: 4, observations: 1200 },
  { day: '2026-11-02', apiKeyId: null, endpoint: 'batch-fits', requests: 1, units: 3, observations: 90 },
  { day: '2026-11-04', apiKeyId: 'key-a', endpoint: 'fits', requests: 2, units: 2, observations: 60 },
];

describe('date ranges', () => {
  it('counts the last 30 days including today, in UTC', () => {
    expect(lastDays(30, Date.parse('2026-03-05T23:30:00Z'))).toEqual({ from: '2026-02-04', to: '2026-03-05' });
  });

  it('lists every day of a range across a month end', () => {
    expect(daysIn({ from: '2026-02-27', to: '2026-03-02' })).toEqual(['2026-02-27', '2026-02-28', '2026-03-01', '2026-03-02']);
  });

  it('explains a reversed or too long range', () => {
    expect(rangeProblem({ from: '2026-03-02', to: '2026-03-01' })).toMatch(/must not be after/);
    expect(rangeProblem({ from: '2025-01-01', to: '2026-03-01' })).toMatch(/at most 366 days/);
    expect(rangeProblem({ from: '2026-03-01', to: '2026-03-01' })).toBeNull();
  });
});

describe('usage totals', () => {
  it('fills days without usage with zeros', () => {
    const days = totalsByDay(rows, { from: '2026-11-01', to: '2026-11-04' });
    expect(days.map((day) => [day.day, day.requests, day.units])).toEqual([
      ['2026-11-01', 0, 0],
      ['2026-11-02', 4, 7],
      ['2026-11-03', 0, 0],
      ['2026-11-04', 2, 2],
    ]);
  });

  it('adds up per key with the console (no key) kept apart', () => {
    expect(totalsBy(rows, (row) => row.apiKeyId)).toEqual([
      { key: 'key-a', requests: 5, units: 6, observations: 1260 },
      { key: null, requests: 1, units: 3, observations: 90 },
    ]);
  });
});

describe('usage CSV export', () => {
  it('writes a header and one line per row with CRLF line ends', () => {
    expect(usageCsv(rows)).toBe(
      'day,api_key_id,endpoint,requests,units,observations\r\n' +
        '2026-11-02,key-a,fits,3,4,1200\r\n' +
        '2026-11-02,,batch-fits,1,3,90\r\n' +
        '2026-11-04,key-a,fits,2,2,60\r\n',
    );
  });

  it('quotes fields holding commas, quotes or line breaks (RFC 4180)', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField('plain')).toBe('plain');
    expect(csvField(null)).toBe('');
  });
});
