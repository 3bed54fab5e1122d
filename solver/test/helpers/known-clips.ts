// Invented test motion on a character's skeleton, sampled from closed-form functions of time so
// that the same motion can be sampled at any rate.
import { quatFromAxisAngle, quatMultiply, type Character, type Clip } from '../../src/index.js';

/** Root height (m) and spine bend (rad) at time t (s). */
export type MotionFn = (t: number) => { rootY: number; rootX: number; bend: number };

/** The motion sampled at `fps` for `seconds` on the character's skeleton. */
export function sampledClip(
  character: Character,
  fps: number,
  seconds: number,
  motion: MotionFn,
): Clip {
  const s = character.skeleton;
  const jc = s.names.length;
  const frames = Math.round(seconds * fps) + 1;
  const rotations = new Float32Array(4 * jc * frames);
  const translations = new Float32Array(3 * jc * frames);
  const bendJoint = Math.max(
    0,
    s.names.findIndex((n) => /spine/i.test(n)),
  );
  const q = new Float64Array(4);
  for (let f = 0; f < frames; f++) {
    const { rootY, rootX, bend } = motion(f / fps);
    for (let j = 0; j < jc; j++) {
      if (j === bendJoint) {
        quatFromAxisAngle(q, 0, 1, 0, 0, bend);
        quatMultiply(q, 0, s.restRotations, 4 * j, q, 0);
        rotations.set(q, 4 * (f * jc + j));
      } else rotations.set(s.restRotations.subarray(4 * j, 4 * j + 4), 4 * (f * jc + j));
      translations.set(s.restTranslations.subarray(3 * j, 3 * j + 3), 3 * (f * jc + j));
    }
    translations[3 * f * jc] += rootX;
    translations[3 * f * jc + 1] += rootY;
  }
  return {
    name: 'known_motion',
    fps,
    frameCount: frames,
    jointNames: [...s.names],
    parents: s.parents.slice(),
    offsets: s.restTranslations.slice(),
    rotations,
    translations,
    translationAnimated: Uint8Array.from(s.parents, (p) => (p < 0 ? 1 : 0)),
    warnings: [],
  };
}

/** Smooth bouncing and swaying below 2 Hz, starting and ending at rest (invented). */
export const bounceMotion: MotionFn = (t) => {
  const env = t < 0.5 ? 0 : Math.sin(Math.min(1, (t - 0.5) / 2) * Math.PI) ** 2;
  return {
    rootY: 0.05 * env * Math.sin(2 * Math.PI * 1.7 * t),
    rootX: 0.1 * env * Math.sin(2 * Math.PI * 0.8 * t),
    bend: 0.3 * env * Math.sin(2 * Math.PI * 1.1 * t),
  };
};

/**
 * A drop and a hard landing: still for 0.3 s, a smooth 0.25 s fall of `drop` metres that ends
 * with a quick smooth stop, then standing still (invented).
 */
export function landingMotion(drop: number): MotionFn {
  return (t) => {
    const u = Math.min(1, Math.max(0, (t - 0.3) / 0.25));
    // Fall with growing speed then a smoothstep-like stop in the last fifth.
    const fall = u < 0.8 ? 0.8 * (u / 0.8) ** 2 : 0.8 + 0.2 * (1 - (1 - (u - 0.8) / 0.2) ** 2);
    return { rootY: -drop * fall, rootX: 0, bend: 0 };
  };
}
