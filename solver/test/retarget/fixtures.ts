// Shared invented fixtures of the retarget tests: the synthetic character, a profile with known
// modes on it, and helpers to scale a character and fit a free decay.
import { Matrix, solve } from 'ml-matrix';
import type { Character } from '../../src/index.js';
import { knownProfile, type KnownMode } from '../helpers/known-profile.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

/** Two decoupled modes driven by the chest and the spine. */
export const TWO_MODES: KnownMode[] = [
  { frequencyHz: 3, dampingRatio: 0.1, joint: 'chest', driver: 'chest', gain: [0, -1, 0] },
  { frequencyHz: 2.2, dampingRatio: 0.12, joint: 'spine', driver: 'spine', gain: [0, -0.5, 0] },
];

/** The synthetic character and a 60 fps profile with TWO_MODES on it. */
export function fixture(modes: KnownMode[] = TWO_MODES, fps = 60) {
  const character = syntheticCharacter();
  return { character, profile: knownProfile(character, fps, modes) };
}

/** The character uniformly scaled by `s` about the origin (mesh, skeleton, bind matrices). */
export function scaledCharacter(c: Character, s: number): Character {
  const ibm = c.skeleton.inverseBindMatrices.slice();
  for (let j = 0; j < ibm.length / 16; j++) for (let a = 12; a < 15; a++) ibm[16 * j + a] *= s;
  return {
    ...c,
    restPositions: c.restPositions.map((v) => v * s),
    skeleton: {
      ...c.skeleton,
      restTranslations: c.skeleton.restTranslations.map((v) => v * s),
      inverseBindMatrices: ibm,
    },
  };
}

/**
 * Natural frequency (Hz) and damping ratio of a free decay x_t about a constant level, by a
 * least-squares AR(2) fit with an intercept (Prony's method) and s = ln z · fps.
 */
export function freeDecayMode(
  x: ArrayLike<number>,
  fps: number,
): { frequencyHz: number; dampingRatio: number } {
  const rows: number[][] = [];
  const rhs: number[] = [];
  for (let t = 2; t < x.length; t++) {
    rows.push([x[t - 1], x[t - 2], 1]);
    rhs.push(x[t]);
  }
  const a = new Matrix(rows);
  const sol = solve(a.transpose().mmul(a), a.transpose().mmul(Matrix.columnVector(rhs)));
  const a1 = sol.get(0, 0);
  const a2 = sol.get(1, 0);
  // z² − a1 z − a2 = 0 with complex roots.
  const re = a1 / 2;
  const im = Math.sqrt(Math.max(0, -a2 - re * re));
  const sRe = Math.log(Math.hypot(re, im)) * fps;
  const sIm = Math.atan2(im, re) * fps;
  const wn = Math.hypot(sRe, sIm);
  return { frequencyHz: wn / (2 * Math.PI), dampingRatio: -sRe / wn };
}

/** Column `c` of a frame-major T × K array. */
export function column(
  a: ArrayLike<number>,
  k: number,
  c: number,
  from = 0,
  to = a.length / k,
): number[] {
  const out: number[] = [];
  for (let t = from; t < to; t++) out.push(a[t * k + c]);
  return out;
}
