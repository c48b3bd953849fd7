// Usage is metered by UTC day, so ranges are plain YYYY-MM-DD strings counted in UTC.

const dayMs = 86_400_000;

export type DayRange = { from: string; to: string };

export function isoDay(time: number): string {
  return new Date(time).toISOString().slice(0, 10);
}

function dayStart(day: string): number {
  return Date.parse(`${day}T00:00:00Z`);
}

/** The last `days` UTC days up to and including today. */
export function lastDays(days: number, now = Date.now()): DayRange {
  const today = dayStart(isoDay(now));
  return { from: isoDay(today - (days - 1) * dayMs), to: isoDay(today) };
}

/** Days from `from` to `to`, both included; empty when the range is reversed or not real dates. */
export function daysIn({ from, to }: DayRange): string[] {
  const start = dayStart(from);
  const end = dayStart(to);
  if (!Number.isFinite(start) || !Number.isFinite(end) || end < start) return [];
  const days: string[] = [];
  for (let time = start; time <= end; time += dayMs) days.push(isoDay(time));
  return days;
}

/** The API accepts 1 to 366 days with from ≤ to. */
export const maxRangeDays = 366;

export function rangeProblem(range: DayRange): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(range.from) || !/^\d{4}-\d{2}-\d{2}$/.test(range.to)) return 'Choose both dates.';
  const count = daysIn(range).length;
  if (count === 0) return 'The first day must not be after the last.';
  if (count > maxRangeDays) return `Choose at most ${maxRangeDays} days.`;
  return null;
}
