import { Table } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatLevel, formatNumber, formatPValue } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader, TermCell } from '@/features/playground/components/results/stat-cells';

type CoefficientRow = components['schemas']['CoefficientRowDto'];

type CoefficientTableProps = {
  rows: CoefficientRow[];
  confidenceLevel: number;
  label: string;
  /** Bounds on the relative error of each estimate and standard error, as the API states them. */
  accuracy?: { estimates?: (number | null)[]; standardErrors?: (number | null)[] };
};

/** "≤ 2.2e-16", or a dash where no bound is stated. */
function bound(value: number | null | undefined): string {
  return value === null || value === undefined ? '–' : `≤ ${value.toExponential(1)}`;
}

export function CoefficientTable({ rows, confidenceLevel, label, accuracy }: CoefficientTableProps) {
  const level = formatLevel(confidenceLevel);
  const showAccuracy = accuracy !== undefined && (accuracy.estimates !== undefined || accuracy.standardErrors !== undefined);
  return (
    <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
      <caption className="ll-visually-hidden">{label}</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Term</Table.ColumnHeaderCell>
          <NumberHeader>Estimate</NumberHeader>
          <NumberHeader title="Standard error">Std. error</NumberHeader>
          <NumberHeader title="t-statistic">t</NumberHeader>
          <NumberHeader title="Two-sided p-value">p-value</NumberHeader>
          <NumberHeader>{level} CI low</NumberHeader>
          <NumberHeader>{level} CI high</NumberHeader>
          {showAccuracy ? (
            <NumberHeader title="Upper bound on the relative error of the estimate and of its standard error, for the numbers sent (computed after the fit)">
              Error bound
            </NumberHeader>
          ) : null}
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((row, index) => (
          <Table.Row key={row.term} data-term={row.term}>
            <TermCell>{row.term}</TermCell>
            <NumberCell>{formatNumber(row.estimate)}</NumberCell>
            <NumberCell>{formatNumber(row.standardError)}</NumberCell>
            <NumberCell>{formatNumber(row.tStatistic, 4)}</NumberCell>
            <NumberCell>{formatPValue(row.pValue)}</NumberCell>
            <NumberCell>{formatNumber(row.confidenceInterval.lower)}</NumberCell>
            <NumberCell>{formatNumber(row.confidenceInterval.upper)}</NumberCell>
            {showAccuracy ? (
              <NumberCell>
                <span data-accuracy={row.term}>
                  {accuracy?.estimates ? bound(accuracy.estimates[index]) : '–'} / {accuracy?.standardErrors ? bound(accuracy.standardErrors[index]) : '–'}
                </span>
              </NumberCell>
            ) : null}
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
