import { Table } from '@radix-ui/themes';
import type { PredictionResult } from '@/features/playground/api/result-payload';
import { formatInterval, formatLevel, formatNumber } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader, ResultSection } from '@/features/playground/components/results/stat-cells';

export function PredictionTable({ prediction }: { prediction: PredictionResult }) {
  const level = formatLevel(prediction.confidenceLevel);
  const logged = prediction.predictions.some((entry) => entry.originalScale !== null);
  return (
    <ResultSection
      title="Predictions"
      note={`Confidence intervals are for the mean response, prediction intervals for one new observation; t on ${prediction.degreesOfFreedom} df, form ${prediction.form}.`}
    >
      <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
        <caption className="ll-visually-hidden">Predictions</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>At</Table.ColumnHeaderCell>
            <NumberHeader>Estimate</NumberHeader>
            <NumberHeader title="Standard error of the mean response">SE mean</NumberHeader>
            <NumberHeader>{level} confidence</NumberHeader>
            <NumberHeader>{level} prediction</NumberHeader>
            {logged ? <NumberHeader title="exp of the estimate: the conditional median of y">Median of y</NumberHeader> : null}
            {logged ? <NumberHeader title="Duan's smearing estimate of the mean of y">Mean of y</NumberHeader> : null}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {prediction.predictions.map((entry, index) => (
            <Table.Row key={index}>
              <Table.RowHeaderCell className="ll-num">
                {Object.entries(entry.point)
                  .map(([name, value]) => `${name} = ${formatNumber(value)}`)
                  .join(', ')}
              </Table.RowHeaderCell>
              <NumberCell>{formatNumber(entry.modelScale.estimate)}</NumberCell>
              <NumberCell>{formatNumber(entry.modelScale.standardErrorOfMean)}</NumberCell>
              <NumberCell>{formatInterval(entry.modelScale.confidenceInterval)}</NumberCell>
              <NumberCell>{formatInterval(entry.modelScale.predictionInterval)}</NumberCell>
              {logged ? <NumberCell>{formatNumber(entry.originalScale?.estimate)}</NumberCell> : null}
              {logged ? <NumberCell>{formatNumber(entry.originalScale?.smearedMeanEstimate)}</NumberCell> : null}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </ResultSection>
  );
}
