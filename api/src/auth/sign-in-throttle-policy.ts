/**
 * Lockout after repeated failures for one e-mail address (known or not, so the answer never reveals
 * which addresses have accounts). The first FREE_FAILURES failures cost nothing; each further failure
 * locks the address for BASE_LOCK_MS × 2^(extra failures), capped at MAX_LOCK_MS. A success resets it.
 */
export const FREE_FAILURES = 5;
export const BASE_LOCK_MS = 60_000;
export const MAX_LOCK_MS = 60 * 60 * 1000;
/** Failures older than this are forgotten, so a few typos a month never add up to a lockout. */
export const FAILURE_MEMORY_MS = 24 * 60 * 60 * 1000;

export function lockDurationMs(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(BASE_LOCK_MS * 2 ** (failures - FREE_FAILURES), MAX_LOCK_MS);
}
