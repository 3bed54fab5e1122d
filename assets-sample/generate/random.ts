// Seeded pseudo-random numbers: mulberry32 (a small, well-known 32-bit generator) and normal
// deviates by the Box–Muller transform. Same seed, same numbers, on every machine.

/** A generator of uniform numbers in [0, 1). */
export type Random = () => number;

/** mulberry32 seeded with a 32-bit integer. */
export function seededRandom(seed: number): Random {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates from a uniform generator (Box–Muller, one value per call). */
export function normalRandom(rand: Random): () => number {
  return () => {
    const u = 1 - rand();
    const v = rand();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
}
