import { CheckCircledIcon } from '@radix-ui/react-icons';
import { Button, Callout, Flex, Heading, Link, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Link as RouterLink } from 'react-router-dom';
import { CenteredLayout } from '@/components/centered-layout';
import { FormField } from '@/components/form-field';
import { ProblemCallout } from '@/components/problem-callout';
import { useDocumentTitle } from '@/components/use-document-title';
import { paths } from '@/config/paths';
import { ApiProblem } from '@/lib/problem';
import { useCompletePasswordReset } from '@/features/auth/api/complete-password-reset';
import { useRequestPasswordReset } from '@/features/auth/api/request-password-reset';
import { useFragmentToken } from '@/features/auth/components/use-fragment-token';

const minimumPasswordLength = 12;

function BackToSignIn() {
  return (
    <Link asChild>
      <RouterLink to={paths.signIn}>Back to sign-in</RouterLink>
    </Link>
  );
}

function RequestResetForm() {
  const request = useRequestPasswordReset();
  const [email, setEmail] = useState('');
  const problem = request.error instanceof ApiProblem ? request.error : null;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    request.mutate({ email });
  }

  if (request.isSuccess) {
    return (
      <Flex direction="column" gap="4">
        <Heading as="h1" size="5" weight="medium">
          Check your inbox
        </Heading>
        <Callout.Root color="jade" size="1" role="status">
          <Callout.Icon>
            <CheckCircledIcon />
          </Callout.Icon>
          <Callout.Text>{request.data.message}</Callout.Text>
        </Callout.Root>
        <Text size="2" color="gray">
          The link in the message works once. Open it in this browser to choose a new password.
        </Text>
      </Flex>
    );
  }

  return (
    <form onSubmit={handleSubmit} noValidate>
      <Flex direction="column" gap="4">
        <Flex direction="column" gap="1">
          <Heading as="h1" size="5" weight="medium">
            Reset your password
          </Heading>
          <Text size="2" color="gray">
            Enter the address you sign in with. If it has an account, a link to choose a new password is sent to it.
          </Text>
        </Flex>
        <FormField id="reset-email" label="E-mail" error={problem?.fieldError('email')}>
          {(control) => (
            <TextField.Root
              {...control}
              type="email"
              autoComplete="email"
              required
              size="3"
              value={email}
              onChange={(event) => setEmail(event.target.value)}
            />
          )}
        </FormField>
        <ProblemCallout error={request.error} />
        <Button type="submit" size="3" loading={request.isPending}>
          Send the reset link
        </Button>
      </Flex>
    </form>
  );
}

function ChooseNewPasswordForm({ token }: { token: string }) {
  const complete = useCompletePasswordReset();
  const [password, setPassword] = useState('');
  const [repeated, setRepeated] = useState('');
  const [mismatch, setMismatch] = useState(false);
  const problem = complete.error instanceof ApiProblem ? complete.error : null;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (password !== repeated) {
      setMismatch(true);
      return;
    }
    setMismatch(false);
    complete.mutate({ token, newPassword: password });
  }

  if (complete.isSuccess) {
    return (
      <Flex direction="column" gap="4">
        <Heading as="h1" size="5" weight="medium">
          Password changed
        </Heading>
        <Callout.Root color="jade" size="1" role="status">
          <Callout.Icon>
            <CheckCircledIcon />
          </Callout.Icon>
          <Callout.Text>Your new password is set, and every earlier session of this account has been signed out.</Callout.Text>
        </Callout.Root>
        <Button asChild size="3">
          <RouterLink to={paths.signIn}>Sign in</RouterLink>
        </Button>
      </Flex>
    );
  }

  return (
    <form onSubmit={handleSubmit} noValidate>
      <Flex direction="column" gap="4">
        <Flex direction="column" gap="1">
          <Heading as="h1" size="5" weight="medium">
            Choose a new password
          </Heading>
          <Text size="2" color="gray">
            Signing in with the new password works at once; other browsers are signed out.
          </Text>
        </Flex>
        <FormField
          id="new-password"
          label="New password"
          hint={`At least ${minimumPasswordLength} characters.`}
          error={problem?.fieldError('newPassword')}
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
        <FormField
          id="new-password-repeat"
          label="Repeat the new password"
          error={mismatch ? 'The two passwords differ.' : undefined}
        >
          {(control) => (
            <TextField.Root
              {...control}
              type="password"
              autoComplete="new-password"
              required
              size="3"
              value={repeated}
              onChange={(event) => setRepeated(event.target.value)}
            />
          )}
        </FormField>
        <ProblemCallout error={complete.error} />
        {problem && problem.status === 410 ? (
          <Text size="2">
            <Link asChild>
              <RouterLink to={paths.resetPassword} reloadDocument>
                Ask for a new link
              </RouterLink>
            </Link>
          </Text>
        ) : null}
        <Button type="submit" size="3" loading={complete.isPending}>
          Set the new password
        </Button>
      </Flex>
    </form>
  );
}

// One address for both steps: without a token it asks for the e-mail; the e-mailed link brings the
// token (in the fragment) and the page asks for the new password.
export function ResetPasswordPage() {
  useDocumentTitle('Reset password');
  const token = useFragmentToken();
  return (
    <CenteredLayout footer={<BackToSignIn />}>
      {token === '' ? <RequestResetForm /> : <ChooseNewPasswordForm key={token} token={token} />}
    </CenteredLayout>
  );
}
