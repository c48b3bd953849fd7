import { Button, Card, Code, Flex, Heading, Select, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { FormField } from '@/components/form-field';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import type { components } from '@/lib/api-schema';
import { useCurrentTeam } from '@/lib/current-team';
import { formatDateTime, formatRelative } from '@/lib/format';
import { useAuditEvents, type AuditAction } from '@/features/team/api/list-audit-events';

type AuditEvent = components['schemas']['AuditEventDto'];

// Partial on purpose: an action the API adds later is still listed, under its own name.
const actionLabels: Partial<Record<AuditAction, string>> = {
  'session.signed-in': 'Signed in',
  'team.created': 'Team created',
  'team.updated': 'Team settings changed',
  'team.plan-changed': 'Plan changed',
  'team.ownership-transferred': 'Ownership transferred',
  'member.role-changed': 'Role changed',
  'member.removed': 'Member removed',
  'invitation.created': 'Invitation sent',
  'invitation.revoked': 'Invitation withdrawn',
  'invitation.accepted': 'Invitation accepted',
  'api-key.created': 'API key created',
  'api-key.rotated': 'API key rotated',
  'api-key.revoked': 'API key revoked',
};

const allActions = 'all';

const longestShownValue = 48;

function describeValue(value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (Array.isArray(value)) return value.map(describeValue).join(', ');
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

// Long values (browser identification strings, ids) are cut in the table; the full text is in the tooltip.
function shorten(text: string): string {
  return text.length > longestShownValue ? `${text.slice(0, longestShownValue - 1)}…` : text;
}

function EventDetails({ event }: { event: AuditEvent }) {
  const entries = Object.entries(event.details ?? {});
  if (entries.length === 0) return <Text color="gray">—</Text>;
  return (
    <dl className="ll-audit-details">
      {entries.map(([key, value]) => (
        <div key={key}>
          <dt>{key}</dt>
          <dd title={describeValue(value)}>{shorten(describeValue(value))}</dd>
        </div>
      ))}
    </dl>
  );
}

function actorOf(event: AuditEvent): string {
  if (event.actor.email) return event.actor.email;
  if (event.actor.apiKeyId) return 'An API key';
  return 'Leastline';
}

export function AuditLogSection() {
  const { team } = useCurrentTeam();
  const [action, setAction] = useState<AuditAction | typeof allActions>(allActions);
  const events = useAuditEvents(team.id, action === allActions ? undefined : action);
  const items = events.data?.pages.flatMap((page) => page.items) ?? [];
  const olderPagesError = events.isFetchNextPageError ? events.error : null;

  return (
    <section aria-labelledby="audit-log-heading" className="ll-team-section" id="audit-log">
      <Flex justify="between" align="end" gap="3" wrap="wrap" className="ll-section-heading">
        <Heading as="h2" size="4" weight="medium" id="audit-log-heading">
          Audit log
        </Heading>
        <FormField id="audit-action" label="Action">
          {(control) => (
            <Select.Root value={action} onValueChange={(value) => setAction(value as AuditAction | typeof allActions)}>
              <Select.Trigger {...control} className="ll-audit-filter" />
              <Select.Content>
                <Select.Item value={allActions}>Every action</Select.Item>
                <Select.Separator />
                {Object.entries(actionLabels).map(([value, label]) => (
                  <Select.Item key={value} value={value}>
                    {label}
                  </Select.Item>
                ))}
              </Select.Content>
            </Select.Root>
          )}
        </FormField>
      </Flex>

      {events.isPending ? (
        <PageLoading />
      ): events.isError && items.length === 0 ? (
        <ProblemCallout error={events.error} />
      ) : items.length === 0 ? (
        <Card size="2" className="ll-panel">
          <Text size="2" color="gray">
            No events{action === allActions ? '' : ' of this kind'} yet.
          </Text>
        </Card>
      ) : (
        <Flex direction="column" gap="3">
          <Table.Root variant="surface" size="1" className="ll-table ll-audit-table">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeaderCell>When</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Action</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>By</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Details</Table.ColumnHeaderCell>
                <Table.ColumnHeaderCell>Address</Table.ColumnHeaderCell>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {items.map((event) => (
                <Table.Row key={event.id} data-audit-action={event.action}>
                  <Table.Cell className="ll-nowrap">
                    <Text title={formatDateTime(event.occurredAt)}>{formatRelative(event.occurredAt)}</Text>
                  </Table.Cell>
                  <Table.Cell>
                    <Text weight="medium" className="ll-nowrap">
                      {actionLabels[event.action] ?? event.action}
                    </Text>
                  </Table.Cell>
                  <Table.Cell className="ll-audit-actor">{actorOf(event)}</Table.Cell>
                  <Table.Cell>
                    <EventDetails event={event} />
                  </Table.Cell>
                  <Table.Cell>
                    {event.ipAddress ? <Code variant="ghost">{event.ipAddress}</Code> : <Text color="gray">—</Text>}
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
          <Flex justify="between" align="center">
            <Text size="1" color="gray">
              {items.length} {items.length === 1 ? 'event' : 'events'} shown, newest first
            </Text>
            {events.hasNextPage ? (
              <Button variant="soft" onClick={() => events.fetchNextPage()} loading={events.isFetchingNextPage}>
                Show older events
              </Button>
            ) : (
              <Text size="1" color="gray">
                That is the whole log.
              </Text>
            )}
          </Flex>
          <ProblemCallout error={olderPagesError} />
        </Flex>
      )}
    </section>
  );
}
