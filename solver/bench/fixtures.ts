// Invented benchmark data: a chain skeleton with random four-joint skins. Not a real asset.
import { mat4Compose, mat4Invert, mat4Multiply, type Character } from '../src/index.js';

/** Deterministic pseudo-random numbers (mulberry32). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A character with `vertices` vertices and a `joints`-long chain, every vertex on 4 joints. */
export function benchCharacter(vertices: number, joints: number): Character {
  const rand = rng(1);
  const parents = Int32Array.from({ length: joints }, (_, j) => j - 1);
  const restTranslations = new Float64Array(3 * joints);
  for (let j = 1; j < joints; j++) restTranslations[3 * j + 1] = 1.8 / joints;
  const restRotations = new Float64Array(4 * joints);
  for (let j = 0; j < joints; j++) restRotations[4 * j + 3] = 1;
  const restScales = new Float64Array(3 * joints).fill(1);
  const world = new Float64Array(16 * joints);
  const inverseBindMatrices = new Float64Array(16 * joints);
  for (let j = 0; j < joints; j++) {
    mat4Compose(world, 16 * j, restTranslations, 3 * j, restRotations, 4 * j, restScales, 3 * j);
    if (j > 0) mat4Multiply(world, 16 * j, world, 16 * (j - 1), world, 16 * j);
    mat4Invert(inverseBindMatrices, 16 * j, world, 16 * j);
  }
  const restPositions = new Float32Array(3 * vertices);
  const skinJoints = new Uint16Array(4 * vertices);
  const skinWeights = new Float32Array(4 * vertices);
  for (let i = 0; i < vertices; i++) {
    const y = rand() * 1.8;
    restPositions.set([rand() * 0.3 - 0.15, y, rand() * 0.3 - 0.15], 3 * i);
    const j0 = Math.min(joints - 4, Math.floor((y / 1.8) * joints));
    let sum = 0;
    for (let k = 0; k < 4; k++) {
      skinJoints[4 * i + k] = j0 + k;
      skinWeights[4 * i + k] = rand() + 0.01;
      sum += skinWeights[4 * i + k];
    }
    for (let k = 0; k < 4; k++) skinWeights[4 * i + k] /= sum;
  }
  const triangles = Uint32Array.from(
    { length: 3 * (vertices - 2) },
    (_, k) => Math.floor(k / 3) + (k % 3),
  );
  return {
    name: 'bench',
    restPositions,
    restNormals: new Float32Array(3 * vertices),
    triangles,
    skeleton: {
      names: Array.from({ length: joints }, (_, j) => `joint_${j}`),
      parents,
      restTranslations,
      restRotations,
      restScales,
      inverseBindMatrices,
      rootParentMatrix: Float64Array.from([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1]),
    },
    skinJoints,
    skinWeights,
    regions: null,
    warnings: [],
  };
}

/** Milliseconds taken by `fn`. */
export async function timeIt(fn: () => unknown): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}

/** A rate in millions with one decimal, e.g. "13.4 M". */
export function formatRate(perSecond: number): string {
  return `${(perSecond / 1e6).toFixed(1)} M`;
}
