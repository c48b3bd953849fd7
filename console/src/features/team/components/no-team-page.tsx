import { Button, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent, type ReactNode } from 'react';
import { useNavigate } from 'react-router-dom';
import { CenteredLayout } from '@/components/centered-layout';
import { FormField } from '@/components/form-field';
import { ProblemCallout } from '@/components/problem-callout';
import { useDocumentTitle } from '@/components/use-document-title';
import { teamPath } from '@/config/paths';
import { ApiProblem } from '@/lib/problem';
import { useCreateTeam } from '@/features/team/api/create-team';

// A signed-in account that belongs to no team (its last team was deleted, or it left): start one.
export function NoTeamPage({ footer }: { footer?: ReactNode }) {
  useDocumentTitle('Start a team');
  const createTeam = useCreateTeam();
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const problem = createTeam.error instanceof ApiProblem ? createTeam.error : null;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    createTeam.mutate({ name }, { onSuccess: (team) => navigate(teamPath(team.id), { replace: true }) });
  }

  return (
    <CenteredLayout footer={footer}>
      <form onSubmit={handleSubmit} noValidate>
        <Flex direction="column" gap="4">
          <Flex direction="column" gap="1">
            <Heading as="h1" size="5" weight="medium">
              You are not in a team yet
            </Heading>
            <Text size="2" color="gray">
              Keys, datasets and usage belong to a team. Start one (you become its owner), or ask a team&rsquo;s admin to
              invite you.
            </Text>
          </Flex>
          <FormField id="new-team-name" label="Team name" error={problem?.fieldError('name')}>
            {(control) => (
              <TextField.Root {...control} required maxLength={200} size="3" value={name} onChange={(event) => setName(event.target.value)} />
            )}
          </FormField>
          <ProblemCallout error={createTeam.error} />
          <Button type="submit" size="3" loading={createTeam.isPending}>
            Start the team
          </Button>
        </Flex>
      </form>
    </CenteredLayout>
  );
}
