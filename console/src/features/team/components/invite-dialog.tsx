import { EnvelopeClosedIcon } from '@radix-ui/react-icons';
import { Button, Dialog, Flex, Select, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FormField } from '@/components/form-field';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { assignableRoles, roleLabels, roleSummaries, type AssignableRole } from '@/lib/permissions';
import { ApiProblem } from '@/lib/problem';
import { useCreateInvitation } from '@/features/team/api/create-invitation';

export function InviteDialog() {
  const { team } = useCurrentTeam();
  const invite = useCreateInvitation(team.id);
  const [open, setOpen] = useState(false);
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<AssignableRole>('developer');
  const problem = invite.error instanceof ApiProblem ? invite.error : null;

  function handleOpenChange(next: boolean) {
    setOpen(next);
    if (!next) {
      invite.reset();
      setEmail('');
      setRole('developer');
    }
  }

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    invite.mutate({ email: email.trim(), role }, { onSuccess: () => handleOpenChange(false) });
  }

  return (
    <Dialog.Root open={open} onOpenChange={handleOpenChange}>
      <Dialog.Trigger>
        <Button>
          <EnvelopeClosedIcon aria-hidden="true" /> Invite someone
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="480px" aria-describedby="invite-description">
        <form onSubmit={handleSubmit} noValidate>
          <Flex direction="column" gap="4">
            <Flex direction="column" gap="1">
              <Dialog.Title mb="0">Invite to {team.name}</Dialog.Title>
              <Text id="invite-description" size="2" color="gray">
                The person receives a link that works once, for seven days.
              </Text>
            </Flex>
            <FormField id="invite-email" label="E-mail" error={problem?.fieldError('email')}>
              {(control) => (
                <TextField.Root {...control} type="email" required value={email} onChange={(event) => setEmail(event.target.value)} />
              )}
            </FormField>
            <FormField id="invite-role" label="Role" hint={roleSummaries[role]} error={problem?.fieldError('role')}>
              {(control) => (
                <Select.Root value={role} onValueChange={(value) => setRole(value as AssignableRole)}>
                  <Select.Trigger {...control} />
                  <Select.Content>
                    {assignableRoles.map((entry) => (
                      <Select.Item key={entry} value={entry}>
                        {roleLabels[entry]}
                      </Select.Item>
                    ))}
                  </Select.Content>
                </Select.Root>
              )}
            </FormField>
            <ProblemCallout error={invite.error} />
            <Flex gap="3" justify="end">
              <Dialog.Close>
                <Button type="button" variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button type="submit" loading={invite.isPending}>
                Send invitation
              </Button>
            </Flex>
          </Flex>
        </form>
      </Dialog.Content>
    </Dialog.Root>
  );
}
