import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';

/**
 * Writes the OpenAPI document to `openapi/openapi.json` (or, with `--check`, fails when the committed file
 * differs). Builds the app in preview mode, so no database or mail server is needed.
 */
const PLACEHOLDER_ENV: Record<string, string> = {
  LEASTLINE_DATABASE_URL: 'postgres://openapi@127.0.0.1:1/openapi',
  LEASTLINE_SESSION_SECRET: 'openapi-writer-placeholder-secret-0000',
  LEASTLINE_KEY_PEPPER: 'openapi-writer-pepper',
};

async function main() {
  for (const [name, value] of Object.entries(PLACEHOLDER_ENV)) process.env[name] ??= value;
  const { createApp, buildOpenApiDocument } = await import('../configure-app');
  const app = await createApp({ logLevel: 'silent', preview: true });
  const document = buildOpenApiDocument(app);
  await app.close();
  const target = resolve(__dirname, '../../../openapi/openapi.json');
  const text = `${JSON.stringify(document, null, 2)}\n`;
  if (process.argv.includes('--check')) {
    let committed = '';
    try {
      committed = readFileSync(target, 'utf8');
    } catch {
      committed = '';
    }
    if (committed !== text) {
      process.stderr.write('openapi/openapi.json differs from the document the API generates: run `npm run openapi`.\n');
      process.exit(1);
    }
    process.stdout.write('openapi/openapi.json matches the generated document.\n');
    return;
  }
  writeFileSync(target, text);
  process.stdout.write(`wrote ${target}\n`);
}

void main().catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
