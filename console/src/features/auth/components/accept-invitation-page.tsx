import { Badge, Button, Flex, Heading, Link, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { CenteredLayout } from '@/components/centered-layout';
import { FormField } from '@/components/form-field';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useDocumentTitle } from '@/components/use-document-title';
import { paths, teamPath } from '@/config/paths';
import type { components } from '@/lib/api-schema';
import { formatDateTime } from '@/lib/format';
import { roleLabels, roleSummaries } from '@/lib/permissions';
import { ApiProblem } from '@/lib/problem';
import { useAcceptInvitation } from '@/features/auth/api/accept-invitation';
import { useSession, type Session } from '@/features/auth/api/get-session';
import { useInvitationPreview } from '@/features/auth/api/preview-invitation';
import { useSignOut } from '@/features/auth/api/sign-out';
import { forgetRememberedToken, useFragmentToken } from '@/features/auth/components/use-fragment-token';

type Preview = components['schemas']['InvitationPreviewDto'];

const rememberedTokenKey = 'leastline.invitation-token';
const minimumPasswordLength = 12;

function InvitationFacts({ preview }: { preview: Preview }) {
  return (
    <dl className="ll-auth-facts">
      <dt>Team</dt>
      <dd>
        <Text weight="medium">{preview.teamName}</Text>
      </dd>
      <dt>Role</dt>
      <dd>
        <Flex direction="column" gap="1" align="start">
          <Badge variant="soft">{roleLabels[preview.role]}</Badge>
          <Text size="1" color="gray">
            {roleSummaries[preview.role]}
          </Text>
        </Flex>
      </dd>
      <dt>For</dt>
      <dd>{preview.email}</dd>
      <dt>Valid until</dt>
      <dd>{formatDateTime(preview.expiresAt)}</dd>
    </dl>
  );
}

function useJoinAndOpenTeam() {
  const accept = useAcceptInvitation();
  const navigate = useNavigate();
  function join(body: Parameters<typeof accept.mutate>[0]) {
    accept.mutate(body, {
      onSuccess: (acceptance) => {
        forgetRememberedToken(rememberedTokenKey);
        navigate(teamPath(acceptance.teamId), { replace: true });
      },
    });
  }
  return { accept, join };
}

function CreateAccountForm({ token, preview }: { token: string; preview: Preview }) {
  const { accept, join } = useJoinAndOpenTeam();
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const problem = accept.error instanceof ApiProblem ? accept.error : null;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    join({ token, displayName, password });
  }

  return (
    <form onSubmit={handleSubmit} noValidate>
      <Flex direction="column" gap="4">
        <Text size="2" color="gray">
          There is no Leastline account for {preview.email} yet. Choose a name and a password to create it and join.
        </Text>
        <FormField id="invitee-name" label="Your name" error={problem?.fieldError('displayName')}>
          {(control) => (
            <TextField.Root
              {...control}
              autoComplete="name"
              required
              maxLength={120}
              size="3"
              value={displayName}
              onChange={(event) => setDisplayName(event.target.value)}
            />
          )}
        </FormField>
        <FormField
          id="invitee-password"
          label="Password"
          hint={`At least ${minimumPasswordLength} characters.`}
          error={problem?.fieldError('password')}
        >
          {(control) => (
            <TextField.Root
              {...control}
              type="password"
              autoComplete="new-password"
              required
              minLength={minimumPasswordLength}
              size="3"
              value={password}
              onChange={(event) => setPassword(event.target.value)}
            />
          )}
        </FormField>
        <ProblemCallout error={accept.error} />
        <Button type="submit" size="3" loading={accept.isPending}>
          Create the account and join
        </Button>
      </Flex>
    </form>
  );
}

function JoinAsSignedIn({ token, preview }: { token: string; preview: Preview }) {
  const { accept, join } = useJoinAndOpenTeam();
  return (
    <Flex direction="column" gap="4">
      <Text size="2" color="gray">
        You are signed in as {preview.email}. Joining adds {preview.teamName} to your teams.
      </Text>
      <ProblemCallout error={accept.error} />
      <Button size="3" loading={accept.isPending} onClick={() => join({ token })}>
        Join the team
      </Button>
    </Flex>
  );
}

function SignInFirst({ preview }: { preview: Preview }) {
  const next = encodeURIComponent(paths.acceptInvitation);
  const email = encodeURIComponent(preview.email);
  return (
    <Flex direction="column" gap="4">
      <Text size="2" color="gray">
        {preview.email} already has a Leastline account. Sign in with it, and you will come back here to join.
      </Text>
      <Button asChild size="3">
        <RouterLink to={`${paths.signIn}?next=${next}&email=${email}`}>Sign in to accept</RouterLink>
      </Button>
    </Flex>
  );
}

function WrongAccount({ session, preview }: { session: Session; preview: Preview }) {
  const signOut = useSignOut();
  return (
    <Flex direction="column" gap="4">
      <Text size="2">
        You are signed in as <Text weight="medium">{session.account.email}</Text>, but this invitation is for{' '}
        <Text weight="medium">{preview.email}</Text>. Sign out, then continue as the invited address.
      </Text>
      <ProblemCallout error={signOut.error} />
      <Button size="3" variant="soft" loading={signOut.isPending} onClick={() => signOut.mutate()}>
        Sign out and continue
      </Button>
    </Flex>
  );
}

function InvitationChoice({ token, preview, session }: { token: string; preview: Preview; session: Session | null }) {
  if (session === null) {
    return preview.accountExists ? <SignInFirst preview={preview} /> : <CreateAccountForm token={token} preview={preview} />;
  }
  if (session.account.email.toLowerCase() !== preview.email.toLowerCase()) {
    return <WrongAccount session={session} preview={preview} />;
  }
  return <JoinAsSignedIn token={token} preview={preview} />;
}

export function AcceptInvitationPage() {
  useDocumentTitle('Accept invitation');
  const token = useFragmentToken(rememberedTokenKey);
  const session = useSession();
  const preview = useInvitationPreview(token);

  let body;
  if (token === '') {
    body = (
      <EmptyState
        headingLevel="h1"
        title="This invitation link is incomplete"
        description="Open the link from the invitation e-mail exactly as it arrived; its last part is the invitation's code."
      />
    );
  } else if (preview.isPending || session.isPending) {
    body = <PageLoading />;
  } else if (preview.isError) {
    body = (
      <Flex direction="column" gap="4">
        <Heading as="h1" size="5" weight="medium">
          This invitation cannot be used
        </Heading>
        <ProblemCallout error={preview.error} />
        <Text size="2" color="gray">
          Ask a team owner or admin to send a new invitation.
        </Text>
      </Flex>
    );
  } else {
    body = (
      <Flex direction="column" gap="4">
        <Heading as="h1" size="5" weight="medium">
          Join {preview.data.teamName}
        </Heading>
        <InvitationFacts preview={preview.data} />
        <InvitationChoice token={token} preview={preview.data} session={session.data ?? null} />
      </Flex>
    );
  }

  return (
    <CenteredLayout
      footer={
        <Link asChild>
          <RouterLink to={paths.home}>Go to the console</RouterLink>
        </Link>
      }
    >
      {body}
    </CenteredLayout>
  );
}
