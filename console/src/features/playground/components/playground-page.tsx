import { Card, Flex, Heading, Text } from '@radix-ui/themes';
import { lazy, Suspense, useId, useState } from 'react';
import { EmptyState } from '@/components/empty-state';
import { EstimateCaution } from '@/components/estimate-caution';
import { PageHeader } from '@/components/page-header';
import { PageLoading } from '@/components/page-loading';
import '@/features/playground/components/playground-page.css';

// The editor (about 1 MB gzipped) is its own chunk, so the page appears before it arrives.
const RequestEditor = lazy(() =>
  import('@/features/playground/components/request-editor').then((module) => ({ default: module.RequestEditor })),
);

// Invented scenario: a fictional payments firm asks whether larger tickets settle later.
const sampleRequest = `{
  "response": "settlement_delay_days",
  "predictors": ["ticket_size"]
}
`;

export function PlaygroundPage() {
  const [request, setRequest] = useState(sampleRequest);
  const hintId = useId();

  return (
    <>
      <PageHeader title="Playground" description="Compose a regression request and read the fit it returns." />

      <div className="ll-playground-grid">
        <Card size="2" className="ll-panel">
          <Flex direction="column" gap="3">
            <Flex direction="column" gap="1">
              <Heading as="h2" size="3" weight="medium">
                Request
              </Heading>
              <Text size="2" color="gray">
                Sample from an invented scenario: Quayside Payments (fictional) checks whether larger tickets take longer to
                settle.
              </Text>
            </Flex>
            <Suspense fallback={<PageLoading />}>
              <RequestEditor value={request} onChange={setRequest} hintId={hintId} />
            </Suspense>
          </Flex>
        </Card>

        <Card size="2" className="ll-panel">
          <Flex direction="column" gap="3" height="100%">
            <Heading as="h2" size="3" weight="medium">
              Result
            </Heading>
            <EmptyState
              headingLevel="h3"
              title="No fit yet"
              description="Sending requests from the playground arrives in a coming release; coefficients, standard errors and diagnostics will be shown here."
            />
            <EstimateCaution />
          </Flex>
        </Card>
      </div>
    </>
  );
}
