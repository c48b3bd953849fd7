import { LockClosedIcon, PaperPlaneIcon } from '@radix-ui/react-icons';
import { Button, Card, Flex, Heading, SegmentedControl, Select, Tabs, Text, TextField } from '@radix-ui/themes';
import { useMutation } from '@tanstack/react-query';
import { lazy, Suspense, useCallback, useEffect, useId, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageLoading } from '@/components/page-loading';
import { ProblemCallout } from '@/components/problem-callout';
import { useCurrentTeam } from '@/lib/current-team';
import { permissionRoles, roleAllows, roleLabels } from '@/lib/permissions';
import { useOpenApiDocument } from '@/features/playground/api/get-openapi-document';
import { useStoredResult } from '@/features/playground/api/get-stored-result';
import type { PlaygroundAuth } from '@/features/playground/api/playground-auth';
import { sendPlaygroundRequest, type PlaygroundAnswer } from '@/features/playground/api/send-playground-request';
import { HistoryPanel } from '@/features/playground/components/history-panel';
import { ProblemAnswer } from '@/features/playground/components/problem-answer';
import { ResultView } from '@/features/playground/components/result-view';
import { SnippetsPanel } from '@/features/playground/components/snippets-panel';
import { endpointOrder, endpoints, formatRequest, isEndpointId, type EndpointId } from '@/features/playground/model/endpoints';
import { addToHistory, clearHistory, historyStorageKey, readHistory, type HistoryEntry } from '@/features/playground/model/request-history';
import { requestBodySchema } from '@/features/playground/model/request-schema';
import '@/features/playground/components/playground-page.css';

// The editor (about 1 MB gzipped) is its own chunk, so the page appears before it arrives.
const RequestEditor = lazy(() =>
  import('@/features/playground/components/request-editor').then((module) => ({ default: module.RequestEditor })),
);

type Shown =
  | { kind: 'answer'; answer: PlaygroundAnswer; request: unknown }
  | { kind: 'stored'; resultId: string; request: unknown }
  | null;

type ParsedRequest = { ok: true; value: unknown } | { ok: false; message: string };

function parseRequest(text: string): ParsedRequest {
  try {
    return { ok: true, value: JSON.parse(text) as unknown };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : 'The request is not valid JSON.' };
  }
}

function initialTexts(): Record<EndpointId, string> {
  return Object.fromEntries(endpointOrder.map((id) => [id, formatRequest(endpoints[id].sample())])) as Record<EndpointId, string>;
}

/**
 * Another page can open the playground with a request ready, e.g. the datasets page with
 * `?endpoint=fits&request=<JSON>`; the parameters are read once and then removed from the address.
 */
function usePrefill() {
  const [searchParams, setSearchParams] = useSearchParams();
  const [prefill] = useState(() => {
    const endpoint = searchParams.get('endpoint');
    const request = searchParams.get('request');
    if (!isEndpointId(endpoint) || request === null) return null;
    const parsed = parseRequest(request);
    return { endpoint, text: parsed.ok ? formatRequest(parsed.value) : request };
  });
  useEffect(() => {
    if (searchParams.has('request') || searchParams.has('endpoint')) setSearchParams({}, { replace: true });
  }, [searchParams, setSearchParams]);
  return prefill;
}

function storage(): Storage | null {
  try {
    return globalThis.localStorage ?? null;
  } catch {
    return null;
  }
}

