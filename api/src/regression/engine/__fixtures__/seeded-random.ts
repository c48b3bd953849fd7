/**
 * Deterministic pseudo-random numbers for tests and invented demo data: mulberry32 (a public-domain
 * 32-bit generator) for uniforms, Box-Muller for normals. Same seed, same sequence, on every machine.
 */
export function seededRandom(seed: number): { uniform: () => number; normal: () => number } {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const normal = () => {
    const u = 1 - uniform();
    const v = uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
  return { uniform, normal };
}

/**
 * Invented scenario used across tests: a fictional payments company, "Ferrowick Pay", with daily
 * figures per merchant. All numbers are synthetic, drawn from the seeded generator; nothing is real.
 */
export function inventedMerchantDays(
  n: number,
  seed: number,
): { volume: Float64Array; tickets: Float64Array; fees: Float64Array; chargebacks: Float64Array } {
  const random = seededRandom(seed);
  const volume = new Float64Array(n);
  const tickets = new Float64Array(n);
  const fees = new Float64Array(n);
  const chargebacks = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = 5000 + 45000 * random.uniform();
    const t = 20 + 180 * random.uniform();
    volume[i] = v;
    tickets[i] = t;
    fees[i] = 0.25 * t + 0.018 * v + 40 * random.normal();
    chargebacks[i] = Math.exp(-3 + 0.6 * Math.log(v) + 0.2 * random.normal());
  }
  return { volume, tickets, fees, chargebacks };
}
