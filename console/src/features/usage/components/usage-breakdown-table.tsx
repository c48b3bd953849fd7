import { Table, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import type { UsageTotals } from '@/features/usage/model/usage-aggregates';

type BreakdownRow = UsageTotals & { id: string; label: ReactNode };

export function UsageBreakdownTable({ caption, keyHeading, rows }: { caption: string; keyHeading: string; rows: BreakdownRow[] }) {
  if (rows.length === 0) {
    return (
      <Text as="p" size="2" color="gray">
        Nothing metered in this range.
      </Text>
    );
  }
  return (
    <Table.Root variant="surface" size="1" className="ll-table">
      <caption className="ll-visually-hidden">{caption}</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>{keyHeading}</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Requests</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Units</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Observations</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {rows.map((row) => (
          <Table.Row key={row.id} data-usage-key={row.id}>
            <Table.RowHeaderCell>{row.label}</Table.RowHeaderCell>
            <Table.Cell justify="end" className="ll-num">
              {row.requests.toLocaleString()}
            </Table.Cell>
            <Table.Cell justify="end" className="ll-num">
              {row.units.toLocaleString()}
            </Table.Cell>
            <Table.Cell justify="end" className="ll-num">
              {row.observations.toLocaleString()}
            </Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
