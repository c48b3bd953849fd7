import { Badge, Button, Card, Flex, Heading, Text } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatDateTime, formatRelative } from '@/lib/format';
import type { DatasetGroup } from '@/features/datasets/model/dataset-versions';

type Dataset = components['schemas']['DatasetDto'];

type DatasetListProps = {
  groups: DatasetGroup[];
  selectedId: string | null;
  onSelect: (dataset: Dataset) => void;
  hasMore: boolean;
  loadingMore: boolean;
  onLoadMore: () => void;
};

// Every stored dataset, one entry per name with its versions underneath, newest first.
export function DatasetList({ groups, selectedId, onSelect, hasMore, loadingMore, onLoadMore }: DatasetListProps) {
  return (
    <Card size="2" className="ll-panel ll-dataset-list">
      <Flex direction="column" gap="3">
        <Heading as="h2" size="3" weight="medium">
          Stored datasets
        </Heading>
        <ul className="ll-dataset-groups">
          {groups.map((group) => (
            <li key={group.name} className="ll-dataset-group" data-dataset-name={group.name}>
              <Flex justify="between" align="center" gap="2">
                <Text size="2" weight="medium" className="ll-dataset-name">
                  {group.name}
                </Text>
                <Text size="1" color="gray" className="ll-nowrap">
                  {group.versions.length === 1 ? '1 version' : `${group.versions.length} versions`}
                </Text>
              </Flex>
              <ul className="ll-dataset-versions">
                {group.versions.map((dataset) => (
                  <li key={dataset.id}>
                    <button
                      type="button"
                      className="ll-version-button ll-focusable"
                      aria-current={dataset.id === selectedId ? 'true' : undefined}
                      onClick={() => onSelect(dataset)}
                      aria-label={`${dataset.name} version ${dataset.version}`}
                    >
                      <Badge variant={dataset.id === selectedId ? 'solid' : 'soft'} color="jade" className="ll-num">
                        v{dataset.version}
                      </Badge>
                      <Text size="1" className="ll-num">
                        {dataset.rowCount.toLocaleString()} rows × {dataset.columns.length}
                      </Text>
                      <Text size="1" color="gray" title={formatDateTime(dataset.createdAt)}>
                        {formatRelative(dataset.createdAt)}
                      </Text>
                    </button>
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
        {hasMore ? (
          <Button variant="soft" color="gray" onClick={onLoadMore} loading={loadingMore}>
            Show older datasets
          </Button>
        ) : null}
      </Flex>
    </Card>
  );
}
