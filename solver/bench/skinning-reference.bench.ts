// Benchmark reference: the same skinning done the straightforward way, with three.js
// SkinnedMesh.applyBoneTransform called per vertex (three 0.187.0). It recomputes bone × inverse
// bind per influence and goes through Vector/Matrix objects, which our kernel avoids.
import { Vector3 } from 'three';
import type { Character } from '../src/index.js';
import { timeIt } from './fixtures.js';
import { threeSkinnedMesh } from '../test/helpers/three-skinned-mesh.js';

/** Result of the reference run. */
export interface ReferenceResult {
  /** Vertex-frames per second. */
  rate: number;
  /** Largest distance (m) between the reference and `ours` over the frames run. */
  maxDifference: number;
}

/**
 * Skins `frames` frames of `c` with applyBoneTransform, posing joint j about z by `angle(f, j)`,
 * and compares with `ours` (frame-major positions from the typed-array kernel, same poses).
 */
export async function runThreeReference(
  c: Character,
  frames: number,
  angle: (f: number, j: number) => number,
  ours: Float32Array,
): Promise<ReferenceResult> {
  const { mesh, bones } = threeSkinnedMesh(c);
  const n = c.restPositions.length / 3;
  const out = new Float32Array(3 * n * frames);
  const v = new Vector3();
  const z = new Vector3(0, 0, 1);
  const skinFrames = (count: number) => {
    for (let f = 0; f < count; f++) {
      bones.forEach((b, j) => b.quaternion.setFromAxisAngle(z, angle(f, j)));
      mesh.updateMatrixWorld(true);
      for (let i = 0; i < n; i++) {
        mesh.applyBoneTransform(i, v.fromArray(c.restPositions, 3 * i));
        v.toArray(out, 3 * (n * f + i));
      }
    }
  };
  out.fill(0); // touch every page first, as for our kernel
  skinFrames(5); // warm-up, so the timing is of optimised code
  const ms = await timeIt(() => skinFrames(frames));
  let maxDifference = 0;
  for (let i = 0; i < out.length; i += 3) {
    const d = Math.hypot(out[i] - ours[i], out[i + 1] - ours[i + 1], out[i + 2] - ours[i + 2]);
    maxDifference = Math.max(maxDifference, d);
  }
  return { rate: (n * frames) / (ms / 1000), maxDifference };
}
