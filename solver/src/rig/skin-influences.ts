// Per-joint influence lists and blend-corrected fit targets for pose estimation.
import type { Character } from '../types.js';

/** Per-joint influence lists in compressed rows (entries of joint j: start[j] ≤ k < start[j+1]). */
export interface Influences {
  start: Int32Array;
  vertex: Int32Array;
  weight: Float64Array;
  /** Slot (0–3) of the influence in the vertex's four. */
  slot: Uint8Array;
}

/** Influences of at least `minWeight`, grouped by joint. */
export function influenceLists(character: Character, minWeight: number): Influences {
  const { skinJoints, skinWeights } = character;
  const jc = character.skeleton.names.length;
  const start = new Int32Array(jc + 1);
  for (let i = 0; i < skinWeights.length; i++)
    if (skinWeights[i] >= minWeight) start[skinJoints[i] + 1]++;
  for (let j = 0; j < jc; j++) start[j + 1] += start[j];
  const fill = start.slice(0, jc);
  const vertex = new Int32Array(start[jc]);
  const weight = new Float64Array(start[jc]);
  const slot = new Uint8Array(start[jc]);
  for (let i = 0; i < skinWeights.length; i++) {
    if (skinWeights[i] < minWeight) continue;
    const k = fill[skinJoints[i]]++;
    vertex[k] = i >> 2;
    weight[k] = skinWeights[i];
    slot[k] = i & 3;
  }
  return { start, vertex, weight, slot };
}

/**
 * Targets for joint j's fit: the vertex position minus the other influences' share, divided
 * by joint j's weight (or the raw position when `correct` is false, in the first pass).
 */
export function blendCorrectedTargets(
  inf: Influences,
  a: number,
  count: number,
  correct: boolean,
  v: Float32Array,
  rest: Float32Array,
  joints: Uint16Array,
  weights: Float32Array,
  skin: Float64Array,
  dst: Float64Array,
): void {
  for (let k = a; k < a + count; k++) {
    const i = inf.vertex[k];
    let x = v[3 * i], y = v[3 * i + 1], z = v[3 * i + 2]; // prettier-ignore
    if (correct) {
      const px = rest[3 * i], py = rest[3 * i + 1], pz = rest[3 * i + 2]; // prettier-ignore
      for (let s = 0; s < 4; s++) {
        const wk = weights[4 * i + s];
        if (s === inf.slot[k] || wk === 0) continue;
        const o = 16 * joints[4 * i + s];
        x -= wk * (skin[o] * px + skin[o + 4] * py + skin[o + 8] * pz + skin[o + 12]);
        y -= wk * (skin[o + 1] * px + skin[o + 5] * py + skin[o + 9] * pz + skin[o + 13]);
        z -= wk * (skin[o + 2] * px + skin[o + 6] * py + skin[o + 10] * pz + skin[o + 14]);
      }
      const wj = inf.weight[k];
      x /= wj;
      y /= wj;
      z /= wj;
    }
    dst[3 * k] = x;
    dst[3 * k + 1] = y;
    dst[3 * k + 2] = z;
  }
}
