import { Flex, Text, Theme } from '@radix-ui/themes';
import { Link as RouterLink, Outlet, useNavigation } from 'react-router-dom';
import { RouteProgress } from '@/app/shell/route-progress';
import { ShellNav } from '@/app/shell/shell-nav';
import { TeamSwitcher } from '@/app/shell/team-switcher';
import { UserMenu } from '@/app/shell/user-menu';
import { AppearanceToggle } from '@/components/appearance-toggle';
import { LogoMark } from '@/components/brand/logo-mark';
import { teamPath } from '@/config/paths';
import { useCurrentTeam } from '@/lib/current-team';
import { HealthIndicator } from '@/features/status/components/health-indicator';
import { brandTheme } from '@/app/theme';
import '@/app/shell/app-shell.css';

export function AppShell() {
  const navigation = useNavigation();
  const { team } = useCurrentTeam();

  return (
    <div className="ll-shell">
      <a className="ll-skip-link" href="#main-content">
        Skip to content
      </a>
      <RouteProgress />

      {/* The band keeps its dark ink in both themes, so its controls always use dark tokens. */}
      <Theme {...brandTheme} appearance="dark" hasBackground={false} asChild>
        <header className="ll-header">
          <RouterLink to={teamPath(team.id)} className="ll-brand" aria-label="Leastline, go to overview">
            <LogoMark size={28} />
            <span className="ll-wordmark">Leastline</span>
          </RouterLink>
          <span className="ll-header-divider" aria-hidden="true" />
          <TeamSwitcher />
          <Flex align="center" gap="4" ml="auto">
            <AppearanceToggle />
            <UserMenu />
          </Flex>
        </header>
      </Theme>

      <div className="ll-sidebar">
        <ShellNav />
      </div>

      <div className="ll-main-column">
        <main id="main-content" tabIndex={-1} className="ll-main" aria-busy={navigation.state !== 'idle'}>
          <div className="ll-page">
            <Outlet />
          </div>
        </main>
        <footer className="ll-footer">
          <HealthIndicator />
          <Text size="1" color="gray">
            Leastline console · preview
          </Text>
        </footer>
      </div>
    </div>
  );
}
