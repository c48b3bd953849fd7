/**
 * When to try a failed message again: exponential backoff (base × 2^(attempt−1)), capped at one hour,
 * with ±20 % jitter so many messages failing together do not retry in lock-step. After MAX_ATTEMPTS the
 * message is kept but marked abandoned, for an operator to inspect.
 */
export const MAX_ATTEMPTS = 12;
export const MAX_DELAY_MS = 60 * 60 * 1000;

export function retryDelayMs(attempt: number, baseMs: number, random: () => number = Math.random): number {
  const exponential = baseMs * 2 ** Math.max(0, attempt - 1);
  const capped = Math.min(exponential, MAX_DELAY_MS);
  const jitter = 0.8 + 0.4 * random();
  return Math.round(capped * jitter);
}
