import { Badge, Table, Text } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';

type Column = components['schemas']['DatasetColumnDto'];

const missing = '–';

function figure(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return missing;
  const magnitude = Math.abs(value);
  if (value !== 0 && (magnitude >= 1e9 || magnitude < 1e-4)) return value.toExponential(4);
  return Number(value.toPrecision(6)).toLocaleString(undefined, { maximumFractionDigits: 6 });
}

function Num({ children }: { children: string }) {
  return (
    <Table.Cell justify="end" className="ll-num ll-nowrap">
      {children}
    </Table.Cell>
  );
}

// What the API computed for each column when the dataset was stored.
export function ColumnSummaryTable({ columns }: { columns: Column[] }) {
  return (
    <Table.Root variant="surface" size="1" className="ll-table ll-summary-table">
      <caption className="ll-visually-hidden">Column summaries</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>Column</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Kind</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Values</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Missing</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Mean</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end" title="Sample standard deviation (n − 1)">
            Std. dev.
          </Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Min</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Max</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {columns.map((column) => (
          <Table.Row key={column.name} data-column={column.name}>
            <Table.RowHeaderCell>
              <code className="ll-column-name">{column.name}</code>
              {column.kind === 'text' && column.firstTextValue !== undefined ? (
                <Text as="div" size="1" color="gray">
                  Row {column.firstTextRow}: “{column.firstTextValue}”
                </Text>
              ) : null}
            </Table.RowHeaderCell>
            <Table.Cell>
              <Badge color={column.kind === 'numeric' ? 'jade' : 'gray'} variant="soft">
                {column.kind}
              </Badge>
            </Table.Cell>
            <Num>{column.count.toLocaleString()}</Num>
            <Num>{column.missing.toLocaleString()}</Num>
            <Num>{figure(column.mean)}</Num>
            <Num>{figure(column.standardDeviation)}</Num>
            <Num>{figure(column.min)}</Num>
            <Num>{figure(column.max)}</Num>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
