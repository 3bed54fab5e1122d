// Benchmark: pose estimation from a skinned sequence (10k vertices, 60 joints, 300 frames).
import {
  createPose,
  estimatePoses,
  quatFromAxisAngle,
  restPose,
  skinPositions,
  skinningMatrices,
  worldMatrices,
  type Capture,
} from '../src/index.js';
import { benchCharacter, timeIt } from './fixtures.js';

/** Runs the pose estimation benchmark and prints figures. */
export async function runPoseEstimateBench(): Promise<void> {
  const n = 10_000;
  const t = 300;
  const c = benchCharacter(n, 60);
  const pose = createPose(60);
  const skin = new Float64Array(16 * 60);
  const positions = new Float32Array(3 * n * t);
  for (let f = 0; f < t; f++) {
    restPose(c.skeleton, pose);
    for (let j = 0; j < 60; j++)
      quatFromAxisAngle(pose.rotations, 4 * j, 1, 0, 0, 0.05 * Math.sin(f * 0.05 + j));
    worldMatrices(c.skeleton, pose, skin);
    skinningMatrices(c.skeleton, skin, skin);
    skinPositions(
      c.restPositions,
      c.skinJoints,
      c.skinWeights,
      skin,
      positions.subarray(3 * n * f),
    );
  }
  const capture: Capture = {
    name: 'bench',
    fps: 60,
    frameCount: t,
    vertexCount: n,
    positions,
    basePositions: c.restPositions,
    triangles: c.triangles,
    clip: null,
    warnings: [],
  };
  for (const iterations of [1, 6]) {
    const ms = await timeIt(() => estimatePoses(c, capture, { iterations }));
    const passes = iterations === 1 ? '1 pass' : `${iterations} passes (the default)`;
    console.log(
      `poses     estimation, ${n} vertices × ${t} frames, 60 joints, ${passes}: ` +
        `${ms.toFixed(0)} ms = ${(t / (ms / 1000)).toFixed(0)} frames/s`,
    );
  }
}
