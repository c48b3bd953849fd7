import { InfoCircledIcon, LockClosedIcon } from '@radix-ui/react-icons';
import { Callout, Card, Flex, SegmentedControl, Text } from '@radix-ui/themes';
import { useMemo, useState } from 'react';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { keyPolicy, roleLabels } from '@/lib/permissions';
import { useApiKeys } from '@/features/keys/api/list-api-keys';
import { useKeyCreators } from '@/features/keys/api/list-key-creators';
import { ApiKeysTable } from '@/features/keys/components/api-keys-table';
import { CreateKeyDialog } from '@/features/keys/components/create-key-dialog';
import '@/features/keys/components/api-keys-page.css';

type Filter = 'working' | 'all';

export function ApiKeysPage() {
  const { team, account } = useCurrentTeam();
  const policy = keyPolicy({ role: team.yourRole, userId: account.id, developerKeysAllowed: team.developerKeysAllowed });
  const keys = useApiKeys(team.id, policy.mayView);
  const creators = useKeyCreators(team.id);
  const [filter, setFilter] = useState<Filter>('working');

  const creatorName = useMemo(() => {
    const names = new Map((creators.data?.items ?? []).map((member) => [member.userId, member.displayName]));
    return (userId: string | null) => {
      if (userId === null) return 'Former member';
      if (userId === account.id) return 'You';
      return names.get(userId) ?? 'Former member';
    };
  }, [creators.data, account.id]);

  const allKeys = keys.data?.items ?? [];
  const workingKeys = allKeys.filter((key) => key.status === 'active' || key.status === 'retiring');
  const shown = filter === 'working' ? workingKeys : allKeys;
  const seesAllKeys = policy.mayView && team.yourRole !== 'developer';

  return (
    <>
      <PageHeader
        title="API keys"
        description={
          !policy.mayView
            ? 'Keys identify the programs that call the API; each one is metered and can be revoked on its own.'
            : seesAllKeys
              ? 'Every key of the team. Each one is metered and can be revoked on its own.'
              : 'The keys you created. Each one is metered and can be revoked on its own.'
        }
        actions={policy.mayCreate ? <CreateKeyDialog teamId={team.id} /> : undefined}
      />

      {!policy.mayView ? (
        <Card size="3" className="ll-panel">
          <EmptyState
            icon={<LockClosedIcon width="28" height="28" aria-hidden="true" />}
            title="API keys are not part of your role"
            description={`As ${roleLabels[team.yourRole].toLowerCase()} you can see the team's plan and usage; owners and admins manage its keys.`}
          />
        </Card>
      ) : (
        <Flex direction="column" gap="4">
          {policy.createRefusal ? (
            <Callout.Root color="gray" size="1" variant="surface" role="note">
              <Callout.Icon>
                <InfoCircledIcon />
              </Callout.Icon>
              <Callout.Text>{policy.createRefusal} You can still revoke keys you created.</Callout.Text>
            </Callout.Root>
          ) : null}

          {keys.isPending ? (
            <PageLoading />
          ) : keys.isError ? (
            <ProblemCallout error={keys.error} />
          ) : allKeys.length === 0 ? (
            <Card size="3" className="ll-panel">
              <EmptyState
                title="No API keys yet"
                description="Keys are listed here with their prefix, scopes, creator and last use. The full key is shown once, when it is created."
              />
            </Card>
          ) : (
            <>
              <Flex align="center" justify="between" gap="3" wrap="wrap">
                <SegmentedControl.Root value={filter} onValueChange={(value) => setFilter(value as Filter)} size="1" aria-label="Which keys to show">
                  <SegmentedControl.Item value="working">Working ({workingKeys.length})</SegmentedControl.Item>
                  <SegmentedControl.Item value="all">All ({allKeys.length})</SegmentedControl.Item>
                </SegmentedControl.Root>
                <Text size="1" color="gray">
                  Last use is recorded within about ten seconds.
                </Text>
              </Flex>
              {shown.length === 0 ? (
                <Card size="2" className="ll-panel">
                  <Text size="2" color="gray">
                    No working keys. Choose &ldquo;All&rdquo; to see revoked, expired and rotated-out keys.
                  </Text>
                </Card>
              ) : (
                <ApiKeysTable teamId={team.id} keys={shown} policy={policy} creatorName={creatorName} />
              )}
            </>
          )}
        </Flex>
      )}
    </>
  );
}
