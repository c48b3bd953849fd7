// Paths and small process helpers shared by the start, test and bench commands. Node built-ins only:
// these scripts run before `node_modules` exists.
import { spawn, spawnSync } from 'node:child_process';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const DATA_DIR = join(ROOT, '.data');
export const ARTIFACTS_DIR = join(ROOT, '.artifacts');

export function say(message) {
  process.stdout.write(`[leastline] ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`[leastline] ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion with inherited output; throws with the command line on failure. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: 'inherit', cwd: ROOT, ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} exited with ${result.status ?? result.signal}`);
  }
  return result;
}

/** Runs a command and returns its trimmed stdout, or undefined when it fails or is absent. */
export function capture(command, args, options = {}) {
  const result = spawnSync(command, args, { encoding: 'utf8', cwd: ROOT, ...options });
  if (result.error || result.status !== 0) return undefined;
  return result.stdout.trim();
}

/** Runs a command asynchronously and resolves with its exit code (never rejects). */
export function runAsync(command, args, options = {}) {
  return new Promise((resolvePromise) => {
    const child = spawn(command, args, { stdio: 'inherit', cwd: ROOT, ...options });
    child.on('error', (error) => {
      process.stderr.write(`${command}: ${error.message}\n`);
      resolvePromise(1);
    });
    child.on('exit', (code, signal) => resolvePromise(code ?? (signal ? 1 : 0)));
  });
}

export function npmCommand() {
  return process.platform === 'win32' ? 'npm.cmd' : 'npm';
}
