import { ChevronLeftIcon, ChevronRightIcon } from '@radix-ui/react-icons';
import { Button, Flex, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useDatasetRows } from '@/features/datasets/api/get-dataset-rows';

const pageSize = 25;

// The stored rows, a page at a time; numbering starts at 1 like the data rows of the uploaded file.
export function RowsPreview({ teamId, datasetId, textColumns }: { teamId: string; datasetId: string; textColumns: ReadonlySet<string> }) {
  const [offset, setOffset] = useState(0);
  const rows = useDatasetRows(teamId, datasetId, offset, pageSize);

  if (rows.isPending) return <PageLoading />;
  if (rows.isError) return <ProblemCallout error={rows.error} />;
  const page = rows.data;
  const last = Math.min(page.offset + page.rows.length, page.total);

  return (
    <Flex direction="column" gap="2">
      <div className="ll-rows-scroll">
        <Table.Root variant="surface" size="1" className="ll-table ll-rows-table">
          <caption className="ll-visually-hidden">Rows</caption>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell justify="end">#</Table.ColumnHeaderCell>
              {page.columns.map((column) => (
                <Table.ColumnHeaderCell key={column} justify={textColumns.has(column) ? 'start' : 'end'}>
                  {column}
                </Table.ColumnHeaderCell>
              ))}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {page.rows.map((row, index) => (
              <Table.Row key={page.offset + index}>
                <Table.RowHeaderCell justify="end" className="ll-num ll-cell-muted">
                  {page.offset + index + 1}
                </Table.RowHeaderCell>
                {row.map((value, column) => (
                  <Table.Cell key={column} justify={textColumns.has(page.columns[column] ?? '') ? 'start' : 'end'} className="ll-num ll-nowrap">
                    {value === null ? <span className="ll-missing">missing</span> : String(value)}
                  </Table.Cell>
                ))}
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      </div>
      <Flex justify="between" align="center" gap="3">
        <Text size="1" color="gray" role="status">
          Rows {page.total === 0 ? 0 : page.offset + 1}–{last} of {page.total.toLocaleString()}
        </Text>
        <Flex gap="2">
          <Button size="1" variant="soft" color="gray" disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - pageSize))}>
            <ChevronLeftIcon aria-hidden="true" /> Previous
          </Button>
          <Button
            size="1"
            variant="soft"
            color="gray"
            disabled={offset + pageSize >= page.total || rows.isPlaceholderData}
            onClick={() => setOffset(offset + pageSize)}
          >
            Next <ChevronRightIcon aria-hidden="true" />
          </Button>
        </Flex>
      </Flex>
    </Flex>
  );
}