export function PlaygroundPage() {
  const { team, account } = useCurrentTeam();
  const mayUse = roleAllows(team.yourRole, 'playground:use');
  const prefill = usePrefill();
  const [endpoint, setEndpoint] = useState<EndpointId>(prefill?.endpoint ?? 'fits');
  const [texts, setTexts] = useState<Record<EndpointId, string>>(() => {
    const samples = initialTexts();
    return prefill ? { ...samples, [prefill.endpoint]: prefill.text } : samples;
  });
  const [authMode, setAuthMode] = useState<'session' | 'key'>('session');
  const [apiKey, setApiKey] = useState('');
  const [shown, setShown] = useState<Shown>(null);
  const [inputError, setInputError] = useState<string | null>(null);
  const historyKey = historyStorageKey(account.id, team.id);
  const [history, setHistory] = useState<HistoryEntry[]>(() => {
    const store = storage();
    return store ? readHistory(store, historyKey) : [];
  });
  const hintId = useId();
  const keyFieldId = useId();

  const document = useOpenApiDocument();
  const schemas = useMemo(
    () =>
      endpointOrder.map((id) => ({
        modelPath: `request-${id}.json`,
        schema: document.data ? requestBodySchema(document.data, endpoints[id].schemaName) : null,
      })),
    [document.data],
  );

  const auth: PlaygroundAuth = authMode === 'session' ? { mode: 'session', teamId: team.id } : { mode: 'key', apiKey };
  const text = texts[endpoint];
  const parsed = useMemo(() => parseRequest(text), [text]);
  const definition = endpoints[endpoint];

  const send = useMutation({
    mutationFn: (input: { endpoint: EndpointId; body: unknown; auth: PlaygroundAuth }) =>
      sendPlaygroundRequest(input.endpoint, input.body, input.auth),
  });

  const record = useCallback(
    (entry: Omit<HistoryEntry, 'id'>) => {
      const store = storage();
      if (store) setHistory(addToHistory(store, historyKey, entry));
    },
    [historyKey],
  );

  const submit = useCallback(() => {
    if (send.isPending) return;
    if (!parsed.ok) {
      setInputError(`The request is not valid JSON: ${parsed.message}`);
      return;
    }
    if (auth.mode === 'key' && auth.apiKey.trim() === '') {
      setInputError('Paste an API key, or send with your console session instead.');
      return;
    }
    setInputError(null);
    const sentText = text;
    const sentEndpoint = endpoint;
    send.mutate(
      { endpoint: sentEndpoint, body: parsed.value, auth },
      {
        onSuccess: (answer) => {
          setShown({ kind: 'answer', answer, request: parsed.value });
          record({
            at: new Date().toISOString(),
            endpoint: sentEndpoint,
            status: answer.status,
            resultId: answer.ok ? answer.payload.id : null,
            request: sentText,
          });
        },
        onError: () => {
          setShown(null);
          record({ at: new Date().toISOString(), endpoint: sentEndpoint, status: null, resultId: null, request: sentText });
        },
      },
    );
  }, [auth, endpoint, parsed, record, send, text]);

  function restore(entry: HistoryEntry) {
    setEndpoint(entry.endpoint);
    if (entry.request !== null) {
      const restoredText = entry.request;
      setTexts((current) => ({ ...current, [entry.endpoint]: restoredText }));
    }
    const restoredRequest = entry.request !== null ? parseRequest(entry.request) : null;
    setShown(entry.resultId ? { kind: 'stored', resultId: entry.resultId, request: restoredRequest?.ok ? restoredRequest.value : null } : null);
    send.reset();
  }

  function resetSample() {
    setTexts((current) => ({ ...current, [endpoint]: formatRequest(definition.sample()) }));
  }

  const stored = useStoredResult(shown?.kind === 'stored' ? shown.resultId : null, auth);

  if (!mayUse) {
    return (
      <>
        <PageHeader title="Playground" description="Compose a regression request and read the result it returns." />
        <Card size="3" className="ll-panel">
          <EmptyState
            icon={<LockClosedIcon width="28" height="28" aria-hidden="true" />}
            title="The playground is not part of your role"
            description={`As ${roleLabels[team.yourRole].toLowerCase()} you cannot run fits from the console; ${new Intl.ListFormat('en', { type: 'conjunction' }).format(permissionRoles['playground:use'].map((role) => roleLabels[role].toLowerCase()))} members can.`}
          />
        </Card>
      </>
    );
  }

  return (
    <>
      <PageHeader title="Playground" description="Compose a regression request, send it, and read the estimates, checks and plots it returns." />

      <Card size="2" className="ll-panel ll-playground-toolbar">
        <Flex gap="4" align="end" wrap="wrap">
          <Flex direction="column" gap="1">
            <Text as="span" size="1" color="gray" id={`${hintId}-endpoint`}>
              Endpoint
            </Text>
            <SegmentedControl.Root
              value={endpoint}
              onValueChange={(value) => isEndpointId(value) && setEndpoint(value)}
              aria-labelledby={`${hintId}-endpoint`}
            >
              {endpointOrder.map((id) => (
                <SegmentedControl.Item key={id} value={id}>
                  {endpoints[id].label}
                </SegmentedControl.Item>
              ))}
            </SegmentedControl.Root>
          </Flex>
          <Flex direction="column" gap="1">
            <Text as="label" size="1" color="gray" htmlFor={`${keyFieldId}-mode`}>
              Send as
            </Text>
            <Select.Root value={authMode} onValueChange={(value) => setAuthMode(value === 'key' ? 'key' : 'session')}>
              <Select.Trigger id={`${keyFieldId}-mode`} className="ll-auth-select" />
              <Select.Content>
                <Select.Item value="session">Your session ({roleLabels[team.yourRole].toLowerCase()})</Select.Item>
                <Select.Item value="key">An API key</Select.Item>
              </Select.Content>
            </Select.Root>
          </Flex>
          {authMode === 'key' ? (
            <Flex direction="column" gap="1" className="ll-key-field">
              <Text as="label" size="1" color="gray" htmlFor={keyFieldId}>
                API key (kept on this page only)
              </Text>
              <TextField.Root
                id={keyFieldId}
                type="password"
                autoComplete="off"
                spellCheck={false}
                placeholder="llsq1_…"
                value={apiKey}
                onChange={(event) => setApiKey(event.target.value)}
              />
            </Flex>
          ) : null}
          <Flex gap="2" ml="auto">
            <Button variant="soft" color="gray" onClick={resetSample}>
              Load sample
            </Button>
            <Button onClick={submit} loading={send.isPending} disabled={!parsed.ok}>
              <PaperPlaneIcon aria-hidden="true" /> Send {definition.path}
            </Button>
          </Flex>
        </Flex>
      </Card>

      <div className="ll-playground-grid">
        <Card size="2" className="ll-panel">
          <Flex direction="column" gap="3">
            <Flex direction="column" gap="1">
              <Heading as="h2" size="3" weight="medium">
                Request body
              </Heading>
              <Text size="2" color="gray">
                {definition.scenario} Sample data are invented, drawn from a seeded generator.
              </Text>
            </Flex>
            <Suspense fallback={<PageLoading />}>
              <RequestEditor
                value={text}
                onChange={(next) => setTexts((current) => ({ ...current, [endpoint]: next }))}
                hintId={hintId}
                modelPath={`request-${endpoint}.json`}
                schemas={schemas}
                onSubmit={submit}
              />
            </Suspense>
            {document.isError ? (
              <Text size="1" color="amber">
                The API description did not load, so the editor checks JSON syntax only.
              </Text>
            ) : null}
            {!parsed.ok ? (
              <Text size="1" color="red" role="status">
                Not valid JSON yet: {parsed.message}
              </Text>
            ) : null}
          </Flex>
        </Card>

        <Card size="2" className="ll-panel">
          <Tabs.Root defaultValue="code">
            <Tabs.List size="1">
              <Tabs.Trigger value="code">As code</Tabs.Trigger>
              <Tabs.Trigger value="history">Recent ({history.length})</Tabs.Trigger>
            </Tabs.List>
            <Tabs.Content value="code" className="ll-side-tab">
              <SnippetsPanel path={definition.path} body={parsed.ok ? parsed.value : undefined} />
            </Tabs.Content>
            <Tabs.Content value="history" className="ll-side-tab">
              <HistoryPanel
                entries={history}
                onRestore={restore}
                onClear={() => {
                  const store = storage();
                  if (store) clearHistory(store, historyKey);
                  setHistory([]);
                }}
              />
            </Tabs.Content>
          </Tabs.Root>
        </Card>
      </div>

      <Card size="2" className="ll-panel ll-section" aria-labelledby={`${hintId}-result`}>
        <Flex direction="column" gap="3">
          <Heading as="h2" size="3" weight="medium" id={`${hintId}-result`}>
            Result
          </Heading>
          {inputError ? (
            <Text size="2" color="red" role="alert">
              {inputError}
            </Text>
          ) : null}
          {send.isError ? <ProblemCallout error={send.error} /> : null}
          {send.isPending ? <PageLoading /> : null}
          {!send.isPending && shown?.kind === 'answer' ? (
            shown.answer.ok ? (
              <ResultView
                payload={shown.answer.payload}
                raw={shown.answer.raw}
                request={shown.request}
                auth={auth}
                status={shown.answer.status}
                durationMs={shown.answer.durationMs}
              />
            ) : (
              <ProblemAnswer status={shown.answer.status} problem={shown.answer.problem} raw={shown.answer.raw} />
            )
          ) : null}
          {!send.isPending && shown?.kind === 'stored' ? (
            stored.isPending ? (
              <PageLoading />
            ) : stored.isError ? (
              <ProblemCallout error={stored.error} />
            ) : (
              <ResultView payload={stored.data} raw={stored.data} request={shown.request} auth={auth} status={null} durationMs={null} />
            )
          ) : null}
          {!send.isPending && shown === null && !send.isError ? (
            <EmptyState
              headingLevel="h3"
              title="Nothing sent yet"
              description="Send the request to see coefficients with standard errors, the analysis of variance, assumption checks and plots."
            />
          ) : null}
        </Flex>
      </Card>
    </>
  );
}
