import { Table } from '@radix-ui/themes';
import type { FitResult } from '@/features/playground/api/result-payload';
import { formatNumber, formatPValue } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader } from '@/features/playground/components/results/stat-cells';

export function AnovaTable({ anova }: { anova: FitResult['anova'] }) {
  const lines = [
    { source: 'Model', line: anova.regression, showF: true },
    { source: 'Residual', line: anova.residual, showF: false },
    { source: 'Total', line: anova.total, showF: false },
  ];
  return (
    <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
      <caption className="ll-visually-hidden">Analysis of variance</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Source</Table.ColumnHeaderCell>
          <NumberHeader title="Degrees of freedom">df</NumberHeader>
          <NumberHeader>Sum of squares</NumberHeader>
          <NumberHeader>Mean square</NumberHeader>
          <NumberHeader>F</NumberHeader>
          <NumberHeader>p-value</NumberHeader>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {lines.map(({ source, line, showF }) => (
          <Table.Row key={source}>
            <Table.RowHeaderCell>{source}</Table.RowHeaderCell>
            <NumberCell>{line.degreesOfFreedom}</NumberCell>
            <NumberCell>{formatNumber(line.sumOfSquares)}</NumberCell>
            <NumberCell>{source === 'Total' ? '' : formatNumber(line.meanSquare)}</NumberCell>
            <NumberCell>{showF ? formatNumber(anova.fStatistic, 5) : ''}</NumberCell>
            <NumberCell>{showF ? formatPValue(anova.fPValue) : ''}</NumberCell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
