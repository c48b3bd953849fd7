import { Flex, SegmentedControl, Text } from '@radix-ui/themes';
import { useState } from 'react';
import { CopyButton } from '@/components/copy-button';
import { curlCommand, sdkSnippet } from '@/features/playground/model/request-snippets';

type SnippetsPanelProps = {
  path: string;
  /** The parsed editor text, or undefined while it is not valid JSON. */
  body: unknown;
};

type Flavour = 'curl' | 'sdk';

// The request as a program would send it, with an API key from the environment instead of the session.
export function SnippetsPanel({ path, body }: SnippetsPanelProps) {
  const [flavour, setFlavour] = useState<Flavour>('curl');
  if (body === undefined) {
    return (
      <Text as="p" size="2" color="gray">
        Fix the JSON in the editor to see the equivalent curl command and SDK call.
      </Text>
    );
  }
  const input = { origin: globalThis.location?.origin ?? '', path, body };
  const text = flavour === 'curl' ? curlCommand(input) : sdkSnippet(input);
  return (
    <Flex direction="column" gap="2">
      <Flex justify="between" align="center" gap="3" wrap="wrap">
        <SegmentedControl.Root size="1" value={flavour} onValueChange={(value) => setFlavour(value as Flavour)} aria-label="Snippet language">
          <SegmentedControl.Item value="curl">curl</SegmentedControl.Item>
          <SegmentedControl.Item value="sdk">TypeScript SDK</SegmentedControl.Item>
        </SegmentedControl.Root>
        <CopyButton value={text} label={flavour === 'curl' ? 'Copy curl' : 'Copy TypeScript'} />
      </Flex>
      <pre className="ll-code-block ll-snippet" tabIndex={0} aria-label={flavour === 'curl' ? 'curl command' : 'TypeScript SDK call'}>
        {text}
      </pre>
      <Text size="1" color="gray">
        Set <code>LEASTLINE_KEY</code> in your environment to a key with the <code>fits:run</code> scope; the key is never written
        into the snippet.
      </Text>
    </Flex>
  );
}
