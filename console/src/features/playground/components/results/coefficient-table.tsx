import { Table } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatLevel, formatNumber, formatPValue } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader, TermCell } from '@/features/playground/components/results/stat-cells';

type CoefficientRow = components['schemas']['CoefficientRowDto'];

type CoefficientTableProps = {
  rows: CoefficientRow[];
  confidenceLevel: number;
  label: string;
};

export function CoefficientTable({ rows, confidenceLevel, label }: CoefficientTableProps) {
  const level = formatLevel(confidenceLevel);
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
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((row) => (
          <Table.Row key={row.term} data-term={row.term}>
            <TermCell>{row.term}</TermCell>
            <NumberCell>{formatNumber(row.estimate)}</NumberCell>
            <NumberCell>{formatNumber(row.standardError)}</NumberCell>
            <NumberCell>{formatNumber(row.tStatistic, 4)}</NumberCell>
            <NumberCell>{formatPValue(row.pValue)}</NumberCell>
            <NumberCell>{formatNumber(row.confidenceInterval.lower)}</NumberCell>
            <NumberCell>{formatNumber(row.confidenceInterval.upper)}</NumberCell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
