import { Button, Dialog, Flex, RadioCards, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { ProblemCallout } from '@/components/problem-callout';
import type { components } from '@/lib/api-schema';
import { useRotateApiKey } from '@/features/keys/api/rotate-api-key';
import { KeySecretReveal } from '@/features/keys/components/key-secret-reveal';

type ApiKey = components['schemas']['ApiKeyDto'];

// How long the old key keeps working beside its replacement, so a deployment can switch without a gap.
export const overlapChoices = [
  { hours: 0, label: 'None', detail: 'The old key stops at once' },
  { hours: 1, label: '1 hour', detail: 'For a quick redeploy' },
  { hours: 24, label: '24 hours', detail: 'The usual choice' },
  { hours: 168, label: '7 days', detail: 'For slow release cycles' },
] as const;

type RotateKeyDialogProps = {
  teamId: string;
  apiKey: ApiKey;
  open: boolean;
  onOpenChange: (open: boolean) => void;
};

export function RotateKeyDialog({ teamId, apiKey, open, onOpenChange }: RotateKeyDialogProps) {
  const rotate = useRotateApiKey(teamId);
  const [overlapHours, setOverlapHours] = useState('24');

  function handleOpenChange(next: boolean) {
    onOpenChange(next);
    if (!next) {
      rotate.reset();
      setOverlapHours('24');
    }
  }

  const rotated = rotate.data;

  return (
    <Dialog.Root open={open} onOpenChange={handleOpenChange}>
      <Dialog.Content maxWidth="560px" aria-describedby={undefined}>
        {rotated ? (
          <Flex direction="column" gap="4">
            <Dialog.Title mb="0">Key rotated</Dialog.Title>
            <KeySecretReveal plaintextKey={rotated.plaintextKey} keyName={rotated.apiKey.name} />
            <Flex justify="end">
              <Dialog.Close>
                <Button>I have stored the key</Button>
              </Dialog.Close>
            </Flex>
          </Flex>
        ) : (
          <Flex direction="column" gap="4">
            <Dialog.Title mb="0">Rotate &ldquo;{apiKey.name}&rdquo;</Dialog.Title>
            <Text as="p" size="2" color="gray">
              A new key with the same name, scopes and expiry takes over, and the key&rsquo;s creator is told by e-mail. Replaced
              key: <code className="ll-scope-code">{apiKey.prefix}</code>
            </Text>
            <Flex direction="column" gap="2">
              <Text as="div" size="2" weight="medium" id="overlap-label">
                Overlap: how long the old key keeps working
              </Text>
              <RadioCards.Root
                value={overlapHours}
                onValueChange={setOverlapHours}
                columns={{ initial: '2', sm: '4' }}
                size="1"
                aria-labelledby="overlap-label"
              >
                {overlapChoices.map((choice) => (
                  <RadioCards.Item key={choice.hours} value={String(choice.hours)} aria-label={`Overlap ${choice.label}`}>
                    <Flex direction="column" width="100%">
                      <Text weight="medium">{choice.label}</Text>
                      <Text size="1" color="gray">
                        {choice.detail}
                      </Text>
                    </Flex>
                  </RadioCards.Item>
                ))}
              </RadioCards.Root>
            </Flex>
            <ProblemCallout error={rotate.error} />
            <Flex gap="3" justify="end">
              <Dialog.Close>
                <Button variant="soft" color="gray">
                  Cancel
                </Button>
              </Dialog.Close>
              <Button loading={rotate.isPending} onClick={() => rotate.mutate({ keyId: apiKey.id, overlapHours: Number(overlapHours) })}>
                Rotate key
              </Button>
            </Flex>
          </Flex>
        )}
      </Dialog.Content>
    </Dialog.Root>
  );
}
