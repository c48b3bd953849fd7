// Installs what is missing: npm packages (from the lockfile) and, when absent, PostgreSQL and Chromium
// from Debian's packages.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { capture, npmCommand, ROOT, run, say } from './repo.mjs';

const INSTALL_STAMP = join(ROOT, 'node_modules', '.leastline-install-stamp');

export function ensureNodePackages() {
  const lock = join(ROOT, 'package-lock.json');
  // The stamp records the lockfile's hash, so a changed lockfile (a pull, a new package) reinstalls.
  const lockHash = createHash('sha256').update(readFileSync(lock)).digest('hex');
  const stamp = existsSync(INSTALL_STAMP) ? readFileSync(INSTALL_STAMP, 'utf8') : '';
  if (stamp === lockHash) return;
  say('installing npm packages from package-lock.json (npm ci)');
  run(npmCommand(), ['ci', '--no-audit', '--no-fund', '--loglevel=error']);
  writeFileSync(INSTALL_STAMP, lockHash);
}

function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

function aptInstall(packages) {
  const prefix = isRoot() ? [] : ['sudo', '-n'];
  say(`installing ${packages.join(', ')} from Debian's packages (apt-get)`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const apt = (args) => {
    const [command, ...rest] = [...prefix, 'apt-get', '-o', 'DPkg::Lock::Timeout=900', ...args];
    run(command, rest, { env });
  };
  apt(['update', '-q']);
  apt(['install', '-y', '-q', '--no-install-recommends', ...packages]);
}

/** Finds the PostgreSQL server binaries (Debian keeps them under /usr/lib/postgresql/<major>/bin). */
export function findPostgresBin() {
  const fromConfig = capture('pg_config', ['--bindir']);
  if (fromConfig && existsSync(join(fromConfig, 'initdb'))) return fromConfig;
  const listing = capture('sh', ['-c', 'ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1']);
  if (listing && existsSync(join(listing, 'initdb'))) return listing;
  const onPath = capture('sh', ['-c', 'command -v initdb']);
  if (onPath) return onPath.replace(/\/initdb$/, '');
  return undefined;
}

export function ensurePostgres() {
  let bin = findPostgresBin();
  if (!bin) {
    aptInstall(['postgresql']);
    bin = findPostgresBin();
  }
  if (!bin) throw new Error('PostgreSQL server binaries (initdb, pg_ctl) were not found after installing postgresql');
  return bin;
}

export function findChromium() {
  for (const candidate of ['chromium', 'chromium-browser']) {
    const path = capture('sh', ['-c', `command -v ${candidate}`]);
    if (path) return path;
  }
  return undefined;
}

export function ensureChromium() {
  let path = findChromium();
  if (!path) {
    aptInstall(['chromium']);
    path = findChromium();
  }
  return path;
}
