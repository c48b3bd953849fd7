import { Badge, Card, Flex, Heading, Progress, Text } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatDate } from '@/lib/format';

type Overview = components['schemas']['UsageOverviewDto'];

// This billing period's units against the plan's allowance, and how often requests failed lately.
export function AllowanceCard({ overview }: { overview: Overview }) {
  const share = overview.includedUnits > 0 ? overview.unitsThisPeriod / overview.includedUnits : 0;
  const percent = Math.round(share * 1000) / 10;
  const requests30 = overview.requestsByDay.reduce((sum, day) => sum + day.requests, 0);
  return (
    <Card size="2" className="ll-panel">
      <Flex direction="column" gap="3">
        <Flex justify="between" align="center" gap="2">
          <Heading as="h2" size="3" weight="medium">
            This period
          </Heading>
          <Badge variant="soft" color="gray">
            {overview.plan} plan
          </Badge>
        </Flex>
        <Flex direction="column" gap="1">
          <Text size="6" weight="medium" className="ll-num" data-testid="units-this-period">
            {overview.unitsThisPeriod.toLocaleString()}
            <Text size="3" color="gray" weight="regular">
              {' '}
              of {overview.includedUnits.toLocaleString()} units
            </Text>
          </Text>
          <Progress
            value={Math.min(100, percent)}
            max={100}
            color={share > 1 ? 'red' : share > 0.8 ? 'amber' : undefined}
            aria-label="Share of the included units used"
          />
          <Text size="1" color="gray">
            {percent}% of the allowance used since {formatDate(`${overview.periodStart}T00:00:00Z`)} (UTC calendar month).
          </Text>
        </Flex>
        <Flex gap="5" wrap="wrap">
          <Flex direction="column">
            <Text size="1" color="gray">
              Requests, last 30 days
            </Text>
            <Text size="3" className="ll-num">
              {requests30.toLocaleString()}
            </Text>
          </Flex>
          <Flex direction="column">
            <Text size="1" color="gray">
              Answered with an error
            </Text>
            <Text size="3" className="ll-num">
              {(overview.errorRate * 100).toFixed(1)}%
            </Text>
          </Flex>
        </Flex>
      </Flex>
    </Card>
  );
}
