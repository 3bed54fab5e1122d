// Pose features for the pose-driven (corrective) deformation: per joint and frame, the nine
// entries of R − I, with R the joint's local rotation relative to its rest rotation
// (R = R_restᵀ R_local), so every feature is zero in the rest pose and the correctives vanish
// there. Linear in R, these features represent any bulge that varies with 1 − cos θ or sin θ of
// a joint's rotation (pose space deformation, Lewis, Cordner & Fong 2000).
import { clipFramePose, createPose, matchClipJoints } from '../rig/skeleton.js';
import type { Clip, PoseCorrectives, Skeleton } from '../types.js';

/** Features per joint (the entries of a 3×3 matrix). */
export const FEATURES_PER_JOINT = 9;

/** Writes R − I (row-major 3×3) of quaternion b relative to a: R = R(a)ᵀ R(b). */
function relativeRotationMinusIdentity(
  a: ArrayLike<number>,
  ao: number,
  b: ArrayLike<number>,
  bo: number,
  out: Float64Array,
  o: number,
): void {
  // q = a* ⊗ b
  const ax = -a[ao], ay = -a[ao + 1], az = -a[ao + 2], aw = a[ao + 3]; // prettier-ignore
  const bx = b[bo], by = b[bo + 1], bz = b[bo + 2], bw = b[bo + 3]; // prettier-ignore
  let x = ax * bw + aw * bx + ay * bz - az * by;
  let y = ay * bw + aw * by + az * bx - ax * bz;
  let z = az * bw + aw * bz + ax * by - ay * bx;
  let w = aw * bw - ax * bx - ay * by - az * bz;
  const len = Math.hypot(x, y, z, w) || 1;
  x /= len;
  y /= len;
  z /= len;
  w /= len;
  out[o] = -2 * (y * y + z * z);
  out[o + 1] = 2 * (x * y - z * w);
  out[o + 2] = 2 * (x * z + y * w);
  out[o + 3] = 2 * (x * y + z * w);
  out[o + 4] = -2 * (x * x + z * z);
  out[o + 5] = 2 * (y * z - x * w);
  out[o + 6] = 2 * (x * z - y * w);
  out[o + 7] = 2 * (y * z + x * w);
  out[o + 8] = -2 * (x * x + y * y);
}

/** Pose features of every frame of `clip` on `skeleton`: T × J × 9, frame-major. */
export function poseFeatures(skeleton: Skeleton, clip: Clip): Float64Array {
  const jc = skeleton.names.length;
  const map = matchClipJoints(clip, skeleton);
  const pose = createPose(jc);
  const out = new Float64Array(clip.frameCount * jc * FEATURES_PER_JOINT);
  for (let t = 0; t < clip.frameCount; t++) {
    clipFramePose(clip, t, skeleton, map, pose);
    for (let j = 0; j < jc; j++) {
      relativeRotationMinusIdentity(
        skeleton.restRotations,
        4 * j,
        pose.rotations,
        4 * j,
        out,
        (t * jc + j) * FEATURES_PER_JOINT,
      );
    }
  }
  return out;
}

/**
 * Clamps `frames` frames of pose features (T × J × 9, from poseFeatures) in place into the
 * training range the correctives carry; without one (older profiles) they stay as they are.
 */
export function clampFeatures(
  correctives: PoseCorrectives,
  features: Float64Array,
  frames: number,
): Float64Array {
  const { featureMin: lo, featureMax: hi } = correctives;
  if (!lo || !hi) return features;
  const w = lo.length;
  for (let t = 0; t < frames; t++) {
    for (let k = 0; k < w; k++) {
      const v = features[t * w + k];
      features[t * w + k] = v < lo[k] ? lo[k] : v > hi[k] ? hi[k] : v;
    }
  }
  return features;
}

/** Smallest and largest value of each feature (J × 9) over `frames` frames of `features`. */
export function featureRange(
  features: ArrayLike<number>,
  frames: number,
  width: number,
): { featureMin: Float64Array; featureMax: Float64Array } {
  const featureMin = new Float64Array(width);
  const featureMax = new Float64Array(width);
  for (let k = 0; k < width && frames > 0; k++) {
    let lo = features[k];
    let hi = lo;
    for (let t = 1; t < frames; t++) {
      const v = features[t * width + k];
      if (v < lo) lo = v;
      else if (v > hi) hi = v;
    }
    featureMin[k] = lo;
    featureMax[k] = hi;
  }
  return { featureMin, featureMax };
}

/**
 * Pose-driven offsets (rest space, 3N) of one frame: out = Σ_slots Σ_f feature · coefficient,
 * with `features` the frame's J × 9 block (from poseFeatures) starting at `featureOffset`, each
 * feature clamped into the correctives' training range when they carry one.
 */
export function applyCorrectives(
  correctives: PoseCorrectives,
  features: ArrayLike<number>,
  featureOffset: number,
  out: Float32Array | Float64Array,
  outOffset = 0,
): void {
  const { featureJoints, coefficients, featuresPerVertex: fpv, featureMin: lo } = correctives;
  const n = featureJoints.length / 4;
  const slots = fpv / FEATURES_PER_JOINT;
  // Clamp the frame's features once here, not once per vertex that reads them.
  let frame = features;
  let fo = featureOffset;
  if (lo && correctives.featureMax) {
    const copy = new Float64Array(lo.length);
    for (let k = 0; k < lo.length; k++) copy[k] = features[featureOffset + k];
    frame = clampFeatures(correctives, copy, 1);
    fo = 0;
  }
  for (let i = 0; i < n; i++) {
    let x = 0, y = 0, z = 0; // prettier-ignore
    for (let s = 0; s < slots; s++) {
      const fb = fo + featureJoints[4 * i + s] * FEATURES_PER_JOINT;
      const co = i * 3 * fpv + s * FEATURES_PER_JOINT;
      for (let f = 0; f < FEATURES_PER_JOINT; f++) {
        const v = frame[fb + f];
        if (v === 0) continue;
        x += v * coefficients[co + f];
        y += v * coefficients[co + fpv + f];
        z += v * coefficients[co + 2 * fpv + f];
      }
    }
    out[outOffset + 3 * i] = x;
    out[outOffset + 3 * i + 1] = y;
    out[outOffset + 3 * i + 2] = z;
  }
}
