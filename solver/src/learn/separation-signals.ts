// Signals that compete with the pose features in the pose-driven fit: every joint's specific
// force minus its rest value (what drives the tissue, and whose slow part is the tissue's
// quasi-static response, e.g. sag as a limb's angle to gravity changes), with its first two
// derivatives. A damped mode's response below its natural frequency is, to second order, a
// combination of its input and the input's first two derivatives.
import { driverInputs } from '../dynamics/driver-inputs.js';
import type { SavitzkyGolayOptions } from '../dynamics/savitzky-golay.js';
import type { Clip, Driver, Skeleton } from '../types.js';

/** Per-joint competing signals, T × J × perJoint. */
export interface CompetingSignals {
  values: Float64Array;
  perJoint: number;
}

/** Specific force minus rest of every joint of `skeleton` over `clip`, with `derivatives` (0–2). */
export function separationSignals(
  skeleton: Skeleton,
  clip: Clip,
  derivatives: number,
  sg: SavitzkyGolayOptions,
): CompetingSignals {
  const all: Driver[] = skeleton.names.map((joint) => ({ joint, signals: ['specificForce'] }));
  const ci = driverInputs(skeleton, clip, all, sg);
  const T = clip.frameCount;
  for (let t = 0; t < T; t++) for (let i = 0; i < ci.m; i++) ci.values[t * ci.m + i] -= ci.rest[i];
  return withDerivatives(ci.values, T, ci.m / 3, derivatives);
}

/**
 * Per joint: its signal (T × J × 3) and up to two time derivatives by central differences (per
 * frame; one-sided at the ends), T × J × 3(1 + derivatives).
 */
export function withDerivatives(
  values: Float64Array,
  frames: number,
  joints: number,
  derivatives: number,
): CompetingSignals {
  const m = 3 * joints;
  const pj = 3 * (1 + derivatives);
  const out = new Float64Array(frames * joints * pj);
  const at = (t: number, c: number): number => values[Math.min(frames - 1, Math.max(0, t)) * m + c];
  for (let t = 0; t < frames; t++) {
    for (let j = 0; j < joints; j++) {
      for (let a = 0; a < 3; a++) {
        const c = 3 * j + a;
        const o = (t * joints + j) * pj + a;
        out[o] = at(t, c);
        if (derivatives >= 1) out[o + 3] = (at(t + 1, c) - at(t - 1, c)) / 2;
        if (derivatives >= 2) out[o + 6] = at(t + 1, c) - 2 * at(t, c) + at(t - 1, c);
      }
    }
  }
  return { values: out, perJoint: pj };
}
