import { Badge, Button, Card, Flex, Heading, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import type { components } from '@/lib/api-schema';
import { useCurrentTeam } from '@/lib/current-team';
import { formatDate, formatDateTime } from '@/lib/format';
import { roleLabels, type AssignableRole } from '@/lib/permissions';
import { useCreateInvitation } from '@/features/team/api/create-invitation';
import { useInvitations } from '@/features/team/api/list-invitations';
import { useWithdrawInvitation } from '@/features/team/api/withdraw-invitation';
import { InviteDialog } from '@/features/team/components/invite-dialog';

type Invitation = components['schemas']['InvitationDto'];

function ResendButton({ invitation }: { invitation: Invitation }) {
  const { team } = useCurrentTeam();
  const resend = useCreateInvitation(team.id);
  // Owner invitations cannot be created; ownership moves by transfer, so there is nothing to resend.
  if (invitation.role === 'owner') return null;
  return (
    <Flex direction="column" gap="1" align="end">
      <Button
        size="1"
        variant="soft"
        loading={resend.isPending}
        onClick={() => resend.mutate({ email: invitation.email, role: invitation.role as AssignableRole })}
        aria-label={`Resend the invitation to ${invitation.email}`}
      >
        {resend.isSuccess ? 'Sent again' : 'Resend'}
      </Button>
      {resend.error ? <ProblemCallout error={resend.error} /> : null}
    </Flex>
  );
}

export function InvitationsSection() {
  const { team } = useCurrentTeam();
  const invitations = useInvitations(team.id);
  const withdraw = useWithdrawInvitation(team.id);
  const [withdrawing, setWithdrawing] = useState<Invitation | null>(null);

  function closeWithdraw() {
    setWithdrawing(null);
    withdraw.reset();
  }

  return (
    <section aria-labelledby="invitations-heading" className="ll-team-section">
      <Flex justify="between" align="center" gap="3" className="ll-section-heading">
        <Heading as="h2" size="4" weight="medium" id="invitations-heading">
          Invitations
        </Heading>
        <InviteDialog />
      </Flex>
      {invitations.isPending ? (
        <PageLoading />
      ) : invitations.isError ? (
        <ProblemCallout error={invitations.error} />
      ) : invitations.data.items.length === 0 ? (
        <Card size="2" className="ll-panel">
          <Text size="2" color="gray">
            No open invitations. Invited people appear here until they accept.
          </Text>
        </Card>
      ) : (
        <Table.Root variant="surface" size="2" className="ll-table">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Sent</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Link valid until</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>
                <span className="ll-visually-hidden">Actions</span>
              </Table.ColumnHeaderCell>
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {invitations.data.items.map((invitation) => (
              <Table.Row key={invitation.id} data-invitation-email={invitation.email}>
                <Table.RowHeaderCell>{invitation.email}</Table.RowHeaderCell>
                <Table.Cell>{roleLabels[invitation.role]}</Table.Cell>
                <Table.Cell>{formatDate(invitation.createdAt)}</Table.Cell>
                <Table.Cell>
                  {invitation.status === 'expired' ? (
                    <Badge color="gray" variant="soft">
                      Expired
                    </Badge>
                  ) : (
                    formatDateTime(invitation.expiresAt)
                  )}
                </Table.Cell>
                <Table.Cell>
                  <Flex gap="2" justify="end" align="start">
                    <ResendButton invitation={invitation} />
                    <Button
                      size="1"
                      variant="soft"
                      color="red"
                      onClick={() => setWithdrawing(invitation)}
                      aria-label={`Withdraw the invitation to ${invitation.email}`}
                    >
                      Withdraw
                    </Button>
                  </Flex>
                </Table.Cell>
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
      {withdrawing ? (
        <ConfirmDialog
          open
          onOpenChange={(open) => (open ? null : closeWithdraw())}
          title="Withdraw this invitation?"
          description={`The link sent to ${withdrawing.email} stops working at once. You can invite the address again later.`}
          confirmLabel="Withdraw invitation"
          pending={withdraw.isPending}
          error={withdraw.error}
          onConfirm={() => withdraw.mutate(withdrawing.id, { onSuccess: closeWithdraw })}
        />
      ) : null}
    </section>
  );
}
