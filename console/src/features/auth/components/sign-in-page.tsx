import { InfoCircledIcon } from '@radix-ui/react-icons';
import { Button, Callout, Card, Flex, Heading, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { LogoMark } from '@/components/brand/logo-mark';
import { useDocumentTitle } from '@/components/use-document-title';
import '@/features/auth/components/sign-in-page.css';

export function SignInPage() {
  useDocumentTitle('Sign in');
  const [submitted, setSubmitted] = useState(false);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSubmitted(true);
  }

  return (
    <main id="main-content" tabIndex={-1} className="ll-sign-in">
      <Flex direction="column" align="center" gap="5" className="ll-sign-in-column">
        <Flex align="center" gap="3">
          <LogoMark size={36} />
          <Text size="6" weight="medium" className="ll-wordmark">
            Leastline
          </Text>
        </Flex>

        <Card size="4" className="ll-sign-in-card">
          <form onSubmit={handleSubmit}>
            <Flex direction="column" gap="4">
              <Flex direction="column" gap="1">
                <Heading as="h1" size="5" weight="medium">
                  Sign in to the console
                </Heading>
                <Text size="2" color="gray">
                  Use the e-mail address your team invited.
                </Text>
              </Flex>

              <Flex direction="column" gap="1">
                <Text as="label" htmlFor="sign-in-email" size="2" weight="medium">
                  E-mail
                </Text>
                <TextField.Root
                  id="sign-in-email"
                  name="email"
                  type="email"
                  autoComplete="email"
                  required
                  size="3"
                />
              </Flex>

              <Flex direction="column" gap="1">
                <Text as="label" htmlFor="sign-in-password" size="2" weight="medium">
                  Password
                </Text>
                <TextField.Root
                  id="sign-in-password"
                  name="password"
                  type="password"
                  autoComplete="current-password"
                  required
                  size="3"
                />
              </Flex>

              {submitted ? (
                <Callout.Root id="sign-in-status" role="status" color="amber" size="1">
                  <Callout.Icon>
                    <InfoCircledIcon />
                  </Callout.Icon>
                  <Callout.Text>Signing in is not connected yet; accounts arrive in a coming release.</Callout.Text>
                </Callout.Root>
              ) : null}

              <Button type="submit" size="3">
                Sign in
              </Button>
            </Flex>
          </form>
        </Card>
      </Flex>
    </main>
  );
}
