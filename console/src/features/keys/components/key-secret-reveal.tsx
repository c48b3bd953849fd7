import { ExclamationTriangleIcon } from '@radix-ui/react-icons';
import { Callout, Code, Flex, Text } from '@radix-ui/themes';
import { CopyButton } from '@/components/copy-button';

type KeySecretRevealProps = {
  plaintextKey: string;
  keyName: string;
};

// The one moment the full key exists outside the calling service: the API stores only a hash of it.
export function KeySecretReveal({ plaintextKey, keyName }: KeySecretRevealProps) {
  return (
    <Flex direction="column" gap="3">
      <Callout.Root color="amber" size="1" role="note">
        <Callout.Icon>
          <ExclamationTriangleIcon />
        </Callout.Icon>
        <Callout.Text>
          Copy the key for &ldquo;{keyName}&rdquo; now and store it in your secret manager. It is shown only this once;
          after you close this window nobody, including Leastline, can show it again.
        </Callout.Text>
      </Callout.Root>
      <Flex direction="column" gap="1">
        <Text as="div" size="2" weight="medium" id="new-key-label">
          Full API key
        </Text>
        <Flex gap="2" align="start" wrap="wrap">
          <Code size="2" variant="outline" className="ll-key-secret" aria-labelledby="new-key-label" data-testid="new-api-key">
            {plaintextKey}
          </Code>
          <CopyButton value={plaintextKey} label="Copy key" />
        </Flex>
      </Flex>
      <Text size="1" color="gray">
        Send it as <Code size="1">Authorization: Bearer &lt;key&gt;</Code> or in the <Code size="1">X-Leastline-Key</Code>{' '}
        header.
      </Text>
    </Flex>
  );
}
