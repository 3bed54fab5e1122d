// Unposing: inverse linear blend skinning into rest space, r_t = (Σ wⱼ Mⱼ)⁻¹ v_t − v_rest.
import { SolverInputError } from '../errors.js';
import type { Capture, Character, Clip } from '../types.js';
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  skinningMatrices,
  worldMatrices,
} from './skeleton.js';

/**
 * Rest-space residual of one frame: out[3i..] = (Σ w Sⱼ)⁻¹ · posed[3i..] − rest[3i..].
 * Vertices whose blended matrix is singular (|det| < 1e-12) get a zero residual; returns
 * their count.
 */
export function unposeFrame(
  rest: ArrayLike<number>,
  joints: ArrayLike<number>,
  weights: ArrayLike<number>,
  skin: Float64Array,
  posed: ArrayLike<number>,
  posedOffset: number,
  out: Float32Array | Float64Array,
  outOffset: number,
): number {
  const n = rest.length / 3;
  let degenerate = 0;
  for (let i = 0; i < n; i++) {
    let m0 = 0, m1 = 0, m2 = 0, m4 = 0, m5 = 0, m6 = 0; // prettier-ignore
    let m8 = 0, m9 = 0, m10 = 0, m12 = 0, m13 = 0, m14 = 0; // prettier-ignore
    for (let k = 0; k < 4; k++) {
      const w = weights[4 * i + k];
      if (w === 0) continue;
      const o = 16 * joints[4 * i + k];
      m0 += w * skin[o];
      m1 += w * skin[o + 1];
      m2 += w * skin[o + 2];
      m4 += w * skin[o + 4];
      m5 += w * skin[o + 5];
      m6 += w * skin[o + 6];
      m8 += w * skin[o + 8];
      m9 += w * skin[o + 9];
      m10 += w * skin[o + 10];
      m12 += w * skin[o + 12];
      m13 += w * skin[o + 13];
      m14 += w * skin[o + 14];
    }
    const po = posedOffset + 3 * i;
    const x = posed[po] - m12, y = posed[po + 1] - m13, z = posed[po + 2] - m14; // prettier-ignore
    // Inverse of the blended 3×3 by cofactors (column-major m0..m10).
    const c00 = m5 * m10 - m9 * m6;
    const c01 = m9 * m2 - m1 * m10;
    const c02 = m1 * m6 - m5 * m2;
    const det = m0 * c00 + m4 * c01 + m8 * c02;
    const oo = outOffset + 3 * i;
    if (!(Math.abs(det) > 1e-12)) {
      degenerate++;
      out[oo] = 0;
      out[oo + 1] = 0;
      out[oo + 2] = 0;
      continue;
    }
    const d = 1 / det;
    const rx = (c00 * x + (m8 * m6 - m4 * m10) * y + (m4 * m9 - m8 * m5) * z) * d;
    const ry = (c01 * x + (m0 * m10 - m8 * m2) * y + (m8 * m1 - m0 * m9) * z) * d;
    const rz = (c02 * x + (m4 * m2 - m0 * m6) * y + (m0 * m5 - m4 * m1) * z) * d;
    out[oo] = rx - rest[3 * i];
    out[oo + 1] = ry - rest[3 * i + 1];
    out[oo + 2] = rz - rest[3 * i + 2];
  }
  return degenerate;
}

/** Result of unposing a capture. */
export interface UnposeResult {
  /** Rest-space residuals, T × 3N frame-major. */
  residuals: Float32Array;
  /** Vertex-frames with a singular blended matrix (their residual is 0). */
  degenerate: number;
}

/** Unposes every frame of a capture with the skeleton posed by `clip` (joints matched by name). */
export function unpose(character: Character, capture: Capture, clip: Clip): UnposeResult {
  const { skeleton, restPositions, skinJoints, skinWeights } = character;
  const n = restPositions.length / 3;
  if (capture.vertexCount !== n) {
    throw new SolverInputError(
      'VERTEX_COUNT_MISMATCH',
      `capture has ${capture.vertexCount} vertices, the character ${n}`,
      {},
    );
  }
  if (clip.frameCount < capture.frameCount) {
    throw new SolverInputError(
      'NO_FRAMES',
      `the clip has ${clip.frameCount} frames, the capture ${capture.frameCount}`,
      {
        frame: clip.frameCount,
      },
    );
  }
  const map = matchClipJoints(clip, skeleton, { requireAll: true });
  const pose = createPose(skeleton.names.length);
  const skin = new Float64Array(16 * skeleton.names.length);
  const residuals = new Float32Array(capture.positions.length);
  let degenerate = 0;
  for (let f = 0; f < capture.frameCount; f++) {
    clipFramePose(clip, f, skeleton, map, pose);
    worldMatrices(skeleton, pose, skin);
    skinningMatrices(skeleton, skin, skin);
    degenerate += unposeFrame(
      restPositions,
      skinJoints,
      skinWeights,
      skin,
      capture.positions,
      3 * n * f,
      residuals,
      3 * n * f,
    );
  }
  return { residuals, degenerate };
}
