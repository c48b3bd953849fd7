import { Badge, Button, Flex, Table, Text } from '@radix-ui/themes';
import { useState } from 'react';
import type { components } from '@/lib/api-schema';
import { formatDate, formatDateTime, formatRelative } from '@/lib/format';
import type { KeyPolicy } from '@/lib/permissions';
import { keyScopes } from '@/features/keys/components/key-scopes';
import { KeyStatusBadge } from '@/features/keys/components/key-status-badge';
import { RevokeKeyDialog } from '@/features/keys/components/revoke-key-dialog';
import { RotateKeyDialog } from '@/features/keys/components/rotate-key-dialog';

type ApiKey = components['schemas']['ApiKeyDto'];

type ApiKeysTableProps = {
  teamId: string;
  keys: ApiKey[];
  policy: KeyPolicy;
  creatorName: (userId: string | null) => string;
};

type OpenDialog = { kind: 'rotate' | 'revoke'; apiKey: ApiKey } | null;

const scopeLabel = new Map(keyScopes.map((entry) => [entry.scope, entry.label]));

export function ApiKeysTable({ teamId, keys, policy, creatorName }: ApiKeysTableProps) {
  const [dialog, setDialog] = useState<OpenDialog>(null);
  const anyActions = keys.some((key) => policy.mayRotate(key) || policy.mayRevoke(key));

  return (
    <>
      <Table.Root variant="surface" size="2" className="ll-table ll-keys-table">
        <Table.Header>
          <Table.Row>
            <Table.ColumnHeaderCell>Key</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Scopes</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Created</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Last used</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>Expires</Table.ColumnHeaderCell>
            <Table.ColumnHeaderCell>State</Table.ColumnHeaderCell>
            {anyActions ? (
              <Table.ColumnHeaderCell>
                <span className="ll-visually-hidden">Actions</span>
              </Table.ColumnHeaderCell>
            ) : null}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {keys.map((key) => (
            <Table.Row key={key.id} data-key-id={key.id}>
              <Table.RowHeaderCell>
                <Flex direction="column" gap="1">
                  <Text weight="medium" className="ll-key-name">
                    {key.name}
                  </Text>
                  <code className="ll-scope-code ll-key-prefix">{key.prefix}</code>
                </Flex>
              </Table.RowHeaderCell>
              <Table.Cell>
                <Flex gap="1" wrap="wrap" className="ll-scope-list">
                  {key.scopes.map((scope) => (
                    <Badge key={scope} variant="outline" color="gray" title={scopeLabel.get(scope)}>
                      {scope}
                    </Badge>
                  ))}
                </Flex>
              </Table.Cell>
              <Table.Cell>
                <Flex direction="column" gap="1">
                  <Text size="2">{creatorName(key.createdByUserId)}</Text>
                  <Text size="1" color="gray">
                    {formatDate(key.createdAt)}
                  </Text>
                </Flex>
              </Table.Cell>
              <Table.Cell>
                {key.lastUsedAt ? (
                  <Flex direction="column" gap="1">
                    <Text size="2" title={formatDateTime(key.lastUsedAt)}>
                      {formatRelative(key.lastUsedAt)}
                    </Text>
                    {key.lastUsedIp ? (
                      <Text size="1" color="gray" className="ll-num">
                        {key.lastUsedIp}
                      </Text>
                    ) : null}
                  </Flex>
                ) : (
                  <Text size="2" color="gray" className="ll-nowrap">
                    Never
                  </Text>
                )}
              </Table.Cell>
              <Table.Cell>
                <Text size="2" color={key.expiresAt ? undefined : 'gray'} className="ll-nowrap">
                  {key.expiresAt ? formatDate(key.expiresAt) : 'No expiry'}
                </Text>
              </Table.Cell>
              <Table.Cell>
                <KeyStatusBadge apiKey={key} />
              </Table.Cell>
              {anyActions ? (
                <Table.Cell>
                  <Flex gap="2" justify="end">
                    {policy.mayRotate(key) ? (
                      <Button size="1" variant="soft" onClick={() => setDialog({ kind: 'rotate', apiKey: key })} aria-label={`Rotate ${key.name}`}>
                        Rotate
                      </Button>
                    ) : null}
                    {policy.mayRevoke(key) ? (
                      <Button
                        size="1"
                        variant="soft"
                        color="red"
                        onClick={() => setDialog({ kind: 'revoke', apiKey: key })}
                        aria-label={`Revoke ${key.name}`}
                      >
                        Revoke
                      </Button>
                    ) : null}
                  </Flex>
                </Table.Cell>
              ) : null}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>

      {dialog?.kind === 'rotate' ? (
        <RotateKeyDialog teamId={teamId} apiKey={dialog.apiKey} open onOpenChange={(open) => (open ? null : setDialog(null))} />
      ) : null}
      {dialog?.kind === 'revoke' ? (
        <RevokeKeyDialog teamId={teamId} apiKey={dialog.apiKey} open onOpenChange={(open) => (open ? null : setDialog(null))} />
      ) : null}
    </>
  );
}
