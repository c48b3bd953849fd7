import { CaretSortIcon } from '@radix-ui/react-icons';
import { Button, DropdownMenu } from '@radix-ui/themes';

// Placeholder until sign-in exists: it shows where the team choice will live.
export function TeamSwitcher() {
  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <Button variant="ghost" color="gray" size="2" className="ll-team-switcher">
          <span className="ll-team-initial" aria-hidden="true">
            –
          </span>
          <span>No team selected</span>
          <CaretSortIcon aria-hidden="true" />
        </Button>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content size="2" align="start">
        <DropdownMenu.Label>Your teams</DropdownMenu.Label>
        <DropdownMenu.Item disabled>Sign in to see the teams you belong to</DropdownMenu.Item>
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
