// Seeded pseudo-random numbers (mulberry32) so every test run sees the same data.

/** A function returning uniform numbers in [0, 1) from `seed`. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A random unit quaternion [x, y, z, w] whose rotation angle is at most `maxAngle` radians. */
export function randomQuat(rand: () => number, maxAngle: number): number[] {
  let x = rand() * 2 - 1;
  let y = rand() * 2 - 1;
  let z = rand() * 2 - 1;
  const len = Math.hypot(x, y, z) || 1;
  x /= len;
  y /= len;
  z /= len;
  const angle = (rand() * 2 - 1) * maxAngle;
  const s = Math.sin(angle / 2);
  return [x * s, y * s, z * s, Math.cos(angle / 2)];
}
