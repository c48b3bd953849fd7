import { Table } from '@radix-ui/themes';
import type { RollingResult } from '@/features/playground/api/result-payload';
import { formatNumber } from '@/features/playground/model/format-statistic';
import { NumberCell, NumberHeader, ResultSection, TermCell } from '@/features/playground/components/results/stat-cells';

function spread(values: number[]) {
  return { first: values[0], last: values[values.length - 1], min: Math.min(...values), max: Math.max(...values) };
}

export function RollingTable({ rolling }: { rolling: RollingResult }) {
  return (
    <ResultSection
      title={`${rolling.windowCount} windows of ${rolling.windowLength} rows`}
      note={`The window moves ${rolling.step} rows at a time; form ${rolling.form}. The path chart is on the Plots tab.`}
    >
      <Table.Root variant="surface" size="1" className="ll-table ll-stat-table">
        <caption className="ll-visually-hidden">Rolling coefficients</caption>
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Term</Table.ColumnHeaderCell>
            <NumberHeader>First window</NumberHeader>
            <NumberHeader>Last window</NumberHeader>
            <NumberHeader>Lowest</NumberHeader>
            <NumberHeader>Highest</NumberHeader>
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {rolling.coefficientPath.map((path) => {
            const summary = spread(path.estimates);
            return (
              <Table.Row key={path.term}>
                <TermCell>{path.term}</TermCell>
                <NumberCell>{formatNumber(summary.first)}</NumberCell>
                <NumberCell>{formatNumber(summary.last)}</NumberCell>
                <NumberCell>{formatNumber(summary.min)}</NumberCell>
                <NumberCell>{formatNumber(summary.max)}</NumberCell>
              </Table.Row>
            );
          })}
          <Table.Row>
            <TermCell>R²</TermCell>
            {(() => {
              const summary = spread(rolling.rSquared);
              return (
                <>
                  <NumberCell>{formatNumber(summary.first, 4)}</NumberCell>
                  <NumberCell>{formatNumber(summary.last, 4)}</NumberCell>
                  <NumberCell>{formatNumber(summary.min, 4)}</NumberCell>
                  <NumberCell>{formatNumber(summary.max, 4)}</NumberCell>
                </>
              );
            })()}
          </Table.Row>
        </Table.Body>
      </Table.Root>
    </ResultSection>
  );
}
