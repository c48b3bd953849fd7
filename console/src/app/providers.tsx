import { Theme } from '@radix-ui/themes';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { brandTheme } from '@/app/theme';
import { AppearanceProvider, useAppearance } from '@/components/appearance';

function ThemedRoot({ children }: { children: ReactNode }) {
  const { appearance } = useAppearance();
  return (
    <Theme {...brandTheme} appearance={appearance}>
      {children}
    </Theme>
  );
}

export function AppProviders({ queryClient, children }: { queryClient: QueryClient; children: ReactNode }) {
  return (
    <QueryClientProvider client={queryClient}>
      <AppearanceProvider>
        <ThemedRoot>{children}</ThemedRoot>
      </AppearanceProvider>
    </QueryClientProvider>
  );
}
