// Benchmark: forward kinematics + linear blend skinning and unposing of 10k vertices × 1000 frames.
import {
  createPose,
  quatFromAxisAngle,
  restPose,
  skinPositions,
  skinningMatrices,
  unposeFrame,
  worldMatrices,
} from '../src/index.js';
import { benchCharacter, timeIt } from './fixtures.js';

/** Runs the skinning benchmark and prints figures. */
export async function runSkinningBench(): Promise<void> {
  const vertices = 10_000;
  const frames = 1_000;
  const c = benchCharacter(vertices, 60);
  const s = c.skeleton;
  const pose = createPose(60);
  const skin = new Float64Array(16 * 60);
  const out = new Float32Array(3 * vertices * frames);
  const residual = new Float32Array(3 * vertices);
  let fkMs = 0;
  const skinMs = await timeIt(() => {
    for (let f = 0; f < frames; f++) {
      const t0 = performance.now();
      restPose(s, pose);
      for (let j = 0; j < 60; j++)
        quatFromAxisAngle(pose.rotations, 4 * j, 0, 0, 1, 0.01 * Math.sin(f * 0.1 + j));
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
  });
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
  const vps = (ms: number) => ((vertices * frames) / (ms / 1000) / 1e6).toFixed(1);
  console.log(
    `skinning  ${vertices} vertices × ${frames} frames, 60 joints: ${skinMs.toFixed(0)} ms (${vps(skinMs)} M vertex-frames/s; FK ${fkMs.toFixed(0)} ms)`,
  );
  console.log(
    `unposing  ${vertices} vertices × ${frames} frames: ${unposeMs.toFixed(0)} ms (${vps(unposeMs)} M vertex-frames/s; ${(unposeMs / skinMs).toFixed(2)}× skinning)`,
  );
}
