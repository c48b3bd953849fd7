import { Badge, Table } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatDateTime, formatRelative } from '@/lib/format';

type RecentRequest = components['schemas']['RecentRequestDto'];

export function RecentRequestsTable({ requests }: { requests: RecentRequest[] }) {
  return (
    <Table.Root variant="surface" size="1" className="ll-table">
      <caption className="ll-visually-hidden">Recent requests</caption>
      <Table.Header>
        <Table.Row>
          <Table.ColumnHeaderCell>When</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Request</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell justify="end">Server time</Table.ColumnHeaderCell>
          <Table.ColumnHeaderCell>Caller</Table.ColumnHeaderCell>
        </Table.Row>
      </Table.Header>
      <Table.Body>
        {requests.map((request) => (
          <Table.Row key={request.requestId}>
            <Table.Cell className="ll-nowrap" title={formatDateTime(request.at)}>
              {formatRelative(request.at)}
            </Table.Cell>
            <Table.RowHeaderCell className="ll-num">
              {request.method} {request.route}
            </Table.RowHeaderCell>
            <Table.Cell>
              <Badge color={request.status < 400 ? 'jade' : request.status < 500 ? 'amber' : 'red'} variant="soft" className="ll-num">
                {request.status}
              </Badge>
            </Table.Cell>
            <Table.Cell justify="end" className="ll-num">
              {request.durationMs.toFixed(1)} ms
            </Table.Cell>
            <Table.Cell className="ll-num ll-cell-muted">{request.apiKeyId ? `key ${request.apiKeyId.slice(0, 8)}` : 'console'}</Table.Cell>
          </Table.Row>
        ))}
      </Table.Body>
    </Table.Root>
  );
}
