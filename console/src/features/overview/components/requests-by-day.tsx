import type { components } from '@/lib/api-schema';

type Day = components['schemas']['DailyRequestsDto'];

const WIDTH = 300;
const DAY_MS = 86_400_000;

/** One entry per UTC day of the last `span` days, today last; days without requests count zero. */
export function lastDays(active: Day[], span: number, today = new Date()): Day[] {
  const byDay = new Map(active.map((day) => [day.day, day]));
  const end = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate());
  return Array.from({ length: span }, (_, index) => {
    const day = new Date(end - (span - 1 - index) * DAY_MS).toISOString().slice(0, 10);
    return byDay.get(day) ?? { day, requests: 0, errors: 0 };
  });
}
const HEIGHT = 64;

/**
 * Requests per day as small bars (errors in the accent's warning colour on top), drawn as plain SVG so
 * the overview does not pull in the chart library.
 */
export function RequestsByDay({ days: active, span = 30 }: { days: Day[]; span?: number }) {
  const days = lastDays(active, span);
  const max = Math.max(1, ...days.map((day) => day.requests));
  const slot = WIDTH / days.length;
  const total = days.reduce((sum, day) => sum + day.requests, 0);
  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      width="100%"
      height={HEIGHT}
      role="img"
      aria-label={`${total} requests over the last ${span} days`}
      className="ll-day-bars"
    >
      {days.map((day, index) => {
        const height = (day.requests / max) * (HEIGHT - 4);
        const errorHeight = (day.errors / max) * (HEIGHT - 4);
        const x = index * slot + slot * 0.15;
        const width = slot * 0.7;
        return (
          <g key={day.day}>
            <title>{`${day.day}: ${day.requests} requests, ${day.errors} errors`}</title>
            <rect x={x} y={HEIGHT - height} width={width} height={height} className="ll-day-bar" />
            {day.errors > 0 && <rect x={x} y={HEIGHT - height} width={width} height={errorHeight} className="ll-day-bar-error" />}
          </g>
        );
      })}
    </svg>
  );
}
