import { Badge, Code, Flex, Tabs, Text } from '@radix-ui/themes';
import { CopyButton } from '@/components/copy-button';
import { EstimateCaution } from '@/components/estimate-caution';
import type { PlaygroundAuth } from '@/features/playground/api/playground-auth';
import type { ResultPayload } from '@/features/playground/api/result-payload';
import { PlotsPanel } from '@/features/playground/components/plots-panel';
import { ResultTables } from '@/features/playground/components/result-tables';

/** Raw answers above this size are cut in the JSON tab (the copy button still copies all of it). */
const rawDisplayLimit = 200_000;

type ResultViewProps = {
  payload: ResultPayload;
  raw: unknown;
  /** The parsed request that produced it, used to plot the data; null for a result read back from history. */
  request: unknown;
  auth: PlaygroundAuth;
  status: number | null;
  durationMs: number | null;
};

export function ResultView({ payload, raw, request, auth, status, durationMs }: ResultViewProps) {
  const rawText = JSON.stringify(raw, null, 2);
  return (
    <Flex direction="column" gap="3">
      <Flex gap="3" align="center" wrap="wrap" className="ll-result-meta">
        {status !== null ? (
          <Badge color="jade" variant="soft" className="ll-num">
            {status}
          </Badge>
        ) : (
          <Badge color="gray" variant="soft">
            Stored result
          </Badge>
        )}
        {durationMs !== null ? (
          <Text size="1" color="gray" className="ll-num">
            {Math.round(durationMs)} ms
          </Text>
        ) : null}
        {payload.usage ? (
          <Text size="1" color="gray">
            <span className="ll-num">{payload.usage.units}</span> {payload.usage.units === 1 ? 'unit' : 'units'},{' '}
            <span className="ll-num">{payload.usage.observations}</span> observations
          </Text>
        ) : null}
        <Text size="1" color="gray">
          Result <Code variant="ghost" className="ll-num" data-testid="result-id">{payload.id}</Code>
        </Text>
      </Flex>
      <EstimateCaution />
      <Tabs.Root defaultValue="tables">
        <Tabs.List size="1">
          <Tabs.Trigger value="tables">Tables</Tabs.Trigger>
          <Tabs.Trigger value="plots">Plots</Tabs.Trigger>
          <Tabs.Trigger value="json">JSON</Tabs.Trigger>
        </Tabs.List>
        <Tabs.Content value="tables" className="ll-result-tab">
          <ResultTables payload={payload} />
        </Tabs.Content>
        <Tabs.Content value="plots" className="ll-result-tab">
          <PlotsPanel payload={payload} request={request} auth={auth} />
        </Tabs.Content>
        <Tabs.Content value="json" className="ll-result-tab">
          <Flex direction="column" gap="2" align="start">
            <CopyButton value={rawText} label="Copy JSON" />
            <pre className="ll-code-block ll-raw-json" tabIndex={0} aria-label="Raw answer, JSON">
              {rawText.length > rawDisplayLimit ? `${rawText.slice(0, rawDisplayLimit)}\n… (cut here; copy to get all of it)` : rawText}
            </pre>
          </Flex>
        </Tabs.Content>
      </Tabs.Root>
    </Flex>
  );
}
