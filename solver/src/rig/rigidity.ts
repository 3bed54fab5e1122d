// Vertex rigidity from how much a vertex's skinning residual varies over time.
import type { Capture, Character, Clip } from '../types.js';
import { skinPositions } from './linear-blend.js';
import { clipFramePose, createPose, skinningMatrices, worldMatrices } from './skeleton.js';

/** Rigidity per vertex: exp(−σ²/(2 s²)) of the temporal variance σ² of its skinning residual. */
export function residualRigidity(
  character: Character,
  capture: Capture,
  clip: Clip,
  scale: number,
  out: Float32Array,
): void {
  const { skeleton } = character;
  const n = capture.vertexCount;
  const jc = skeleton.names.length;
  const identityMap = Int32Array.from({ length: jc }, (_, j) => j);
  const pose = createPose(jc);
  const skin = new Float64Array(16 * jc);
  const skinned = new Float64Array(3 * n);
  const sum = new Float64Array(3 * n);
  const sumSq = new Float64Array(n);
  for (let f = 0; f < capture.frameCount; f++) {
    clipFramePose(clip, f, skeleton, identityMap, pose);
    worldMatrices(skeleton, pose, skin);
    skinningMatrices(skeleton, skin, skin);
    skinPositions(
      character.restPositions,
      character.skinJoints,
      character.skinWeights,
      skin,
      skinned,
    );
    const o = 3 * n * f;
    for (let i = 0; i < n; i++) {
      let ss = 0;
      for (let c = 0; c < 3; c++) {
        const e = capture.positions[o + 3 * i + c] - skinned[3 * i + c];
        sum[3 * i + c] += e;
        ss += e * e;
      }
      sumSq[i] += ss;
    }
  }
  const tInv = 1 / capture.frameCount;
  for (let i = 0; i < n; i++) {
    const mx = sum[3 * i] * tInv, my = sum[3 * i + 1] * tInv, mz = sum[3 * i + 2] * tInv; // prettier-ignore
    const variance = Math.max(0, sumSq[i] * tInv - (mx * mx + my * my + mz * mz));
    out[i] = Math.exp(-variance / (2 * scale * scale));
  }
}
