/**
 * A small seeded generator for the invented sample data, so every visitor sees the same numbers.
 * mulberry32 (Tommy Ettinger, public domain): a 32-bit state advanced by a Weyl increment and mixed
 * with two multiply-xorshift rounds; plenty for demo data, not for anything statistical or secret.
 */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let mixed = state;
    mixed = Math.imul(mixed ^ (mixed >>> 15), mixed | 1);
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61);
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal draws by the Box-Muller transform (Box and Muller, 1958) from a seeded uniform. */
export function seededNormal(seed: number): () => number {
  const uniform = seededUniform(seed);
  return () => {
    const u1 = Math.max(uniform(), Number.EPSILON);
    const u2 = uniform();
    return Math.sqrt(-2 * Math.log(u1)) * Math.cos(2 * Math.PI * u2);
  };
}

export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}
