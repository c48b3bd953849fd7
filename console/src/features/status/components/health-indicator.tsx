import { Flex, Text } from '@radix-ui/themes';
import { useHealth } from '@/features/status/api/get-health';

type Tone = 'up' | 'down' | 'pending';

const labels: Record<Tone, string> = {
  up: 'API up',
  down: 'API unreachable',
  pending: 'Checking API…',
};

export function HealthIndicator() {
  const health = useHealth();
  // A failed background refetch after success still means the API went away.
  const tone: Tone = health.isError ? 'down' : health.isSuccess ? 'up' : 'pending';

  return (
    <Flex align="center" gap="2" role="status" aria-live="polite" className="ll-health" data-tone={tone}>
      <span className="ll-health-dot" aria-hidden="true" />
      <Text size="1" weight="medium">
        {labels[tone]}
      </Text>
    </Flex>
  );
}
