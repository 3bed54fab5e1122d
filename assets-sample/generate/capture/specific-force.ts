// Specific force of a joint in its own frame: f = Rᵀ(a − g), what an accelerometer strapped to
// the bone would read. a comes from central second differences of the joint's world position on
// the fine grid (error O(h²) at h = 1/1200 s, far below the motion's own scale).
import { GRAVITY } from '../motion/hops.js';
import type { FineKinematics } from '../motion/sample-motion.js';
import { FINE_RATE } from '../motion/sample-motion.js';

/** Specific force at rest in the bone frame (rest rotations are identity): gravity reversed. */
export const REST_SPECIFIC_FORCE: [number, number, number] = [0, GRAVITY, 0];

/**
 * Specific force (3 per sample) of driver `i` at fine samples 1 … count−2; the first and last
 * samples copy their neighbours (the padding keeps them outside the clip).
 */
export function specificForce(kin: FineKinematics, i: number): Float64Array {
  const { count } = kin;
  const p = kin.positions[i];
  const r = kin.rotations[i];
  const out = new Float64Array(3 * count);
  const inv = FINE_RATE * FINE_RATE;
  for (let k = 1; k < count - 1; k++) {
    const ax = (p[3 * k + 3] - 2 * p[3 * k] + p[3 * k - 3]) * inv;
    const ay = (p[3 * k + 4] - 2 * p[3 * k + 1] + p[3 * k - 2]) * inv + GRAVITY;
    const az = (p[3 * k + 5] - 2 * p[3 * k + 2] + p[3 * k - 1]) * inv;
    // Rotate the world vector into the bone frame: v' = q* v q.
    const qx = -r[4 * k], qy = -r[4 * k + 1], qz = -r[4 * k + 2], qw = r[4 * k + 3]; // prettier-ignore
    const tx = 2 * (qy * az - qz * ay);
    const ty = 2 * (qz * ax - qx * az);
    const tz = 2 * (qx * ay - qy * ax);
    out[3 * k] = ax + qw * tx + (qy * tz - qz * ty);
    out[3 * k + 1] = ay + qw * ty + (qz * tx - qx * tz);
    out[3 * k + 2] = az + qw * tz + (qx * ty - qy * tx);
  }
  out.copyWithin(0, 3, 6);
  out.copyWithin(3 * (count - 1), 3 * (count - 2), 3 * (count - 1));
  return out;
}
