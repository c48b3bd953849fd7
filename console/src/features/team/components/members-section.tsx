import { Badge, Button, Flex, Heading, Select, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import type { components } from '@/lib/api-schema';
import { useCurrentTeam } from '@/lib/current-team';
import { formatDate } from '@/lib/format';
import { assignableRoles, roleAllows, roleLabels, type AssignableRole } from '@/lib/permissions';
import { useChangeMemberRole } from '@/features/team/api/change-member-role';
import { useMembers } from '@/features/team/api/list-members';
import { useRemoveMember } from '@/features/team/api/remove-member';

type Member = components['schemas']['MemberDto'];

function RoleCell({ member, mayManage }: { member: Member; mayManage: boolean }) {
  const { team } = useCurrentTeam();
  const changeRole = useChangeMemberRole(team.id);

  if (!mayManage || member.role === 'owner') {
    return (
      <Badge variant="soft" color={member.role === 'owner' ? 'amber' : undefined}>
        {roleLabels[member.role]}
      </Badge>
    );
  }
  return (
    <Flex direction="column" gap="1">
      <Select.Root
        size="1"
        value={member.role}
        disabled={changeRole.isPending}
        onValueChange={(role) => changeRole.mutate({ userId: member.userId, role: role as AssignableRole })}
      >
        <Select.Trigger aria-label={`Role of ${member.displayName}`} />
        <Select.Content>
          {assignableRoles.map((role) => (
            <Select.Item key={role} value={role}>
              {roleLabels[role]}
            </Select.Item>
          ))}
        </Select.Content>
      </Select.Root>
      {changeRole.error ? <ProblemCallout error={changeRole.error} /> : null}
    </Flex>
  );
}

export function MembersSection() {
  const { team, account } = useCurrentTeam();
  const members = useMembers(team.id);
  const removeMember = useRemoveMember(team.id);
  const [removing, setRemoving] = useState<Member | null>(null);
  const mayManage = roleAllows(team.yourRole, 'members:manage');

  function closeRemove() {
    setRemoving(null);
    removeMember.reset();
  }

  return (
    <section aria-labelledby="members-heading" className="ll-team-section">
      <Heading as="h2" size="4" weight="medium" id="members-heading" className="ll-section-heading">
        Members
      </Heading>
      {members.isPending ? (
        <PageLoading />
      ) : members.isError ? (
        <ProblemCallout error={members.error} />
      ) : (
        <Table.Root variant="surface" size="2" className="ll-table">
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Name</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>E-mail</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Role</Table.ColumnHeaderCell>
              <Table.ColumnHeaderCell>Joined</Table.ColumnHeaderCell>
              {mayManage ? (
                <Table.ColumnHeaderCell>
                  <span className="ll-visually-hidden">Actions</span>
                </Table.ColumnHeaderCell>
              ) : null}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {members.data.items.map((member) => (
              <Table.Row key={member.userId} data-member-email={member.email}>
                <Table.RowHeaderCell>
                  <Text weight="medium">{member.displayName}</Text>
                  {member.userId === account.id ? (
                    <Text size="1" color="gray">
                      {' '}
                      (you)
                    </Text>
                  ) : null}
                </Table.RowHeaderCell>
                <Table.Cell>{member.email}</Table.Cell>
                <Table.Cell>
                  <RoleCell member={member} mayManage={mayManage && member.userId !== account.id} />
                </Table.Cell>
                <Table.Cell>{formatDate(member.joinedAt)}</Table.Cell>
                {mayManage ? (
                  <Table.Cell>
                    {member.role !== 'owner' && member.userId !== account.id ? (
                      <Button size="1" variant="soft" color="red" onClick={() => setRemoving(member)} aria-label={`Remove ${member.displayName}`}>
                        Remove
                      </Button>
                    ) : null}
                  </Table.Cell>
                ) : null}
              </Table.Row>
            ))}
          </Table.Body>
        </Table.Root>
      )}
      {removing ? (
        <ConfirmDialog
          open
          onOpenChange={(open) => (open ? null : closeRemove())}
          title={`Remove ${removing.displayName}?`}
          description={`${removing.email} loses access to ${team.name} at once. API keys they created stay with the team.`}
          confirmLabel="Remove member"
          pending={removeMember.isPending}
          error={removeMember.error}
          onConfirm={() => removeMember.mutate(removing.userId, { onSuccess: closeRemove })}
        />
      ) : null}
    </section>
  );
}
