import { Badge, Button, Flex, Text } from '@radix-ui/themes';
import { formatDateTime, formatRelative } from '@/lib/format';
import { endpoints } from '@/features/playground/model/endpoints';
import type { HistoryEntry } from '@/features/playground/model/request-history';

type HistoryPanelProps = {
  entries: HistoryEntry[];
  onRestore: (entry: HistoryEntry) => void;
  onClear: () => void;
};

function statusColour(status: number | null) {
  if (status === null) return 'gray' as const;
  return status < 400 ? ('jade' as const) : ('red' as const);
}

export function HistoryPanel({ entries, onRestore, onClear }: HistoryPanelProps) {
  if (entries.length === 0) {
    return (
      <Text as="p" size="2" color="gray">
        Requests you send appear here, newest first. They are kept in this browser only, for your account and this team.
      </Text>
    );
  }
  return (
    <Flex direction="column" gap="2">
      <ol className="ll-history" aria-label="Recent requests">
        {entries.map((entry) => (
          <li key={entry.id}>
            <button
              type="button"
              className="ll-history-item ll-focusable"
              onClick={() => onRestore(entry)}
              disabled={entry.request === null && entry.resultId === null}
              aria-label={`Restore ${endpoints[entry.endpoint].label.toLowerCase()} request from ${formatDateTime(entry.at)}`}
            >
              <Badge color={statusColour(entry.status)} variant="soft" className="ll-num">
                {entry.status ?? 'failed'}
              </Badge>
              <Text size="2" weight="medium">
                {endpoints[entry.endpoint].label}
              </Text>
              <Text size="1" color="gray" title={formatDateTime(entry.at)}>
                {formatRelative(entry.at)}
              </Text>
              <Text size="1" color="gray" className="ll-num ll-history-id">
                {entry.resultId ? entry.resultId.slice(0, 8) : entry.request === null ? 'too large to keep' : ''}
              </Text>
            </button>
          </li>
        ))}
      </ol>
      <Flex justify="end">
        <Button size="1" variant="ghost" color="gray" onClick={onClear}>
          Clear history
        </Button>
      </Flex>
    </Flex>
  );
}
