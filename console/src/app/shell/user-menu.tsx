import { PersonIcon } from '@radix-ui/react-icons';
import { DropdownMenu, IconButton } from '@radix-ui/themes';
import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

// Placeholder until sessions exist: no user is ever signed in yet.
export function UserMenu() {
  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <IconButton variant="soft" color="gray" size="2" radius="full" aria-label="Account menu">
          <PersonIcon />
        </IconButton>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content size="2" align="end">
        <DropdownMenu.Label>Not signed in</DropdownMenu.Label>
        <DropdownMenu.Item asChild>
          <RouterLink to={paths.signIn}>Sign in</RouterLink>
        </DropdownMenu.Item>
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
