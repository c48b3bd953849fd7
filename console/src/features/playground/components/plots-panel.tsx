import { Callout, Grid, Text } from '@radix-ui/themes';
import { lazy, Suspense, useMemo } from 'react';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useBandPrediction } from '@/features/playground/api/create-band-prediction';
import { useDatasetColumn } from '@/features/playground/api/get-dataset-column';
import type { PlaygroundAuth } from '@/features/playground/api/playground-auth';
import type { FitResult, ResultPayload, RollingResult } from '@/features/playground/api/result-payload';
import { evenGrid, predictorIsLogged, responseIsLogged, thinnedIndices, usedValues } from '@/features/playground/model/fit-geometry';
import { formatLevel } from '@/features/playground/model/format-statistic';
import { normalQuantilePoints } from '@/features/playground/model/normal-quantile';

// The chart library loads with the first plot, not with the page (all four share one chunk).
const loadCharts = () => import('@/features/playground/components/charts/fit-charts');
const ScatterWithFit = lazy(() => loadCharts().then((module) => ({ default: module.ScatterWithFit })));
const ResidualsChart = lazy(() => loadCharts().then((module) => ({ default: module.ResidualsChart })));
const QuantileChart = lazy(() => loadCharts().then((module) => ({ default: module.QuantileChart })));
const CoefficientPathChart = lazy(() => loadCharts().then((module) => ({ default: module.CoefficientPathChart })));

const bandPointCount = 40;
const maxPlottedPoints = 3000;

function inlineColumn(request: unknown, name: string): unknown[] | null {
  if (typeof request !== 'object' || request === null) return null;
  const data = (request as { data?: { columns?: Record<string, unknown> } }).data;
  const column = data?.columns?.[name];
  return Array.isArray(column) ? column : null;
}

function FitPlots({ payload, fit, request, auth }: { payload: ResultPayload; fit: FitResult; request: unknown; auth: PlaygroundAuth }) {
  const observations = fit.observations;
  const onePredictor = fit.predictors.length === 1 ? (fit.predictors[0] ?? null) : null;
  const source = payload.source;
  const fromDataset = source?.kind === 'dataset' && source.datasetId ? source.datasetId : null;
  const inline = onePredictor ? inlineColumn(request, onePredictor) : null;
  const datasetColumn = useDatasetColumn(onePredictor && !inline ? fromDataset : null, onePredictor, auth);
  const rawX = inline ?? datasetColumn.data ?? null;
  const xOriginal = useMemo(() => (rawX ? usedValues(rawX, payload.rows?.dropped ?? []) : null), [rawX, payload.rows]);
  const xUsable = xOriginal !== null && observations !== undefined && xOriginal.length === observations.fitted.length;

  const grid = useMemo(() => {
    if (!xUsable || !xOriginal) return [];
    let min = Number.POSITIVE_INFINITY;
    let max = Number.NEGATIVE_INFINITY;
    for (const value of xOriginal) {
      min = Math.min(min, value);
      max = Math.max(max, value);
    }
    return evenGrid(min, max, bandPointCount);
  }, [xUsable, xOriginal]);
  const band = useBandPrediction(xUsable && payload.kind === 'fit' ? payload.id : null, grid, auth);

  if (!observations) {
    return (
      <Callout.Root color="gray" size="1" variant="surface">
        <Callout.Text>
          Plots need per-row results: add <code>&quot;includeObservations&quot;: true</code> to the request and send it again.
        </Callout.Text>
      </Callout.Root>
    );
  }

  const logX = predictorIsLogged(fit.form);
  const toModelX = (value: number) => (logX ? Math.log(value) : value);
  const keep = thinnedIndices(observations.fitted.length, maxPlottedPoints);
  const thinned = keep.length < observations.fitted.length;
  const residualPoints = keep.map((index) => ({ x: observations.fitted[index] ?? 0, y: observations.residuals[index] ?? 0 }));
  const standardised = observations.standardisedResiduals.some((value) => value !== null);
  const quantiles = normalQuantilePoints(standardised ? observations.standardisedResiduals : observations.residuals);
  const scatterPoints =
    xUsable && xOriginal
      ? keep.map((index) => ({
          x: toModelX(xOriginal[index] ?? 0),
          y: (observations.fitted[index] ?? 0) + (observations.residuals[index] ?? 0),
        }))
      : null;
  const bandPoints =
    band.data?.prediction.predictions.map((entry, index) => ({
      x: toModelX(grid[index] ?? 0),
      estimate: entry.modelScale.estimate,
      band: [entry.modelScale.confidenceInterval.lower, entry.modelScale.confidenceInterval.upper] as [number, number],
    })) ?? null;
  const xLabel = onePredictor ? (logX ? `ln ${onePredictor}` : onePredictor) : '';
  const yLabel = responseIsLogged(fit.form) ? `ln ${fit.response}` : fit.response;

  return (
    <Suspense fallback={<PageLoading />}>
      {thinned ? (
        <Text as="p" size="1" color="gray">
          Every {Math.ceil(observations.fitted.length / maxPlottedPoints)}th row is drawn to keep the charts responsive.
        </Text>
      ) : null}
      <Grid columns={{ initial: '1', lg: '2' }} gap="5" className="ll-plots">
        {scatterPoints ? (
          <ScatterWithFit
            points={scatterPoints}
            band={bandPoints}
            xLabel={xLabel}
            yLabel={yLabel}
            levelLabel={formatLevel(fit.confidenceLevel)}
            note={band.isPending && payload.kind === 'fit' ? 'Loading the band…' : undefined}
          />
        ) : (
          <Callout.Root color="gray" size="1" variant="surface">
            <Callout.Text>
              {onePredictor
                ? 'The predictor values could not be read back for this fit, so only the residual plots are drawn.'
                : 'A scatter with the fitted line is drawn for one-predictor fits.'}
            </Callout.Text>
          </Callout.Root>
        )}
        <ResidualsChart points={residualPoints} />
        <QuantileChart points={quantiles} standardised={standardised} />
      </Grid>
      {band.isError ? <ProblemCallout error={band.error} fallback="The confidence band could not be computed." /> : null}
    </Suspense>
  );
}

function RollingPlots({ rolling }: { rolling: RollingResult }) {
  return (
    <Suspense fallback={<PageLoading />}>
      <Grid columns={{ initial: '1', lg: '2' }} gap="5" className="ll-plots">
        {rolling.coefficientPath.map((path) => (
          <CoefficientPathChart
            key={path.term}
            term={path.term}
            points={path.estimates.map((estimate, index) => {
              const twoErrors = 2 * (path.standardErrors[index] ?? 0);
              return { window: rolling.windowStart[index] ?? index, estimate, band: [estimate - twoErrors, estimate + twoErrors] };
            })}
          />
        ))}
      </Grid>
    </Suspense>
  );
}

export function PlotsPanel({ payload, request, auth }: { payload: ResultPayload; request: unknown; auth: PlaygroundAuth }) {
  if (payload.fit) return <FitPlots payload={payload} fit={payload.fit} request={request} auth={auth} />;
  if (payload.rolling) return <RollingPlots rolling={payload.rolling} />;
  return (
    <Text as="p" size="2" color="gray">
      Plots are drawn for fits (with observations) and rolling fits; this result is shown as tables.
    </Text>
  );
}
