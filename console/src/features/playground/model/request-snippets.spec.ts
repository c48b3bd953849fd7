import { describe, expect, it } from 'vitest';
import { curlCommand, sdkSnippet } from '@/features/playground/model/request-snippets';

// An invented request whose strings hold the characters that break naive shell quoting.
const body = {
  data: { columns: { fee_rate: [0.012, 0.018], "merchant's tier": ['a "gold" tier', 'b $HOME `x`'] } },
  model: { response: 'fee_rate', predictors: ["merchant's tier"] },
};

function hereDocument(command: string): string {
  const lines = command.split('\n');
  const start = lines.findIndex((line) => line.endsWith("<<'JSON'"));
  const end = lines.lastIndexOf('JSON');
  expect(start).toBeGreaterThan(-1);
  expect(end).toBeGreaterThan(start);
  return lines.slice(start + 1, end).join('\n');
}

describe('curlCommand', () => {
  const command = curlCommand({ origin: 'https://api.example.test', path: '/v1/fits', body });

  it('posts to the endpoint on the given origin', () => {
    expect(command.split('\n')[0]).toBe("curl -sS -X POST 'https://api.example.test/v1/fits' \\");
  });

  it('reads the key from $LEASTLINE_KEY instead of writing one in', () => {
    expect(command).toContain('-H "Authorization: Bearer $LEASTLINE_KEY"');
    expect(command).not.toMatch(/llsq1_/);
  });

  it('sends the body unchanged through a quoted here-document', () => {
    expect(JSON.parse(hereDocument(command))).toEqual(body);
  });

  it('asks for a fresh idempotency key on each run', () => {
    expect(command).toContain('-H "Idempotency-Key: $(uuidgen)"');
  });
});

describe('sdkSnippet', () => {
  const snippet = sdkSnippet({ origin: 'https://api.example.test', path: '/v1/rolling-fits', body });

  it('creates the client with the key from the environment and calls the literal path', () => {
    expect(snippet).toContain("import { createLeastlineClient } from '@leastline/sdk';");
    expect(snippet).toContain("apiKey: process.env.LEASTLINE_KEY ?? '',");
    expect(snippet).toContain("await client.POST('/v1/rolling-fits', {");
  });

  it('embeds the body as an object literal equal to the request', () => {
    const literal = snippet.slice(snippet.indexOf('body: ') + 'body: '.length, snippet.lastIndexOf(',\n});'));
    expect(JSON.parse(literal)).toEqual(body);
  });
});
