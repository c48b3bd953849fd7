import { Button, Flex, Heading, Link, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { Navigate, Link as RouterLink, useNavigate, useSearchParams } from 'react-router-dom';
import { CenteredLayout } from '@/components/centered-layout';
import { FormField } from '@/components/form-field';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useDocumentTitle } from '@/components/use-document-title';
import { paths, safeNextPath } from '@/config/paths';
import { ApiProblem } from '@/lib/problem';
import { useSession } from '@/features/auth/api/get-session';
import { useSignIn } from '@/features/auth/api/sign-in';

export function SignInPage() {
  useDocumentTitle('Sign in');
  const [searchParams] = useSearchParams();
  const next = safeNextPath(searchParams.get('next'));
  const navigate = useNavigate();
  const session = useSession();
  const signIn = useSignIn();
  const [email, setEmail] = useState(searchParams.get('email') ?? '');
  const [password, setPassword] = useState('');

  if (session.isPending) return <PageLoading />;
  if (session.data && !signIn.isSuccess) return <Navigate to={next} replace />;

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    signIn.mutate({ email, password }, { onSuccess: () => navigate(next, { replace: true }) });
  }

  const problem = signIn.error instanceof ApiProblem ? signIn.error : null;

  return (
    <CenteredLayout
      footer={
        <>
          Forgot your password?{' '}
          <Link asChild>
            <RouterLink to={paths.resetPassword}>Reset it by e-mail</RouterLink>
          </Link>
        </>
      }
    >
      <form onSubmit={handleSubmit} noValidate>
        <Flex direction="column" gap="4">
          <Flex direction="column" gap="1">
            <Heading as="h1" size="5" weight="medium">
              Sign in to the console
            </Heading>
            <Text size="2" color="gray">
              Use the e-mail address your team invited.
            </Text>
          </Flex>

          <FormField id="sign-in-email" label="E-mail" error={problem?.fieldError('email')}>
            {(control) => (
              <TextField.Root
                {...control}
                name="email"
                type="email"
                autoComplete="email"
                required
                size="3"
                value={email}
                onChange={(event) => setEmail(event.target.value)}
              />
            )}
          </FormField>

          <FormField id="sign-in-password" label="Password" error={problem?.fieldError('password')}>
            {(control) => (
              <TextField.Root
                {...control}
                name="password"
                type="password"
                autoComplete="current-password"
                required
                size="3"
                value={password}
                onChange={(event) => setPassword(event.target.value)}
              />
            )}
          </FormField>

          <ProblemCallout error={signIn.error} />

          <Button type="submit" size="3" loading={signIn.isPending}>
            Sign in
          </Button>
        </Flex>
      </form>
    </CenteredLayout>
  );
}
