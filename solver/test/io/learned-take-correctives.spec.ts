// A take written from a profile learned on a real demo capture (the noisy "whistle and bounce"
// of the coach, default options) for a clip that goes beyond the capture's poses: the poolside
// drill turns the coach round and leans the spine further than the capture ever did. Its
// corrective morph targets must stay the size of what the capture showed, the weights bounded
// by the offsets they encode, and the reported error bound must hold (and be under a millimetre).
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import {
  applyCorrectives,
  FEATURES_PER_JOINT,
  learnProfile,
  poseFeatures,
  readCapture,
  readCharacter,
  readClip,
  readTakeGlb,
  retarget,
  writeTake,
  type Character,
  type Clip,
  type LearnResult,
  type Take,
  type TakeFile,
} from '../../src/index.js';

const FILES = new URL('../../../assets-sample/files/', import.meta.url);
const bytesOf = (path: string) => new Uint8Array(readFileSync(new URL(path, FILES)));

let character: Character;
let learned: LearnResult;
let take: Take;
let shot: Clip;
let file: TakeFile;
let writtenWarnings: string[];

beforeAll(async () => {
  character = await readCharacter(bytesOf('characters/coach-madge.glb'));
  const capture = await readCapture(bytesOf('captures/coach-whistle-and-bounce.glb'));
  learned = learnProfile(character, capture);
  const clip = await readClip(bytesOf('clips/coach-poolside-drill.glb'), 'gltf');
  ({ take, clip: shot } = retarget(learned.profile, character, clip));
  const written = await writeTake(take, character, shot);
  writtenWarnings = written.extras.warnings;
  file = await readTakeGlb(written.bytes);
}, 120_000);

/** Largest vertex offset (metres) of frame-major rest-space offsets (T × 3N). */
function largestOffset(offsets: ArrayLike<number>, frames: number, n3: number): number {
  let worst = 0;
  for (let t = 0; t < frames; t++) {
    for (let i = 0; i < n3; i += 3) {
      const o = t * n3 + i;
      worst = Math.max(worst, Math.hypot(offsets[o], offsets[o + 1], offsets[o + 2]));
    }
  }
  return worst;
}

/** The offsets the file's corrective targets and weights give, every shot frame (T × 3N). */
function fileOffsets(): Float64Array {
  const n3 = character.restPositions.length;
  const r = file.layout.corrective.count;
  const out = new Float64Array(take.frameCount * n3);
  for (let t = 0; t < take.frameCount; t++) {
    for (let c = 0; c < r; c++) {
      const w = file.correctiveWeights[t * r + c];
      for (let i = 0; i < n3; i++) out[t * n3 + i] += w * file.correctiveBasis[c * n3 + i];
    }
  }
  return out;
}

/** The correctives evaluated vertex by vertex on every shot frame (T × 3N). */
function exactOffsets(): Float64Array {
  const n3 = character.restPositions.length;
  const features = poseFeatures(character.skeleton, shot);
  const width = character.skeleton.names.length * FEATURES_PER_JOINT;
  const out = new Float64Array(take.frameCount * n3);
  for (let t = 0; t < take.frameCount; t++) applyCorrectives(take.correctives, features, t * width, out, t * n3); // prettier-ignore
  return out;
}

describe('corrective morph targets of a take from a learned demo profile', () => {
  it('keep the offsets of a shot beyond the capture within the size the capture showed', () => {
    const n3 = character.restPositions.length;
    // The learned pose-driven part is the correctives evaluated on the capture's own poses.
    const capture = largestOffset(learned.poseDisplacement, learned.poseDisplacement.length / n3, n3); // prettier-ignore
    expect(capture).toBeGreaterThan(0.005);
    // Features are clamped one by one, so a combination may exceed the capture's largest a little.
    expect(largestOffset(fileOffsets(), take.frameCount, n3)).toBeLessThan(1.5 * capture);
  });

  it('weigh each unit-norm target by at most the norm of the frame offsets it encodes', () => {
    const n3 = character.restPositions.length;
    const r = file.layout.corrective.count;
    expect(r).toBeGreaterThan(0);
    for (let c = 0; c < r; c++) {
      let s = 0;
      for (let i = 0; i < n3; i++) s += file.correctiveBasis[c * n3 + i] ** 2;
      expect(Math.sqrt(s)).toBeCloseTo(1, 4);
    }
    const exact = exactOffsets();
    for (let t = 0; t < take.frameCount; t++) {
      let x2 = 0;
      for (let i = 0; i < n3; i++) x2 += exact[t * n3 + i] ** 2;
      for (let c = 0; c < r; c++) {
        expect(Math.abs(file.correctiveWeights[t * r + c])).toBeLessThanOrEqual(1.0001 * Math.sqrt(x2) + 1e-7); // prettier-ignore
      }
    }
  });

  it('keeps every vertex within the reported error bound, under a millimetre, and warns above the tolerance', () => {
    const { errorBound, tolerance } = file.layout.corrective;
    expect(errorBound).toBeLessThan(1e-3);
    const got = fileOffsets();
    const want = exactOffsets();
    let error = 0;
    for (let o = 0; o < got.length; o += 3) {
      error = Math.max(error, Math.hypot(got[o] - want[o], got[o + 1] - want[o + 1], got[o + 2] - want[o + 2])); // prettier-ignore
    }
    // Float32 targets and weights add round-off beyond the float64 bound.
    expect(error).toBeLessThanOrEqual(errorBound + 1e-6);
    const warned = file.extras.warnings.some((w) => w.startsWith('pose correctives:'));
    expect(warned).toBe(errorBound > tolerance);
    // What the writer hands back (the job's metrics) says what the file says.
    expect(writtenWarnings).toEqual(file.extras.warnings);
  });
});
