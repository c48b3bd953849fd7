import { MixerHorizontalIcon, TrashIcon } from '@radix-ui/react-icons';
import { Badge, Button, Card, Code, DataList, Flex, Heading, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { teamPath } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useDeleteDataset } from '@/features/datasets/api/delete-dataset';
import { useDataset } from '@/features/datasets/api/get-dataset';
import { playgroundSearch } from '@/features/datasets/model/dataset-versions';
import { ColumnSummaryTable } from '@/features/datasets/components/column-summary-table';
import { RowsPreview } from '@/features/datasets/components/rows-preview';

type DatasetDetailProps = {
  teamId: string;
  accountId: string;
  datasetId: string;
  mayWrite: boolean;
  mayFit: boolean;
  onDeleted: () => void;
};

function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** The API records the uploader as `user:<id>` or `key:<id>`; shown here in words. */
function describeUploader(createdBy: string | null, accountId: string): string {
  if (createdBy === null) return '';
  if (createdBy === `user:${accountId}`) return ' by you';
  if (createdBy.startsWith('user:')) return ' by a team member';
  if (createdBy.startsWith('key:')) return ` with API key ${createdBy.slice(4, 12)}…`;
  return ` by ${createdBy}`;
}

export function DatasetDetail({ teamId, accountId, datasetId, mayWrite, mayFit, onDeleted }: DatasetDetailProps) {
  const dataset = useDataset(teamId, datasetId);
  const remove = useDeleteDataset(teamId);
  const [confirming, setConfirming] = useState(false);
  const navigate = useNavigate();

  if (dataset.isPending) return <PageLoading />;
  if (dataset.isError) return <ProblemCallout error={dataset.error} />;
  const data = dataset.data;
  const search = playgroundSearch(data);

  return (
    <Card size="2" className="ll-panel ll-dataset-detail">
      <Flex direction="column" gap="4">
        <Flex justify="between" align="start" gap="3" wrap="wrap">
          <Flex direction="column" gap="1">
            <Flex align="center" gap="2">
              <Heading as="h2" size="4" weight="medium">
                {data.name}
              </Heading>
              <Badge color="jade" variant="soft" className="ll-num">
                version {data.version}
              </Badge>
              <Badge color="gray" variant="outline">
                {data.source.toUpperCase()}
              </Badge>
            </Flex>
            <Text size="2" color="gray">
              {data.rowCount.toLocaleString()} rows, {data.columns.length} columns, {formatBytes(data.byteSize)} stored
            </Text>
          </Flex>
          <Flex gap="2">
            {mayFit ? (
              <Button
                variant="soft"
                disabled={search === null}
                title={search === null ? 'A fit needs at least two numeric columns.' : undefined}
                onClick={() => search && navigate(`${teamPath(teamId, 'playground')}?${search}`)}
              >
                <MixerHorizontalIcon aria-hidden="true" /> Open in playground
              </Button>
            ) : null}
            {mayWrite ? (
              <Button variant="soft" color="red" onClick={() => setConfirming(true)}>
                <TrashIcon aria-hidden="true" /> Delete version
              </Button>
            ) : null}
          </Flex>
        </Flex>

        <DataList.Root size="1" orientation={{ initial: 'vertical', sm: 'horizontal' }}>
          <DataList.Item>
            <DataList.Label>Stored</DataList.Label>
            <DataList.Value>
              {formatDateTime(data.createdAt)}
              {describeUploader(data.createdBy, accountId)}
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Id</DataList.Label>
            <DataList.Value>
              <Code variant="ghost" className="ll-num">
                {data.id}
              </Code>
            </DataList.Value>
          </DataList.Item>
          <DataList.Item>
            <DataList.Label>Content hash</DataList.Label>
            <DataList.Value>
              <Code variant="ghost" className="ll-num" title={data.contentHash}>
                {data.contentHash.slice(0, 16)}…
              </Code>
            </DataList.Value>
          </DataList.Item>
        </DataList.Root>

        <section aria-label="Columns">
          <Heading as="h3" size="2" weight="medium" className="ll-section-heading">
            Columns
          </Heading>
          <ColumnSummaryTable columns={data.columns} />
        </section>

        <section aria-label="Rows preview">
          <Heading as="h3" size="2" weight="medium" className="ll-section-heading">
            Rows
          </Heading>
          <RowsPreview
            key={data.id}
            teamId={teamId}
            datasetId={data.id}
            textColumns={new Set(data.columns.filter((column) => column.kind === 'text').map((column) => column.name))}
          />
        </section>
      </Flex>

      <ConfirmDialog
        open={confirming}
        onOpenChange={(open) => {
          setConfirming(open);
          if (!open) remove.reset();
        }}
        title={`Delete ${data.name}, version ${data.version}?`}
        description="Requests that name this dataset id will fail from now on. Other versions stay. The team's audit log records the deletion."
        confirmLabel="Delete version"
        cancelLabel="Keep it"
        pending={remove.isPending}
        error={remove.error}
        onConfirm={() =>
          remove.mutate(data.id, {
            onSuccess: () => {
              setConfirming(false);
              onDeleted();
            },
          })
        }
      />
    </Card>
  );
}
