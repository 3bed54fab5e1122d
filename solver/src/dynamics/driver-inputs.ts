// Inputs of the dynamics from the skeleton's motion: per driver joint and frame, its specific
// force (linear acceleration minus gravity), angular velocity and angular acceleration, each in
// the joint's own frame — what a strapped-on accelerometer and gyroscope would read.
// Derivatives come from Savitzky–Golay filters (raw differences amplify noise), and quaternion
// signs are made continuous first so their derivative does not jump.
import { SolverInputError } from '../errors.js';
import { quatFromMat4, quatMakeContinuous } from '../linalg/quat.js';
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  restPose,
  worldMatrices,
} from '../rig/skeleton.js';
import type { Clip, Driver, DriverSignal, Skeleton } from '../types.js';
import { savitzkyGolay, type SavitzkyGolayOptions } from './savitzky-golay.js';

/** Gravity in the character's space (glTF: +Y up, metres per second²). */
export const GRAVITY: readonly [number, number, number] = [0, -9.81, 0];

/** Every driver signal, in the order the solver uses. */
export const ALL_DRIVER_SIGNALS: DriverSignal[] = [
  'specificForce',
  'angularVelocity',
  'angularAcceleration',
];

/** Driver inputs per frame. */
export interface DriverInputs {
  /** Input count M (3 per driver signal). */
  m: number;
  /** Raw inputs, T × M frame-major, in driver then signal order. */
  values: Float64Array;
  /** Inputs of the character standing still in its rest pose (M). */
  rest: Float64Array;
}

/** Number of inputs the drivers produce. */
export function driverInputCount(drivers: Driver[]): number {
  return drivers.reduce((n, d) => n + 3 * d.signals.length, 0);
}

/** Body-frame vector of the world vector (vx, vy, vz) for unit quaternion q at qo: q* v q. */
function toBody(
  q: ArrayLike<number>,
  qo: number,
  vx: number,
  vy: number,
  vz: number,
  out: Float64Array,
  o: number,
): void {
  const qx = -q[qo], qy = -q[qo + 1], qz = -q[qo + 2], qw = q[qo + 3]; // prettier-ignore
  const tx = 2 * (qy * vz - qz * vy);
  const ty = 2 * (qz * vx - qx * vz);
  const tz = 2 * (qx * vy - qy * vx);
  out[o] = vx + qw * tx + qy * tz - qz * ty;
  out[o + 1] = vy + qw * ty + qz * tx - qx * tz;
  out[o + 2] = vz + qw * tz + qx * ty - qy * tx;
}

/** Vector part of 2·(q* ⊗ p): the body-frame rate for p = q̇ (velocity) or p = q̈ (acceleration). */
function bodyRate(
  q: Float64Array,
  qo: number,
  p: Float64Array,
  po: number,
  out: Float64Array,
  o: number,
): void {
  const ax = -q[qo], ay = -q[qo + 1], az = -q[qo + 2], aw = q[qo + 3]; // prettier-ignore
  const bx = p[po], by = p[po + 1], bz = p[po + 2], bw = p[po + 3]; // prettier-ignore
  out[o] = 2 * (ax * bw + aw * bx + ay * bz - az * by);
  out[o + 1] = 2 * (ay * bw + aw * by + az * bx - ax * bz);
  out[o + 2] = 2 * (az * bw + aw * bz + ax * by - ay * bx);
}

/** Joint index of each driver in the skeleton; MISSING_JOINT when absent. */
export function driverJointIndices(skeleton: Skeleton, drivers: Driver[]): number[] {
  return drivers.map((d) => {
    const j = skeleton.names.indexOf(d.joint);
    if (j < 0) {
      throw new SolverInputError(
        'MISSING_JOINT',
        `driver joint "${d.joint}" is not in the skeleton`,
        {
          joint: d.joint,
        },
      );
    }
    return j;
  });
}

/**
 * Driver inputs of `clip` played on `skeleton` at the clip's own rate. The angular acceleration
 * is vec(2 q*⊗q̈), exact for unit quaternions since q*⊗q̇ is a pure quaternion.
 */
export function driverInputs(
  skeleton: Skeleton,
  clip: Clip,
  drivers: Driver[],
  options: SavitzkyGolayOptions = {},
): DriverInputs {
  const joints = driverJointIndices(skeleton, drivers);
  const T = clip.frameCount;
  const D = drivers.length;
  const map = matchClipJoints(clip, skeleton);
  const pose = createPose(skeleton.names.length);
  const world = new Float64Array(16 * skeleton.names.length);
  const pos = new Float64Array(T * 3 * D);
  const rot = new Float64Array(T * 4 * D);
  for (let t = 0; t < T; t++) {
    clipFramePose(clip, t, skeleton, map, pose);
    worldMatrices(skeleton, pose, world);
    for (let d = 0; d < D; d++) {
      const o = 16 * joints[d];
      pos.set(world.subarray(o + 12, o + 15), (t * D + d) * 3);
      quatFromMat4(rot, (t * D + d) * 4, world, o);
    }
  }
  for (let d = 0; d < D; d++) quatMakeContinuous(rot, T, 4 * D, 4 * d);
  const dt = 1 / clip.fps;
  const acc = savitzkyGolay(pos, T, 3 * D, 2, dt, new Float64Array(pos.length), options);
  const qd = savitzkyGolay(rot, T, 4 * D, 1, dt, new Float64Array(rot.length), options);
  const qdd = savitzkyGolay(rot, T, 4 * D, 2, dt, new Float64Array(rot.length), options);
  const m = driverInputCount(drivers);
  const values = new Float64Array(T * m);
  for (let t = 0; t < T; t++) {
    let col = t * m;
    for (let d = 0; d < D; d++) {
      const p = (t * D + d) * 3;
      const q = (t * D + d) * 4;
      for (const signal of drivers[d].signals) {
        if (signal === 'specificForce') {
          toBody(
            rot,
            q,
            acc[p] - GRAVITY[0],
            acc[p + 1] - GRAVITY[1],
            acc[p + 2] - GRAVITY[2],
            values,
            col,
          );
        } else if (signal === 'angularVelocity') {
          bodyRate(rot, q, qd, q, values, col);
        } else {
          bodyRate(rot, q, qdd, q, values, col);
        }
        col += 3;
      }
    }
  }
  return { m, values, rest: restDriverInputs(skeleton, drivers) };
}

/** Inputs of the skeleton standing still in its rest pose: gravity reversed, no rotation. */
export function restDriverInputs(skeleton: Skeleton, drivers: Driver[]): Float64Array {
  const joints = driverJointIndices(skeleton, drivers);
  const world = worldMatrices(
    skeleton,
    restPose(skeleton),
    new Float64Array(16 * skeleton.names.length),
  );
  const out = new Float64Array(driverInputCount(drivers));
  const q = new Float64Array(4);
  let col = 0;
  drivers.forEach((d, i) => {
    quatFromMat4(q, 0, world, 16 * joints[i]);
    for (const signal of d.signals) {
      if (signal === 'specificForce') toBody(q, 0, -GRAVITY[0], -GRAVITY[1], -GRAVITY[2], out, col);
      col += 3;
    }
  });
  return out;
}
