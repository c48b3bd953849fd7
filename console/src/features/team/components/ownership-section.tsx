import { Button, Card, Flex, Heading, Select, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { FormField } from '@/components/form-field';
import { useCurrentTeam } from '@/lib/current-team';
import { roleLabels } from '@/lib/permissions';
import { useMembers } from '@/features/team/api/list-members';
import { useTransferOwnership } from '@/features/team/api/transfer-ownership';

// Owner only: hands the team to another member; the previous owner stays on as admin.
export function OwnershipSection() {
  const { team, account } = useCurrentTeam();
  const members = useMembers(team.id);
  const transfer = useTransferOwnership(team.id);
  const [candidateId, setCandidateId] = useState('');
  const [confirming, setConfirming] = useState(false);
  const candidates = (members.data?.items ?? []).filter((member) => member.userId !== account.id);
  const candidate = candidates.find((member) => member.userId === candidateId);

  return (
    <section aria-labelledby="ownership-heading" className="ll-team-section">
      <Heading as="h2" size="4" weight="medium" id="ownership-heading" className="ll-section-heading">
        Ownership
      </Heading>
      <Card size="3" className="ll-panel">
        <Flex direction="column" gap="3">
          <Text size="2" color="gray">
            You own this team. Transferring ownership makes another member the owner and you an admin; only the new owner
            can undo it.
          </Text>
          <Flex gap="3" align="end" wrap="wrap">
            <FormField id="new-owner" label="New owner">
              {(control) => (
                <Select.Root value={candidateId} onValueChange={setCandidateId} disabled={candidates.length === 0}>
                  <Select.Trigger {...control} placeholder={candidates.length === 0 ? 'No other members yet' : 'Choose a member'} />
                  <Select.Content>
                    {candidates.map((member) => (
                      <Select.Item key={member.userId} value={member.userId}>
                        {member.displayName} · {roleLabels[member.role]}
                      </Select.Item>
                    ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
            <Button variant="soft" color="amber" disabled={!candidate} onClick={() => setConfirming(true)}>
              Transfer ownership
            </Button>
          </Flex>
        </Flex>
      </Card>
      {confirming && candidate ? (
        <ConfirmDialog
          open
          onOpenChange={(open) => {
            if (!open) {
              setConfirming(false);
              transfer.reset();
            }
          }}
          title={`Make ${candidate.displayName} the owner?`}
          description={`${candidate.email} becomes the owner of ${team.name}, and your role becomes admin.`}
          confirmLabel="Transfer ownership"
          tone="red"
          pending={transfer.isPending}
          error={transfer.error}
          onConfirm={() =>
            transfer.mutate(candidate.userId, {
              onSuccess: () => {
                setConfirming(false);
                setCandidateId('');
              },
            })
          }
        />
      ) : null}
    </section>
  );
}
