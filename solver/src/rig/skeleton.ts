// Skeleton maths: poses, forward kinematics and skinning matrices, all into caller buffers.
import { SolverInputError } from '../errors.js';
import { mat4Compose, mat4Multiply } from '../linalg/mat4.js';
import type { Clip, Pose, Skeleton } from '../types.js';

/** A pose buffer for `jointCount` joints (identity rotations, zero translations). */
export function createPose(jointCount: number): Pose {
  const rotations = new Float64Array(4 * jointCount);
  for (let j = 0; j < jointCount; j++) rotations[4 * j + 3] = 1;
  return { rotations, translations: new Float64Array(3 * jointCount) };
}

/** Writes the skeleton's rest pose into `out` (allocated when omitted). */
export function restPose(skeleton: Skeleton, out = createPose(skeleton.names.length)): Pose {
  out.rotations.set(skeleton.restRotations);
  out.translations.set(skeleton.restTranslations);
  return out;
}

/**
 * World matrix per joint (16J, column-major): world_j = world_parent · T·R·S, with the rest
 * scale and the pose's rotation and translation. Roots hang under `rootParentMatrix`.
 */
export function worldMatrices(skeleton: Skeleton, pose: Pose, out: Float64Array): Float64Array {
  const { parents, restScales, rootParentMatrix } = skeleton;
  const count = parents.length;
  for (let j = 0; j < count; j++) {
    const o = 16 * j;
    mat4Compose(out, o, pose.translations, 3 * j, pose.rotations, 4 * j, restScales, 3 * j);
    const p = parents[j];
    if (p >= 0) mat4Multiply(out, o, out, 16 * p, out, o);
    else mat4Multiply(out, o, rootParentMatrix, 0, out, o);
  }
  return out;
}

/** Skinning matrix per joint: world_j · inverseBind_j (16J). `out` may alias `world`. */
export function skinningMatrices(
  skeleton: Skeleton,
  world: Float64Array,
  out: Float64Array,
): Float64Array {
  const ibm = skeleton.inverseBindMatrices;
  for (let j = 0; j < skeleton.parents.length; j++) {
    mat4Multiply(out, 16 * j, world, 16 * j, ibm, 16 * j);
  }
  return out;
}

/** Options for matching a clip's joints to a skeleton. */
export interface JointMatchOptions {
  /** Throw MISSING_JOINT when a skeleton joint has no clip joint of the same name. */
  requireAll?: boolean;
}

/** Default joint-match options. */
export const JOINT_MATCH_DEFAULTS: Required<JointMatchOptions> = { requireAll: false };

/** Clip joint index for each skeleton joint, matched by exact name (-1 when absent). */
export function matchClipJoints(
  clip: Clip,
  skeleton: Skeleton,
  options: JointMatchOptions = {},
): Int32Array {
  const opts = { ...JOINT_MATCH_DEFAULTS, ...options };
  const byName = new Map<string, number>();
  clip.jointNames.forEach((n, i) => byName.set(n, i));
  const map = new Int32Array(skeleton.names.length);
  skeleton.names.forEach((name, j) => {
    const i = byName.get(name);
    if (i === undefined && opts.requireAll) {
      throw new SolverInputError('MISSING_JOINT', `the clip has no joint named "${name}"`, {
        joint: name,
      });
    }
    map[j] = i ?? -1;
  });
  return map;
}

/**
 * Pose of the skeleton at a clip frame: rotations from the clip where matched, else rest;
 * translations from the clip only where animated, else the skeleton's own rest offsets.
 */
export function clipFramePose(
  clip: Clip,
  frame: number,
  skeleton: Skeleton,
  jointMap: Int32Array,
  out: Pose,
): Pose {
  const jc = clip.jointNames.length;
  for (let j = 0; j < jointMap.length; j++) {
    const i = jointMap[j];
    const r = 4 * j;
    const t = 3 * j;
    if (i < 0) {
      for (let k = 0; k < 4; k++) out.rotations[r + k] = skeleton.restRotations[r + k];
      for (let k = 0; k < 3; k++) out.translations[t + k] = skeleton.restTranslations[t + k];
      continue;
    }
    const cr = 4 * (frame * jc + i);
    for (let k = 0; k < 4; k++) out.rotations[r + k] = clip.rotations[cr + k];
    const src = clip.translationAnimated[i] ? clip.translations : null;
    const ct = 3 * (frame * jc + i);
    for (let k = 0; k < 3; k++) {
      out.translations[t + k] = src ? src[ct + k] : skeleton.restTranslations[t + k];
    }
  }
  return out;
}

/** World matrices of a clip's own skeleton at one frame (16J), using the clip's offsets. */
export function clipWorldMatrices(clip: Clip, frame: number, out: Float64Array): Float64Array {
  const jc = clip.jointNames.length;
  const one = [1, 1, 1];
  for (let j = 0; j < jc; j++) {
    const o = 16 * j;
    const base = frame * jc + j;
    mat4Compose(out, o, clip.translations, 3 * base, clip.rotations, 4 * base, one, 0);
    const p = clip.parents[j];
    if (p >= 0) mat4Multiply(out, o, out, 16 * p, out, o);
  }
  return out;
}

/**
 * A permutation listing joints so that parents precede children (stable for inputs already
 * in that order). Throws UNSUPPORTED_INPUT on a cycle.
 */
export function parentsFirstOrder(parents: ArrayLike<number>): number[] {
  const n = parents.length;
  const order: number[] = [];
  const state = new Uint8Array(n); // 0 new, 1 visiting, 2 done
  const visit = (j: number): void => {
    if (state[j] === 2) return;
    if (state[j] === 1) {
      throw new SolverInputError('UNSUPPORTED_INPUT', 'the joint hierarchy has a cycle', {
        joint: j,
      });
    }
    state[j] = 1;
    if (parents[j] >= 0) visit(parents[j]);
    state[j] = 2;
    order.push(j);
  };
  for (let j = 0; j < n; j++) visit(j);
  return order;
}
