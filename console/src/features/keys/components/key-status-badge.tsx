import { Badge, Flex, Text } from '@radix-ui/themes';
import type { components } from '@/lib/api-schema';
import { formatDateTime } from '@/lib/format';

type ApiKey = components['schemas']['ApiKeyDto'];

const statusLook: Record<ApiKey['status'], { label: string; color: 'jade' | 'amber' | 'gray' | 'red' }> = {
  active: { label: 'Active', color: 'jade' },
  retiring: { label: 'Retiring', color: 'amber' },
  'rotated-out': { label: 'Rotated out', color: 'gray' },
  expired: { label: 'Expired', color: 'gray' },
  revoked: { label: 'Revoked', color: 'red' },
};

export function KeyStatusBadge({ apiKey }: { apiKey: ApiKey }) {
  const look = statusLook[apiKey.status];
  return (
    <Flex direction="column" gap="1" align="start">
      <Badge color={look.color} variant="soft">
        {look.label}
      </Badge>
      {apiKey.status === 'retiring' && apiKey.retiresAt ? (
        <Text size="1" color="gray">
          works until {formatDateTime(apiKey.retiresAt)}
        </Text>
      ) : null}
    </Flex>
  );
}
