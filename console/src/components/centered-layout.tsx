import { Box, Card, Flex, Text } from '@radix-ui/themes';
import type { ReactNode } from 'react';
import { AppearanceToggle } from '@/components/appearance-toggle';
import { LogoMark } from '@/components/brand/logo-mark';
import '@/components/centered-layout.css';

// The frame of pages seen outside a team: sign-in, password reset, invitation acceptance, starting a
// first team. One narrow card under the wordmark.
export function CenteredLayout({ children, footer }: { children: ReactNode; footer?: ReactNode }) {
  return (
    <main id="main-content" tabIndex={-1} className="ll-sign-in">
      <Box className="ll-auth-appearance">
        <AppearanceToggle />
      </Box>
      <Flex direction="column" align="center" gap="5" className="ll-sign-in-column">
        <Flex align="center" gap="3">
          <LogoMark size={36} />
          <Text size="6" weight="medium" className="ll-wordmark">
            Leastline
          </Text>
        </Flex>
        <Card size="4" className="ll-sign-in-card">
          {children}
        </Card>
        {footer ? (
          <Text as="div" size="2" color="gray" align="center">
            {footer}
          </Text>
        ) : null}
      </Flex>
    </main>
  );
}
