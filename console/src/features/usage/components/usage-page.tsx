import { DownloadIcon, LockClosedIcon } from '@radix-ui/react-icons';
import { Button, Card, Flex, Grid, Heading, Text, TextField } from '@radix-ui/themes';
import { lazy, Suspense, useId, useMemo, useState } from 'react';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { permissionRoles, roleAllows, roleLabels } from '@/lib/permissions';
import { useUsage } from '@/features/usage/api/get-usage';
import { useUsageOverview } from '@/features/usage/api/get-usage-overview';
import { lastDays, rangeProblem, type DayRange } from '@/features/usage/model/date-range';
import { totalsBy, totalsByDay } from '@/features/usage/model/usage-aggregates';
import { downloadText, usageCsv } from '@/features/usage/model/usage-csv';
import { AllowanceCard } from '@/features/usage/components/allowance-card';
import { RecentRequestsTable } from '@/features/usage/components/recent-requests-table';
import { UsageBreakdownTable } from '@/features/usage/components/usage-breakdown-table';
import '@/features/usage/components/usage-page.css';

// The chart library arrives with the chart, not with the console.
const UsageChart = lazy(() => import('@/features/usage/components/usage-chart').then((module) => ({ default: module.UsageChart })));

const quickRanges = [7, 30, 90] as const;

export function UsagePage() {
  const { team } = useCurrentTeam();
  const mayRead = roleAllows(team.yourRole, 'usage:read');
  const [draft, setDraft] = useState<DayRange>(() => lastDays(30));
  const problem = rangeProblem(draft);
  const [range, setRange] = useState<DayRange>(draft);
  const usage = useUsage(team.id, range.from, range.to, mayRead);
  const overview = useUsageOverview(team.id, mayRead);
  const id = useId();

  const rows = usage.data?.rows;
  const days = useMemo(() => totalsByDay(rows ?? [], range), [rows, range]);
  const byKey = useMemo(() => totalsBy(rows ?? [], (row) => row.apiKeyId), [rows]);
  const byEndpoint = useMemo(() => totalsBy(rows ?? [], (row) => row.endpoint), [rows]);

  function choose(next: DayRange) {
    setDraft(next);
    if (rangeProblem(next) === null) setRange(next);
  }

  const header = (
    <PageHeader title="Usage" description="Metered requests and units per UTC day, per key and per endpoint, against the plan's allowance." />
  );

  if (!mayRead) {
    return (
      <>
        {header}
        <Card size="3" className="ll-panel">
          <EmptyState
            icon={<LockClosedIcon width="28" height="28" aria-hidden="true" />}
            title="Your role cannot see usage"
            description={`As ${roleLabels[team.yourRole].toLowerCase()} you do not see metering; ${new Intl.ListFormat('en', { type: 'conjunction' }).format(permissionRoles['usage:read'].map((role) => roleLabels[role].toLowerCase()))} members do.`}
          />
        </Card>
      </>
    );
  }

  return (
    <>
      {header}
      <Flex direction="column" gap="4">
        <Card size="2" className="ll-panel">
          <Flex gap="3" align="end" wrap="wrap">
            <Flex direction="column" gap="1">
              <Text as="label" size="2" weight="medium" htmlFor={`${id}-from`}>
                From
              </Text>
              <TextField.Root id={`${id}-from`} className="ll-date-field" type="date" value={draft.from} max={draft.to} onChange={(event) => choose({ ...draft, from: event.target.value })} />
            </Flex>
            <Flex direction="column" gap="1">
              <Text as="label" size="2" weight="medium" htmlFor={`${id}-to`}>
                To
              </Text>
              <TextField.Root id={`${id}-to`} className="ll-date-field" type="date" value={draft.to} min={draft.from} onChange={(event) => choose({ ...draft, to: event.target.value })} />
            </Flex>
            <Flex gap="2" role="group" aria-label="Quick ranges">
              {quickRanges.map((count) => (
                <Button key={count} size="1" variant="soft" color="gray" onClick={() => choose(lastDays(count))}>
                  Last {count} days
                </Button>
              ))}
            </Flex>
            <Button
              variant="soft"
              ml="auto"
              disabled={!rows || rows.length === 0}
              onClick={() => rows && downloadText(usageCsv(rows), `leastline-usage-${range.from}-to-${range.to}.csv`)}
            >
              <DownloadIcon aria-hidden="true" /> Export CSV
            </Button>
          </Flex>
          {problem ? (
            <Text as="p" size="1" color="red" className="ll-field-error ll-range-problem">
              {problem}
            </Text>
          ) : (
            <Text as="p" size="1" color="gray" className="ll-range-problem">
              UTC days, both included. {usage.data?.unitsRule ? `Units: ${usage.data.unitsRule}.` : ''}
            </Text>
          )}
        </Card>

        <div className="ll-usage-top">
          <Card size="2" className="ll-panel">
            <Flex direction="column" gap="3">
              <Flex justify="between" align="baseline" gap="3" wrap="wrap">
                <Heading as="h2" size="3" weight="medium">
                  Per day
                </Heading>
                {usage.data ? (
                  <Text size="2" color="gray" data-testid="usage-totals">
                    <span className="ll-num">{usage.data.totals.requests.toLocaleString()}</span> requests,{' '}
                    <span className="ll-num">{usage.data.totals.units.toLocaleString()}</span> units,{' '}
                    <span className="ll-num">{usage.data.totals.observations.toLocaleString()}</span> observations
                  </Text>
                ) : null}
              </Flex>
              {usage.isPending ? (
                <PageLoading />
              ) : usage.isError ? (
                <ProblemCallout error={usage.error} />
              ) : (
                <Suspense fallback={<PageLoading />}>
                  <UsageChart days={days} />
                </Suspense>
              )}
            </Flex>
          </Card>
          {overview.isPending ? (
            <PageLoading />
          ) : overview.isError ? (
            <ProblemCallout error={overview.error} />
          ) : (
            <AllowanceCard overview={overview.data} />
          )}
        </div>

        {usage.data ? (
          <Grid columns={{ initial: '1', md: '2' }} gap="4">
            <section aria-labelledby={`${id}-by-key`}>
              <Heading as="h2" size="3" weight="medium" className="ll-section-heading" id={`${id}-by-key`}>
                By key
              </Heading>
              <UsageBreakdownTable
                caption="Usage by key"
                keyHeading="Key"
                rows={byKey.map((entry) => ({
                  ...entry,
                  id: entry.key ?? 'console',
                  label: entry.key ? <code className="ll-num">{entry.key.slice(0, 8)}…</code> : 'Console (no key)',
                }))}
              />
            </section>
            <section aria-labelledby={`${id}-by-endpoint`}>
              <Heading as="h2" size="3" weight="medium" className="ll-section-heading" id={`${id}-by-endpoint`}>
                By endpoint
              </Heading>
              <UsageBreakdownTable
                caption="Usage by endpoint"
                keyHeading="Endpoint"
                rows={byEndpoint.map((entry) => ({ ...entry, id: entry.key, label: <code className="ll-num">/v1/{entry.key}</code> }))}
              />
            </section>
          </Grid>
        ) : null}

        {overview.data && overview.data.recentRequests.length > 0 ? (
          <section aria-labelledby={`${id}-recent`}>
            <Heading as="h2" size="3" weight="medium" className="ll-section-heading" id={`${id}-recent`}>
              Recent requests
            </Heading>
            <RecentRequestsTable requests={overview.data.recentRequests} />
          </section>
        ) : null}
      </Flex>
    </>
  );
}
