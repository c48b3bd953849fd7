// The daily usage chart. Reached only through a lazy import from the usage page, so the chart library
// stays out of every other page's code.
import { Bar, CartesianGrid, ComposedChart, Line, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { DayTotals } from '@/features/usage/model/usage-aggregates';
import '@/features/usage/components/usage-chart.css';

const dayLabel = new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric', timeZone: 'UTC' });

function shortDay(value: unknown): string {
  return typeof value === 'string' ? dayLabel.format(new Date(`${value}T00:00:00Z`)) : String(value);
}

export function UsageChart({ days }: { days: DayTotals[] }) {
  return (
    <figure className="ll-usage-chart" aria-label="Units and requests per day">
      <div className="ll-usage-legend" aria-hidden="true">
        <span>
          <span className="ll-usage-swatch ll-usage-swatch-units" /> Units (left axis)
        </span>
        <span>
          <span className="ll-usage-swatch ll-usage-swatch-requests" /> Billable requests (right axis)
        </span>
      </div>
      <ResponsiveContainer width="100%" height={280}>
        <ComposedChart data={days} margin={{ top: 8, right: 8, bottom: 4, left: 4 }}>
          <CartesianGrid vertical={false} />
          <XAxis dataKey="day" tickFormatter={shortDay} minTickGap={24} />
          <YAxis yAxisId="units" allowDecimals={false} width={48} />
          <YAxis yAxisId="requests" orientation="right" allowDecimals={false} width={48} />
          <Bar yAxisId="units" dataKey="units" name="Units" className="ll-usage-units" isAnimationActive={false} maxBarSize={18} />
          <Line
            yAxisId="requests"
            dataKey="requests"
            name="Billable requests"
            type="linear"
            dot={false}
            className="ll-usage-requests"
            isAnimationActive={false}
          />
          <Tooltip labelFormatter={shortDay} />
        </ComposedChart>
      </ResponsiveContainer>
      <figcaption className="ll-visually-hidden">Units as bars against the left axis, billable requests as a line against the right axis, per UTC day.</figcaption>
    </figure>
  );
}
