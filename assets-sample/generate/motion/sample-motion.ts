// Samples a motion script: the root path is integrated on a fine time grid (1200 Hz, a common
// multiple of 24, 30 and 60 fps), the clip takes every n-th pose, and chosen joints' world
// positions and rotations can be kept at the fine rate for exact dynamics downstream.
import type { Clip } from '@overshoot/solver';
import { Quaternion, Vector3 } from 'three';
import type { MotionScript } from './motion-script.js';
import { poseAt, type ScriptPose } from './pose-model.js';
import type { RigInfo } from './rig-info.js';
import { valueAt } from './tracks.js';

/** Fine sampling rate (Hz) shared by clips and dynamics. */
export const FINE_RATE = 1200;

/** Root ground path (x, z) at every fine sample from t = −pad/FINE_RATE on. */
function rootPath(s: MotionScript, samples: number, pad: number): Float64Array {
  const h = 1 / FINE_RATE;
  const out = new Float64Array(2 * samples);
  let vx0 = 0, vz0 = 0; // prettier-ignore
  for (let k = 0; k < samples; k++) {
    const t = (k - pad) * h;
    const v = valueAt(s.speed, t);
    const a = valueAt(s.heading, t);
    const vx = v * Math.sin(a), vz = v * Math.cos(a); // prettier-ignore
    if (k > 0) {
      // Trapezoid rule: its second difference is exactly the central difference of velocity.
      out[2 * k] = out[2 * k - 2] + (h * (vx0 + vx)) / 2;
      out[2 * k + 1] = out[2 * k - 1] + (h * (vz0 + vz)) / 2;
    }
    vx0 = vx;
    vz0 = vz;
  }
  // The body starts at the origin at t = 0, whatever the padding.
  const x0 = out[2 * pad], z0 = out[2 * pad + 1]; // prettier-ignore
  for (let k = 0; k < samples; k++) {
    out[2 * k] -= x0;
    out[2 * k + 1] -= z0;
  }
  return out;
}

/** Frames per fine step for a clip rate; throws when fps does not divide the fine rate. */
export function fineStride(fps: number): number {
  const stride = FINE_RATE / fps;
  if (!Number.isInteger(stride)) throw new Error(`fps ${fps} does not divide ${FINE_RATE}`);
  return stride;
}

/** Evaluates poses at fine samples k = 0 … count−1 (t = k / FINE_RATE − pad / FINE_RATE). */
export function samplePoses(
  rig: RigInfo,
  s: MotionScript,
  count: number,
  pad: number,
  pick: (k: number) => boolean,
  visit: (k: number, pose: ScriptPose) => void,
): void {
  const path = rootPath(s, count, pad);
  const pose: ScriptPose = {
    root: new Float64Array(3),
    rotations: new Float64Array(4 * rig.names.length),
  };
  for (let k = 0; k < count; k++) {
    if (!pick(k)) continue;
    poseAt(rig, s, (k - pad) / FINE_RATE, { x: path[2 * k], z: path[2 * k + 1] }, pose);
    visit(k, pose);
  }
}

/** The script as a clip at its own fps (rotations sign-continuous, stored as float32). */
export function sampleClip(rig: RigInfo, s: MotionScript): Clip {
  const stride = fineStride(s.fps);
  const frames = Math.round(s.duration * s.fps);
  const jc = rig.names.length;
  const rotations = new Float32Array(4 * jc * frames);
  const translations = new Float32Array(3 * jc * frames);
  const offsets = new Float64Array(3 * jc);
  rig.rest.forEach((p, j) => {
    const parent = rig.parents[j];
    const base = parent >= 0 ? rig.rest[parent] : new Vector3();
    offsets.set([p.x - base.x, p.y - base.y, p.z - base.z], 3 * j);
  });
  const prev = new Float64Array(4 * jc);
  samplePoses(
    rig,
    s,
    (frames - 1) * stride + 1,
    0,
    (k) => k % stride === 0,
    (k, pose) => {
      const f = k / stride;
      for (let j = 0; j < jc; j++) {
        const r = pose.rotations;
        let sign = 1;
        if (f > 0) {
          const d = r[4 * j] * prev[4 * j] + r[4 * j + 1] * prev[4 * j + 1] + r[4 * j + 2] * prev[4 * j + 2] + r[4 * j + 3] * prev[4 * j + 3]; // prettier-ignore
          if (d < 0) sign = -1;
        }
        for (let c = 0; c < 4; c++) {
          prev[4 * j + c] = sign * r[4 * j + c];
          rotations[4 * (f * jc + j) + c] = prev[4 * j + c];
        }
        const root = j === rig.hips;
        for (let c = 0; c < 3; c++) {
          translations[3 * (f * jc + j) + c] = root ? pose.root[c] : offsets[3 * j + c];
        }
      }
    },
  );
  const translationAnimated = new Uint8Array(jc);
  translationAnimated[rig.hips] = 1;
  return {
    name: s.id,
    fps: s.fps,
    frameCount: frames,
    jointNames: rig.names.slice(),
    parents: Int32Array.from(rig.parents),
    offsets,
    rotations,
    translations,
    translationAnimated,
    warnings: [],
  };
}

/** World position (3) and rotation (4) of `joints` at fine samples, each a (count × …) array. */
export interface FineKinematics {
  count: number;
  /** Fine samples before t = 0 (for central differences). */
  pad: number;
  positions: Float64Array[];
  rotations: Float64Array[];
}

/** World kinematics of some joints at every fine sample from −pad to duration + pad. */
export function fineKinematics(
  rig: RigInfo,
  s: MotionScript,
  joints: number[],
  pad = 2,
): FineKinematics {
  const count = Math.round(s.duration * FINE_RATE) + 2 * pad + 1;
  const jc = rig.names.length;
  const positions = joints.map(() => new Float64Array(3 * count));
  const rotations = joints.map(() => new Float64Array(4 * count));
  const wq = Array.from({ length: jc }, () => new Quaternion());
  const wp = Array.from({ length: jc }, () => new Vector3());
  const local = new Quaternion();
  const off = new Vector3();
  samplePoses(rig, s, count, pad, () => true, (k, pose) => {
    for (let j = 0; j < jc; j++) {
      const r = pose.rotations;
      local.set(r[4 * j], r[4 * j + 1], r[4 * j + 2], r[4 * j + 3]);
      const p = rig.parents[j];
      if (p < 0) {
        wq[j].copy(local);
        wp[j].set(pose.root[0], pose.root[1], pose.root[2]);
      } else {
        off.subVectors(rig.rest[j], rig.rest[p]).applyQuaternion(wq[p]);
        wp[j].copy(wp[p]).add(off);
        wq[j].copy(wq[p]).multiply(local);
      }
    }
    joints.forEach((j, i) => {
      positions[i].set([wp[j].x, wp[j].y, wp[j].z], 3 * k);
      rotations[i].set([wq[j].x, wq[j].y, wq[j].z, wq[j].w], 4 * k);
    });
  }); // prettier-ignore
  return { count, pad, positions, rotations };
}
