import { Badge, Card, Flex, Heading, Progress, Table, Text } from '@radix-ui/themes';
import { EmptyState } from '@/components/empty-state';
import { ProblemCallout } from '@/components/problem-callout';
import { useUsageOverview } from '@/features/overview/api/get-usage-overview';
import { RequestsByDay } from '@/features/overview/components/requests-by-day';
import { useCurrentTeam } from '@/lib/current-team';
import { roleAllows } from '@/lib/permissions';

const numberFormat = new Intl.NumberFormat('en');

/** This period's units against the allowance, requests by day, the error rate and the latest requests. */
export function UsageSummary() {
  const { team } = useCurrentTeam();
  const allowed = roleAllows(team.yourRole, 'usage:read');
  const overview = useUsageOverview(team.id, allowed);

  if (!allowed) {
    return (
      <Card size="3" className="ll-panel">
        <EmptyState
          headingLevel="h2"
          title="Usage is for owners, admins and billing"
          description="Your role runs fits and manages data; the team's metered usage is shown to the roles that look after the plan."
        />
      </Card>
    );
  }
  if (overview.error) {
    return (
      <Card size="3" className="ll-panel">
        <ProblemCallout error={overview.error} />
      </Card>
    );
  }
  const data = overview.data;
  const share = data ? Math.min(100, (data.unitsThisPeriod / Math.max(1, data.includedUnits)) * 100) : 0;
  return (
    <Card size="3" className="ll-panel" aria-busy={overview.isPending}>
      <Flex direction="column" gap="4">
        <Heading as="h2" size="3" weight="medium">
          This period
        </Heading>
        <div>
          <Flex justify="between" align="baseline" mb="1">
            <Text size="2" color="gray">
              Units since {data?.periodStart ?? '…'}
            </Text>
            <Text size="2" className="ll-figure" data-testid="units-this-period">
              {data ? `${numberFormat.format(data.unitsThisPeriod)} of ${numberFormat.format(data.includedUnits)}` : '…'}
            </Text>
          </Flex>
          <Progress value={share} aria-label="Units used of the plan's allowance" color={share > 90 ? 'amber' : undefined} />
        </div>
        <div>
          <Flex justify="between" align="baseline" mb="1">
            <Text size="2" color="gray">
              Requests, last 30 days
            </Text>
            <Text size="2">
              Error rate{' '}
              <span className="ll-figure" data-testid="error-rate">
                {data ? `${(data.errorRate * 100).toFixed(1)}%` : '…'}
              </span>
            </Text>
          </Flex>
          {data && data.requestsByDay.length > 0 ? (
            <RequestsByDay days={data.requestsByDay} />
          ) : (
            <Text size="2" color="gray">
              No requests yet.
            </Text>
          )}
        </div>
        {data && data.recentRequests.length > 0 && (
          <Table.Root size="1" aria-label="Recent requests">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>Recent request</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Status</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell justify="end">Time</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Id</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {data.recentRequests.slice(0, 8).map((entry) => (
                <Table.Row key={entry.requestId}>
                  <Table.Cell>
                    <code className="ll-code ll-nowrap">
                      {entry.method} {entry.route}
                    </code>
                  </Table.Cell>
                  <Table.Cell>
                    <Badge color={entry.status >= 400 ? 'amber' : 'jade'} variant="soft">
                      {entry.status}
                    </Badge>
                  </Table.Cell>
                  <Table.Cell justify="end" className="ll-figure ll-nowrap">
                    {Math.round(entry.durationMs)} ms
                  </Table.Cell>
                  <Table.Cell>
                    <code className="ll-code" title={entry.requestId}>
                      {entry.requestId.slice(0, 6)}
                    </code>
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
        )}
      </Flex>
    </Card>
  );
}
