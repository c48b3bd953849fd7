import { ExitIcon, PersonIcon } from '@radix-ui/react-icons';
import { DropdownMenu, IconButton, Text } from '@radix-ui/themes';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCurrentTeam } from '@/lib/current-team';
import { roleLabels } from '@/lib/permissions';
import { useSignOut } from '@/features/auth/api/sign-out';

export function UserMenu() {
  const { account, team } = useCurrentTeam();
  const signOut = useSignOut();
  const navigate = useNavigate();

  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <IconButton variant="soft" color="gray" size="2" radius="full" aria-label={`Account menu, signed in as ${account.email}`}>
          <PersonIcon />
        </IconButton>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content size="2" align="end">
        <DropdownMenu.Label>
          <span className="ll-user-menu-who">
            <Text as="span" weight="medium" color="gray" highContrast>
              {account.displayName}
            </Text>
            <Text as="span" size="1">
              {account.email} · {roleLabels[team.yourRole]}
            </Text>
          </span>
        </DropdownMenu.Label>
        <DropdownMenu.Separator />
        <DropdownMenu.Item
          disabled={signOut.isPending}
          onSelect={() => signOut.mutate(undefined, { onSettled: () => navigate(paths.signIn, { replace: true }) })}
        >
          <ExitIcon aria-hidden="true" /> Sign out
        </DropdownMenu.Item>
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
