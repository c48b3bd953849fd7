/**
 * Invented data for the examples: a small seeded generator (mulberry32) and normal draws (Box-Muller), so
 * every run sends the same numbers. Nothing here describes a real company, fund or market.
 */
export function seededRandom(seed: number): () => number {
  let state = seed | 0;
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function normalDraws(random: () => number): () => number {
  return () => {
    const u = Math.max(random(), 1e-12);
    const v = random();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
}

/** Reads the API origin and key from the environment, as a backend service would. */
export function connection(): { baseUrl: string; apiKey: string } {
  const baseUrl = process.env.LEASTLINE_URL ?? 'http://127.0.0.1:4310';
  const apiKey = process.env.LEASTLINE_KEY;
  if (!apiKey) {
    process.stderr.write('Set LEASTLINE_KEY to an API key (npm start prints the demo key) and LEASTLINE_URL if not local.\n');
    process.exit(2);
  }
  return { baseUrl, apiKey };
}

export const CAUTION = 'Invented data. Estimates under the stated model assumptions; not financial advice.';
