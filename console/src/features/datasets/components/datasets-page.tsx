import { LockClosedIcon } from '@radix-ui/react-icons';
import { Card, Flex, Text } from '@radix-ui/themes';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { permissionRoles, roleAllows, roleLabels } from '@/lib/permissions';
import { useDatasets } from '@/features/datasets/api/list-datasets';
import { groupVersions } from '@/features/datasets/model/dataset-versions';
import { CsvUploadCard } from '@/features/datasets/components/csv-upload-card';
import { DatasetDetail } from '@/features/datasets/components/dataset-detail';
import { DatasetList } from '@/features/datasets/components/dataset-list';
import '@/features/datasets/components/datasets-page.css';

export function DatasetsPage() {
  const { team, account } = useCurrentTeam();
  const mayRead = roleAllows(team.yourRole, 'datasets:read');
  const mayWrite = roleAllows(team.yourRole, 'datasets:write');
  const mayFit = roleAllows(team.yourRole, 'playground:use');
  const datasets = useDatasets(team.id, mayRead);
  // The open dataset lives in the address, so a reload or a shared link shows the same one.
  const [searchParams, setSearchParams] = useSearchParams();
  const selectedId = searchParams.get('dataset');

  const groups = useMemo(() => groupVersions(datasets.data?.pages.flatMap((page) => page.items) ?? []), [datasets.data]);

  function select(datasetId: string | null) {
    setSearchParams(datasetId ? { dataset: datasetId } : {}, { replace: false });
  }

  const header = (
    <PageHeader
      title="Datasets"
      description="Observations stored once and named by id in any number of requests. Each upload under a name is a new, unchangeable version."
    />
  );

  if (!mayRead) {
    return (
      <>
        {header}
        <Card size="3" className="ll-panel">
          <EmptyState
            icon={<LockClosedIcon width="28" height="28" aria-hidden="true" />}
            title="Datasets are not part of your role"
            description={`As ${roleLabels[team.yourRole].toLowerCase()} you do not see the team's data; ${new Intl.ListFormat('en', { type: 'conjunction' }).format(permissionRoles['datasets:read'].map((role) => roleLabels[role].toLowerCase()))} members do.`}
          />
        </Card>
      </>
    );
  }

  return (
    <>
      {header}
      <Flex direction="column" gap="4">
        {mayWrite ? <CsvUploadCard teamId={team.id} onUploaded={(dataset) => select(dataset.id)} /> : null}

        {datasets.isPending ? (
          <PageLoading />
        ) : datasets.isError ? (
          <ProblemCallout error={datasets.error} />
        ) : groups.length === 0 ? (
          <Card size="3" className="ll-panel">
            <EmptyState
              title="No datasets yet"
              description="Upload a CSV file above. Its columns are summarised on arrival, and any fit can then name the dataset instead of sending the rows."
            />
          </Card>
        ) : (
          <div className="ll-datasets-grid">
            <DatasetList
              groups={groups}
              selectedId={selectedId}
              onSelect={(dataset) => select(dataset.id)}
              hasMore={datasets.hasNextPage}
              loadingMore={datasets.isFetchingNextPage}
              onLoadMore={() => void datasets.fetchNextPage()}
            />
            {selectedId ? (
              <DatasetDetail
                key={selectedId}
                teamId={team.id}
                accountId={account.id}
                datasetId={selectedId}
                mayWrite={mayWrite}
                mayFit={mayFit}
                onDeleted={() => select(null)}
              />
            ) : (
              <Card size="3" className="ll-panel">
                <Flex direction="column" align="center" justify="center" className="ll-dataset-placeholder">
                  <Text size="2" color="gray">
                    Choose a version on the left to see its column summaries and rows.
                  </Text>
                </Flex>
              </Card>
            )}
          </div>
        )}
      </Flex>
    </>
  );
}
