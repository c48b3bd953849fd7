import type { components } from '@/lib/api-schema';
import { daysIn, type DayRange } from '@/features/usage/model/date-range';

type UsageRow = components['schemas']['UsageRowDto'];

export type UsageTotals = { requests: number; units: number; observations: number };
export type DayTotals = UsageTotals & { day: string };

function add(into: UsageTotals, row: UsageTotals): void {
  into.requests += row.requests;
  into.units += row.units;
  into.observations += row.observations;
}

/** One entry per day of the range, zero where nothing was metered, so the chart's time axis has no gaps. */
export function totalsByDay(rows: readonly UsageRow[], range: DayRange): DayTotals[] {
  const days = new Map(daysIn(range).map((day) => [day, { day, requests: 0, units: 0, observations: 0 }]));
  for (const row of rows) {
    const entry = days.get(row.day);
    if (entry) add(entry, row);
  }
  return [...days.values()];
}

/** Totals per value of `key` (e.g. API key or endpoint), largest unit count first. */
export function totalsBy<Key extends string | null>(
  rows: readonly UsageRow[],
  key: (row: UsageRow) => Key,
): Array<UsageTotals & { key: Key }> {
  const groups = new Map<Key, UsageTotals & { key: Key }>();
  for (const row of rows) {
    const value = key(row);
    const entry = groups.get(value) ?? { key: value, requests: 0, units: 0, observations: 0 };
    add(entry, row);
    groups.set(value, entry);
  }
  return [...groups.values()].sort((first, second) => second.units - first.units || second.requests - first.requests);
}
