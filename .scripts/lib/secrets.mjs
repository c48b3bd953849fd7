// Local secrets for `npm start`, made once and kept in the ignored .data folder (never committed).
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { DATA_DIR } from './repo.mjs';

export function localSecrets() {
  const file = join(DATA_DIR, 'local-secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8'));
  mkdirSync(DATA_DIR, { recursive: true });
  const secrets = {
    sessionSecret: randomBytes(32).toString('base64url'),
    keyPepper: randomBytes(24).toString('base64url'),
  };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}
