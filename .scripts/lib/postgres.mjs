// A PostgreSQL cluster of the project's own, under the ignored .data folder, listening on 127.0.0.1 only.
// initdb refuses to run as root, so as root the cluster belongs to Debian's `postgres` system user.
import { chownSync, existsSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createHash } from 'node:crypto';
import { capture, DATA_DIR, ROOT, run, say } from './repo.mjs';

export const DEFAULT_POSTGRES_PORT = Number(process.env.LEASTLINE_PG_PORT ?? 54329);

function asRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

function systemUser(name) {
  const line = capture('getent', ['passwd', name]);
  if (!line) return undefined;
  const [, , uid, gid] = line.split(':');
  return { name, uid: Number(uid), gid: Number(gid) };
}

/** Runs a server binary as the cluster owner (the `postgres` user when we are root). */
function asOwner(owner, command, args, options = {}) {
  if (!owner) return run(command, args, { cwd: '/', ...options });
  return run('runuser', ['-u', owner.name, '--', command, ...args], { cwd: '/', ...options });
}

function captureAsOwner(owner, command, args) {
  if (!owner) return capture(command, args, { cwd: '/' });
  return capture('runuser', ['-u', owner.name, '--', command, ...args], { cwd: '/' });
}

/**
 * Picks the cluster folder: `.data/postgres` in the checkout, unless the owner cannot reach it (a checkout
 * inside a private home folder), in which case a per-checkout folder under the system temp dir is used.
 */
function clusterFolder(owner) {
  const preferred = join(DATA_DIR, 'postgres');
  if (!owner) return preferred;
  mkdirSync(DATA_DIR, { recursive: true, mode: 0o755 });
  if (captureAsOwner(owner, 'test', ['-x', DATA_DIR]) !== undefined) return preferred;
  const suffix = createHash('sha256').update(ROOT).digest('hex').slice(0, 12);
  const fallback = join(tmpdir(), `leastline-${suffix}`, 'postgres');
  say(`the postgres user cannot enter ${DATA_DIR}; keeping the cluster in ${fallback}`);
  return fallback;
}

export function ensureCluster(bin, port = DEFAULT_POSTGRES_PORT) {
  const owner = asRoot() ? systemUser('postgres') : undefined;
  if (asRoot() && !owner) throw new Error('running as root but the "postgres" system user does not exist');
  const folder = clusterFolder(owner);
  const dataDir = join(folder, 'data');
  const logFile = join(folder, 'server.log');
  mkdirSync(folder, { recursive: true, mode: 0o700 });
  if (owner) chownSync(folder, owner.uid, owner.gid);

  if (!existsSync(join(dataDir, 'PG_VERSION'))) {
    say(`creating a PostgreSQL cluster in ${dataDir}`);
    asOwner(owner, join(bin, 'initdb'), ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], {
      stdio: ['ignore', 'ignore', 'inherit'],
    });
  }
  const running = captureAsOwner(owner, join(bin, 'pg_ctl'), ['-D', dataDir, 'status']) !== undefined;
  let startedHere = false;
  if (!running) {
    say(`starting PostgreSQL on 127.0.0.1:${port}`);
    try {
      asOwner(owner, join(bin, 'pg_ctl'), ['-D', dataDir, '-l', logFile, '-w', '-t', '60', '-o', `-h 127.0.0.1 -p ${port} -k ${folder}`, 'start'], {
        stdio: ['ignore', 'ignore', 'inherit'],
      });
    } catch (error) {
      throw new Error(`PostgreSQL did not start (is port ${port} taken? set LEASTLINE_PG_PORT); see ${logFile}: ${error.message}`);
    }
    startedHere = true;
  }
  const psql = (database, sql) =>
    capture(join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-d', database, '-tAc', sql]);
  return {
    port,
    startedHere,
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    ensureDatabase(name) {
      if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`unsafe database name ${name}`);
      const exists = psql('postgres', `SELECT 1 FROM pg_database WHERE datname = '${name}'`);
      if (exists === undefined) throw new Error(`cannot reach PostgreSQL on 127.0.0.1:${port}`);
      if (exists !== '1') psql('postgres', `CREATE DATABASE ${name}`);
    },
    dropDatabase(name) {
      if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`unsafe database name ${name}`);
      psql('postgres', `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    },
    stop() {
      asOwner(owner, join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop'], { stdio: ['ignore', 'ignore', 'inherit'] });
    },
  };
}
