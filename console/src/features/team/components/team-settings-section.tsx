import { Card, Flex, Heading, Switch, Text } from '@radix-ui/themes';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { roleAllows } from '@/lib/permissions';
import { useUpdateTeam } from '@/features/team/api/update-team';

export function TeamSettingsSection() {
  const { team } = useCurrentTeam();
  const update = useUpdateTeam(team.id);
  const mayUpdate = roleAllows(team.yourRole, 'team:update');

  return (
    <section aria-labelledby="settings-heading" className="ll-team-section">
      <Heading as="h2" size="4" weight="medium" id="settings-heading" className="ll-section-heading">
        Settings
      </Heading>
      <Card size="3" className="ll-panel">
        <Flex direction="column" gap="3">
          <Text as="label" size="2">
            <Flex gap="3" align="start">
              <Switch
                checked={team.developerKeysAllowed}
                disabled={!mayUpdate || update.isPending}
                onCheckedChange={(checked) => update.mutate({ developerKeysAllowed: checked })}
              />
              <Flex direction="column" gap="1">
                <Text weight="medium">Developers may create their own API keys</Text>
                <Text size="1" color="gray">
                  {mayUpdate
                    ? 'When on, developers create, rotate and revoke keys they made; owners and admins always manage every key.'
                    : 'Only owners and admins change this setting.'}
                </Text>
              </Flex>
            </Flex>
          </Text>
          <ProblemCallout error={update.error} />
        </Flex>
      </Card>
    </section>
  );
}
