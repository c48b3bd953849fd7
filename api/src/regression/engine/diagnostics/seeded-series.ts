/**
 * Seeded pseudo-random series for the engine's tests: invented data, reproducible run to run.
 * mulberry32 (a 32-bit generator by Tommy Ettinger, public domain) and the Box-Muller transform
 * (Box & Muller 1958, Annals of Mathematical Statistics 29(2), 610-611) for standard normal draws.
 */

export interface SeededSource {
  uniform(): number;
  normal(): number;
}

export function seededSource(seed: number): SeededSource {
  let state = seed | 0;
  const uniform = (): number => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  let spare: number | null = null;
  const normal = (): number => {
    if (spare !== null) {
      const value = spare;
      spare = null;
      return value;
    }
    let u = uniform();
    while (u === 0) u = uniform();
    const radius = Math.sqrt(-2 * Math.log(u));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
  return { uniform, normal };
}
