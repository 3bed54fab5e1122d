// Benchmark: forward kinematics + linear blend skinning and unposing of 10k vertices × 1000
// frames, and the same skinning through three.js applyBoneTransform for a speed-up ratio.
import {
  createPose,
  quatFromAxisAngle,
  restPose,
  skinPositions,
  skinningMatrices,
  unposeFrame,
  worldMatrices,
} from '../src/index.js';
import { benchCharacter, formatRate, timeIt } from './fixtures.js';
import { runThreeReference } from './skinning-reference.bench.js';

const JOINTS = 60;
/** Frames skinned by the three.js reference (it is much slower; the rate is per vertex-frame). */
const REFERENCE_FRAMES = 100;

/** Runs the skinning benchmark and prints figures. */
export async function runSkinningBench(): Promise<void> {
  const vertices = 10_000;
  const frames = 1_000;
  const c = benchCharacter(vertices, JOINTS);
  const s = c.skeleton;
  const pose = createPose(JOINTS);
  const skin = new Float64Array(16 * JOINTS);
  const out = new Float32Array(3 * vertices * frames);
  const residual = new Float32Array(3 * vertices);
  const angle = (f: number, j: number) => 0.01 * Math.sin(f * 0.1 + j);
  let fkMs = 0;
  const skinFrames = (count: number) => {
    for (let f = 0; f < count; f++) {
      const t0 = performance.now();
      restPose(s, pose);
      for (let j = 0; j < JOINTS; j++)
        quatFromAxisAngle(pose.rotations, 4 * j, 0, 0, 1, angle(f, j));
      worldMatrices(s, pose, skin);
      skinningMatrices(s, skin, skin);
      fkMs += performance.now() - t0;
      skinPositions(
        c.restPositions,
        c.skinJoints,
        c.skinWeights,
        skin,
        out.subarray(3 * vertices * f),
      );
    }
  };
  out.fill(0); // touch every page first, so the timing is not of page faults
  skinFrames(50); // warm-up, so the timing is of optimised code
  fkMs = 0;
  const skinMs = await timeIt(() => skinFrames(frames));
  const unposeMs = await timeIt(() => {
    for (let f = 0; f < frames; f++) {
      unposeFrame(
        c.restPositions,
        c.skinJoints,
        c.skinWeights,
        skin,
        out,
        3 * vertices * f,
        residual,
        0,
      );
    }
  });
  const rate = (ms: number) => (vertices * frames) / (ms / 1000);
  console.log(
    `skinning  LBS, ${vertices} vertices × ${frames} frames, ${JOINTS} joints, 4 influences: ` +
      `${skinMs.toFixed(0)} ms = ${formatRate(rate(skinMs))} vertex-frames/s (FK ${fkMs.toFixed(0)} ms of it)`,
  );
  console.log(
    `unposing  inverse LBS, same size: ${unposeMs.toFixed(0)} ms = ${formatRate(rate(unposeMs))} vertex-frames/s ` +
      `(${(unposeMs / skinMs).toFixed(2)}× the skinning time)`,
  );
  const ref = await runThreeReference(c, REFERENCE_FRAMES, angle, out);
  console.log(
    `reference three.js SkinnedMesh.applyBoneTransform per vertex, ${vertices} vertices × ${REFERENCE_FRAMES} frames: ` +
      `${formatRate(ref.rate)} vertex-frames/s (largest difference from ours: ${ref.maxDifference === 0 ? '0' : ref.maxDifference.toExponential(1)} m)`,
  );
  console.log(
    `ratio     typed-array kernel / three.js reference: ${(rate(skinMs) / ref.rate).toFixed(1)}× faster`,
  );
}
