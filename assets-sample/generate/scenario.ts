// The invented scenario: a small studio making an animated short set in a seaside swimming club.
// Every name here is made up; none refers to a real person, place, film, studio or brand.

/** Master seed of the generator (capture noise is derived from it). */
export const SEED = 7310;

/** Generator identity written into every file. */
export const GENERATOR = '@overshoot/assets-sample generate/main.ts';

/** The invented production. */
export const SCENARIO = {
  studio: 'Kelpfold Animation',
  show: 'Saltmarrow Lido',
  showCode: 'SML',
  logline:
    'At the Saltmarrow Lido, a seaside swimming club past its prime, stout Coach Madge Brackwater ' +
    'drills lanky Otto Spindlewick for the autumn gala while Old Grumbletusk, the walrus-like ' +
    'mascot, naps on the sun terrace.',
} as const;

/** A 32-bit seed for `name` derived from the master seed (FNV-1a hash). */
export function seedFor(master: number, name: string): number {
  let h = 0x811c9dc5;
  for (const ch of `${master}:${name}`) {
    h ^= ch.charCodeAt(0);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h;
}
