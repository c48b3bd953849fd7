import { CaretSortIcon, CheckIcon } from '@radix-ui/react-icons';
import { Button, DropdownMenu, Flex, Text } from '@radix-ui/themes';
import { useNavigate } from 'react-router-dom';
import { teamPath } from '@/config/paths';
import { useCurrentTeam } from '@/lib/current-team';
import { roleLabels } from '@/lib/permissions';
import { useSession } from '@/features/auth/api/get-session';

function initialOf(name: string): string {
  return name.trim().charAt(0).toUpperCase() || '·';
}

// Lists every team of the signed-in account with its role there; choosing one opens that team's
// overview (the choice is remembered by the team layout).
export function TeamSwitcher() {
  const { team } = useCurrentTeam();
  const session = useSession();
  const navigate = useNavigate();
  const memberships = session.data?.memberships ?? [];

  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <Button variant="ghost" color="gray" size="2" className="ll-team-switcher" aria-label={`Team: ${team.name}. Switch team`}>
          <span className="ll-team-initial" aria-hidden="true">
            {initialOf(team.name)}
          </span>
          <span className="ll-team-name">{team.name}</span>
          <CaretSortIcon aria-hidden="true" />
        </Button>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content size="2" align="start" className="ll-team-menu">
        <DropdownMenu.Label>Your teams</DropdownMenu.Label>
        {memberships.map((membership) => (
          <DropdownMenu.Item
            key={membership.teamId}
            onSelect={() => navigate(teamPath(membership.teamId))}
            aria-current={membership.teamId === team.id ? 'true' : undefined}
          >
            <Flex align="center" justify="between" gap="4" width="100%">
              <Flex direction="column">
                <Text>{membership.teamName}</Text>
                <Text size="1" color="gray">
                  {roleLabels[membership.role]}
                </Text>
              </Flex>
              {membership.teamId === team.id ? <CheckIcon aria-label="Current team" /> : null}
            </Flex>
          </DropdownMenu.Item>
        ))}
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
