// `npm run bench`: compiles the API, then runs every benchmark in test/bench one after another (never in
// parallel: each measures side by side within its own run, and the machine has few cores).
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { ensureNodePackages } from './lib/dependencies.mjs';
import { buildApi } from './lib/stack.mjs';
import { fail, ROOT, runAsync, say } from './lib/repo.mjs';

async function main() {
  ensureNodePackages();
  buildApi();
  const folder = join(ROOT, 'test', 'bench');
  const only = process.argv[2];
  const files = readdirSync(folder)
    .filter((file) => /\.bench\.(m?js)$/.test(file))
    .filter((file) => !only || file.includes(only))
    .sort();
  let failures = 0;
  for (const file of files) {
    say(`benchmark ${file}`);
    const code = await runAsync(process.execPath, ['--max-old-space-size=8192', join(folder, file)]);
    if (code !== 0) failures += 1;
  }
  if (failures > 0) fail(`${failures} benchmark(s) failed`);
}

main().catch((error) => fail(error.message));
