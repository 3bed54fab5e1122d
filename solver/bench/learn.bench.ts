// Benchmark: learning a profile for a character of about 7,500 vertices (the invented swimmer of
// assets-sample) from a 600-frame, 60 fps capture made here (skinning of a smooth clip plus one
// damped jiggle on the belly). Prints wall time per stage and, on the same data, the big
// products against straightforward references.
import { readFile } from 'node:fs/promises';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import {
  clipFramePose,
  createPose,
  driverInputs,
  learnProfile,
  modalToPole,
  readCharacter,
  skinPositions,
  skinningMatrices,
  snapshotGram,
  topEigen,
  worldMatrices,
  type Capture,
  type Character,
} from '../src/index.js';
import { syntheticClip } from '../test/helpers/synthetic-capture.js';
import { timeIt } from './fixtures.js';

const SWIMMER = new URL('../../assets-sample/files/characters/swimmer-otto.glb', import.meta.url);

/** Invented capture: the clip's skinning plus a 3 Hz belly jiggle driven by the pelvis. */
function benchCapture(character: Character, frames: number, fps: number): Capture {
  const clip = syntheticClip(character, frames, fps, 5, 0.4);
  const s = character.skeleton;
  const n = character.restPositions.length / 3;
  const belly = character.regions?.names.indexOf('belly') ?? -1;
  const u = driverInputs(s, clip, [{ joint: s.names[0], signals: ['specificForce'] }]);
  const z = modalToPole(3, 0.12, fps);
  const q = new Float64Array(frames);
  for (let t = 0; t < frames; t++) {
    const drive = 0.002 * (u.values[3 * t + 1] - u.rest[1]);
    q[t] =
      (t > 0 ? 2 * z.re * q[t - 1] : 0) - (t > 1 ? (z.re ** 2 + z.im ** 2) * q[t - 2] : 0) + drive;
  }
  const map = Int32Array.from(s.names, (_, j) => j);
  const pose = createPose(s.names.length);
  const skin = new Float64Array(16 * s.names.length);
  const positions = new Float32Array(3 * n * frames);
  const frame = new Float32Array(3 * n);
  for (let t = 0; t < frames; t++) {
    clipFramePose(clip, t, s, map, pose);
    worldMatrices(s, pose, skin);
    skinningMatrices(s, skin, skin);
    const rest = character.restPositions.slice();
    for (let i = 0; i < n; i++) {
      if (character.regions?.labels[i] === belly) rest[3 * i + 2] += q[t];
    }
    skinPositions(rest, character.skinJoints, character.skinWeights, skin, frame);
    positions.set(frame, 3 * n * t);
  }
  return {
    name: 'bench-capture',
    fps,
    frameCount: frames,
    vertexCount: n,
    positions,
    basePositions: character.restPositions.slice(),
    triangles: character.triangles.slice(),
    clip,
    warnings: [],
  };
}

/** The plain reference: one dot product per pair, no blocking or unrolling. */
function naiveGram(x: Float32Array, t: number, d: number): Float64Array {
  const out = new Float64Array(t * t);
  for (let i = 0; i < t; i++) {
    for (let j = 0; j <= i; j++) {
      let s = 0;
      for (let c = 0; c < d; c++) s += x[i * d + c] * x[j * d + c];
      out[i * t + j] = s;
      out[j * t + i] = s;
    }
  }
  return out;
}

/** Runs the learn benchmark and prints figures. */
export async function runLearnBench(): Promise<void> {
  const character = await readCharacter(new Uint8Array(await readFile(SWIMMER)));
  const n = character.restPositions.length / 3;
  const frames = 600;
  const capture = benchCapture(character, frames, 60);
  console.log(
    `\nlearn: ${n} vertices, ${character.triangles.length / 3} triangles, ${frames} frames at 60 fps`,
  );
  let result: ReturnType<typeof learnProfile> | null = null;
  const ms = await timeIt(() => (result = learnProfile(character, capture)));
  const r = result as unknown as ReturnType<typeof learnProfile>;
  console.log(
    `  learn wall time ${(ms / 1000).toFixed(2)} s (target ≤ 10 s), K = ${r.profile.dynamics.k}`,
  );
  for (const [stage, t] of Object.entries(r.timings)) {
    console.log(
      `    ${stage.padEnd(9)} ${(t / 1000).toFixed(2).padStart(6)} s  ${((100 * t) / ms).toFixed(1).padStart(5)} %`,
    );
  }
  // The Gram product of the residual-sized matrix, three ways.
  const d = 3 * n;
  const x = capture.positions.slice(0, frames * d);
  const kernelMs = await timeIt(() => snapshotGram(x, frames, d));
  const naiveMs = await timeIt(() => naiveGram(x, frames, d));
  // ml-matrix on a 2,000-column slice (the full product takes tens of seconds), scaled by width.
  const cols = 2000;
  const slice = new Matrix(frames, cols);
  for (let i = 0; i < frames; i++) for (let c = 0; c < cols; c++) slice.set(i, c, x[i * d + c]);
  const mlSliceMs = await timeIt(() => slice.mmul(slice.transpose()));
  const mlMs = (mlSliceMs * d) / cols;
  console.log(
    `  Gram ${frames}×${frames} of ${frames}×${d}: kernel ${(kernelMs / 1000).toFixed(2)} s, plain loop ${(naiveMs / 1000).toFixed(2)} s (×${(naiveMs / kernelMs).toFixed(1)}), ml-matrix ≈ ${(mlMs / 1000).toFixed(1)} s (×${(mlMs / kernelMs).toFixed(1)}, from ${cols} columns)`,
  );
  const gram = snapshotGram(x, frames, d);
  const topMs = await timeIt(() => topEigen(gram, frames, 32));
  const rows = Array.from({ length: frames }, (_, i) =>
    Array.from(gram.subarray(i * frames, (i + 1) * frames)),
  );
  const evdMs = await timeIt(
    () => new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true }),
  );
  console.log(
    `  leading 42 eigenpairs of the Gram: subspace iteration ${(topMs / 1000).toFixed(2)} s, ml-matrix full EVD ${(evdMs / 1000).toFixed(2)} s (×${(evdMs / topMs).toFixed(1)})`,
  );
}
