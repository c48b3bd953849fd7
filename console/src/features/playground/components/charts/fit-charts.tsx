// Plots of a fit, drawn with recharts. This module is only reached through a lazy import from the
// playground's Plots tab, so the chart library never weighs on other pages.
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Scatter,
  ScatterChart,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { ReactNode } from 'react';
import { Text } from '@radix-ui/themes';
import { formatNumber } from '@/features/playground/model/format-statistic';
import type { QuantilePoint } from '@/features/playground/model/normal-quantile';
import '@/features/playground/components/charts/fit-charts.css';

export type XYPoint = { x: number; y: number };
export type BandPoint = { x: number; estimate: number; band: [number, number] };

const chartHeight = 260;
// recharts rounds 'auto' bounds to readable tick values around every series on the axis.
const niceDomain: ['auto', 'auto'] = ['auto', 'auto'];
const margin = { top: 8, right: 16, bottom: 28, left: 12 };

function tick(value: unknown): string {
  return typeof value === 'number' ? formatNumber(value, 3) : String(value);
}

function extent(values: number[]): [number, number] {
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (const value of values) {
    if (value < min) min = value;
    if (value > max) max = value;
  }
  if (min === max) return [min - 1, max + 1];
  const pad = (max - min) * 0.04;
  return [min - pad, max + pad];
}

export function ChartFigure({ title, caption, children }: { title: string; caption: ReactNode; children: ReactNode }) {
  return (
    <figure className="ll-chart" aria-label={title}>
      <Text as="div" size="2" weight="medium">
        {title}
      </Text>
      <div className="ll-chart-canvas">{children}</div>
      <Text as="p" size="1" color="gray">
        <figcaption>{caption}</figcaption>
      </Text>
    </figure>
  );
}

type ScatterFitProps = {
  points: XYPoint[];
  band: BandPoint[] | null;
  xLabel: string;
  yLabel: string;
  levelLabel: string;
  note?: string;
};

/** Observations against the one predictor, the fitted line and the confidence band for the mean. */
export function ScatterWithFit({ points, band, xLabel, yLabel, levelLabel, note }: ScatterFitProps) {
  return (
    <ChartFigure
      title={`${yLabel} against ${xLabel}`}
      caption={
        <>
          Hollow points are observations; the line is the fit{band ? ` and the shaded band its ${levelLabel} confidence interval for the mean` : ''}.
          {note ? ` ${note}` : ''}
        </>
      }
    >
      <ResponsiveContainer width="100%" height={chartHeight}>
        <ComposedChart margin={margin}>
          <CartesianGrid />
          <XAxis type="number" dataKey="x" domain={niceDomain} tickFormatter={tick}
            label={{ value: xLabel, position: 'insideBottom', offset: -16, className: 'll-chart-axis-label' }} />
          <YAxis type="number" dataKey="y" domain={niceDomain} tickFormatter={tick} width={64} />
          {band ? (
            <>
              <Area data={band} dataKey="band" type="monotone" className="ll-chart-band" isAnimationActive={false} />
              <Line data={band} dataKey="estimate" type="monotone" dot={false} className="ll-chart-fit-line" isAnimationActive={false} />
            </>
          ) : null}
          <Scatter data={points} dataKey="y" className="ll-chart-points" shape="circle" isAnimationActive={false} />
          <Tooltip formatter={(value) => (Array.isArray(value) ? value.map(tick).join(' to ') : tick(value))} labelFormatter={tick} />
        </ComposedChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Residuals against fitted values; a pattern or a funnel here questions the model. */
export function ResidualsChart({ points }: { points: XYPoint[] }) {
  return (
    <ChartFigure title="Residuals against fitted values" caption="Points should scatter evenly around zero with no curve or funnel.">
      <ResponsiveContainer width="100%" height={chartHeight}>
        <ScatterChart margin={margin}>
          <CartesianGrid />
          <XAxis type="number" dataKey="x" domain={niceDomain} tickFormatter={tick}
            label={{ value: 'fitted value', position: 'insideBottom', offset: -16, className: 'll-chart-axis-label' }} />
          <YAxis type="number" dataKey="y" domain={niceDomain} tickFormatter={tick} width={64} />
          <ReferenceLine y={0} className="ll-chart-reference" />
          <Scatter data={points} className="ll-chart-points" isAnimationActive={false} />
          <Tooltip formatter={tick} labelFormatter={tick} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

/** Sorted residuals against normal quantiles, with the line they would follow if exactly normal. */
export function QuantileChart({ points, standardised }: { points: QuantilePoint[]; standardised: boolean }) {
  const data = points.map((point) => ({ x: point.theoretical, y: point.sample }));
  const xDomain = extent(data.map((point) => point.x));
  const yDomain = extent(data.map((point) => point.y));
  const low = Math.max(xDomain[0], yDomain[0]);
  const high = Math.min(xDomain[1], yDomain[1]);
  return (
    <ChartFigure
      title="Normal quantile plot of the residuals"
      caption={`${standardised ? 'Standardised residuals' : 'Residuals'} against normal quantiles; near the diagonal means close to normal.`}
    >
      <ResponsiveContainer width="100%" height={chartHeight}>
        <ScatterChart margin={margin}>
          <CartesianGrid />
          <XAxis type="number" dataKey="x" domain={niceDomain} tickFormatter={tick}
            label={{ value: 'normal quantile', position: 'insideBottom', offset: -16, className: 'll-chart-axis-label' }} />
          <YAxis type="number" dataKey="y" domain={niceDomain} tickFormatter={tick} width={64} />
          {standardised && low < high ? (
            <ReferenceLine segment={[{ x: low, y: low }, { x: high, y: high }]} className="ll-chart-reference" />
          ) : null}
          <Scatter data={data} className="ll-chart-points" isAnimationActive={false} />
          <Tooltip formatter={tick} labelFormatter={tick} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}

export type PathPoint = { window: number; estimate: number; band: [number, number] };

/** One coefficient across rolling windows, with ±2 standard errors around it. */
export function CoefficientPathChart({ term, points }: { term: string; points: PathPoint[] }) {
  return (
    <ChartFigure title={`Path of ${term}`} caption="The line is the estimate in each window; the band spans two standard errors either side.">
      <ResponsiveContainer width="100%" height={220}>
        <ComposedChart data={points} margin={margin}>
          <CartesianGrid />
          <XAxis type="number" dataKey="window" domain={niceDomain} tickFormatter={tick}
            label={{ value: 'first row of window', position: 'insideBottom', offset: -16, className: 'll-chart-axis-label' }} />
          <YAxis type="number" domain={niceDomain} tickFormatter={tick} width={64} />
          <Area dataKey="band" type="linear" className="ll-chart-band" isAnimationActive={false} />
          <Line dataKey="estimate" type="linear" dot={false} className="ll-chart-fit-line" isAnimationActive={false} />
          <Tooltip formatter={(value) => (Array.isArray(value) ? value.map(tick).join(' to ') : tick(value))} labelFormatter={tick} />
        </ComposedChart>
      </ResponsiveContainer>
    </ChartFigure>
  );
}
