import { compactJson } from '@/features/playground/model/compact-json';

// Copyable equivalents of a playground request: a curl command and a call through the TypeScript SDK.
// The key is never written into them: curl reads $LEASTLINE_KEY from the shell, the SDK call reads
// process.env.LEASTLINE_KEY.

export type SnippetInput = {
  origin: string;
  path: string;
  /** The request body, already parsed. */
  body: unknown;
};

function prettyBody(body: unknown): string {
  return compactJson(body);
}

/**
 * A curl command that sends the body through a quoted here-document, so no character of the JSON needs
 * shell escaping; a fresh Idempotency-Key per run makes a retried run safe.
 */
export function curlCommand({ origin, path, body }: SnippetInput): string {
  return [
    `curl -sS -X POST '${origin}${path}' \\`,
    `  -H "Authorization: Bearer $LEASTLINE_KEY" \\`,
    `  -H 'Content-Type: application/json' \\`,
    `  -H "Idempotency-Key: $(uuidgen)" \\`,
    `  --data-binary @- <<'JSON'`,
    prettyBody(body),
    'JSON',
  ].join('\n');
}

function indent(text: string, spaces: number): string {
  const pad = ' '.repeat(spaces);
  return text
    .split('\n')
    .map((line, index) => (index === 0 ? line : `${pad}${line}`))
    .join('\n');
}

/** The same call through the SDK, which adds its own Idempotency-Key and retries. */
export function sdkSnippet({ origin, path, body }: SnippetInput): string {
  return [
    "import { createLeastlineClient } from '@leastline/sdk';",
    '',
    'const client = createLeastlineClient({',
    `  baseUrl: '${origin}',`,
    "  apiKey: process.env.LEASTLINE_KEY ?? '',",
    '});',
    '',
    `const { data, error } = await client.POST('${path}', {`,
    `  body: ${indent(prettyBody(body), 2)},`,
    '});',
    'if (error) throw new Error(`${error.title}: ${error.detail}`);',
    'console.log(data);',
  ].join('\n');
}
