// Corrective morph targets: the take's pose correctives over a shot as a few targets and weights,
// checked against evaluating the correctives vertex by vertex.
import { describe, expect, it } from 'vitest';
import {
  applyCorrectives,
  FEATURES_PER_JOINT,
  poseFeatures,
  type Character,
  type Clip,
  type PoseCorrectives,
} from '../../src/index.js';
import { correctiveMorphs, type CorrectiveMorphs } from '../../src/retarget/corrective-morphs.js';
import { seededRandom } from '../helpers/random.js';
import { syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

const character = syntheticCharacter();
const jc = character.skeleton.names.length;
const clip = syntheticClip(character, 61, 30, 3, 0.6);

/** Invented correctives: random offsets for every feature of the skin joints (or only `joint`). */
function randomCorrectives(c: Character, joint: string | null = null): PoseCorrectives {
  const rand = seededRandom(7);
  const n = c.restPositions.length / 3;
  const fpv = 36;
  const only = joint === null ? -1 : c.skeleton.names.indexOf(joint);
  const coefficients = new Float32Array(n * 3 * fpv);
  for (let i = 0; i < n; i++) {
    for (let s = 0; s < 4; s++) {
      if (!(c.skinWeights[4 * i + s] > 0)) continue;
      if (only >= 0 && c.skinJoints[4 * i + s] !== only) continue;
      for (let a = 0; a < 3; a++) {
        for (let f = 0; f < 9; f++) coefficients[(i * 3 + a) * fpv + s * 9 + f] = 0.04 * (rand() - 0.5); // prettier-ignore
      }
    }
  }
  return { featuresPerVertex: fpv, featureJoints: c.skinJoints.slice(), coefficients, ridgeLambda: 0 }; // prettier-ignore
}

/** Largest vertex error (metres) over all frames of the targets against the correctives. */
function worstError(
  m: CorrectiveMorphs,
  corr: PoseCorrectives,
  shot: Clip,
): { error: number; peak: number } {
  // prettier-ignore
  const n3 = character.restPositions.length;
  const features = poseFeatures(character.skeleton, shot);
  const want = new Float64Array(n3);
  let error = 0;
  let peak = 0;
  for (let t = 0; t < shot.frameCount; t++) {
    applyCorrectives(corr, features, t * jc * FEATURES_PER_JOINT, want);
    for (let i = 0; i < n3 / 3; i++) {
      let e2 = 0;
      let w2 = 0;
      for (let a = 0; a < 3; a++) {
        let got = 0;
        for (let r = 0; r < m.count; r++) got += m.weights[t * m.count + r] * m.basis[r * n3 + 3 * i + a]; // prettier-ignore
        e2 += (got - want[3 * i + a]) ** 2;
        w2 += want[3 * i + a] ** 2;
      }
      error = Math.max(error, Math.sqrt(e2));
      peak = Math.max(peak, Math.sqrt(w2));
    }
  }
  return { error, peak };
}

describe('corrective morph targets', () => {
  it('reproduce the correctives of every frame when enough targets are allowed', () => {
    const corr = randomCorrectives(character);
    const m = correctiveMorphs(corr, character.skeleton, clip, { maxTargets: 200, tolerance: 0 });
    const { error, peak } = worstError(m, corr, clip);
    expect(peak).toBeGreaterThan(0.005);
    expect(m.count).toBeGreaterThan(4);
    // Float32 targets and weights: round-off only.
    expect(error).toBeLessThan(1e-6 * Math.max(1, m.count) * peak + 1e-7);
  });

  it('keep every vertex within the reported error bound when the target count is capped', () => {
    // Many active features: the randomized range finder.
    const many = randomCorrectives(character);
    const a = correctiveMorphs(many, character.skeleton, clip, { maxTargets: 3, tolerance: 0 });
    // Nine active features of one joint: the exact path.
    const one = randomCorrectives(character, 'spine');
    const b = correctiveMorphs(one, character.skeleton, clip, { maxTargets: 2, tolerance: 0 });
    for (const [m, corr] of [
      [a, many],
      [b, one],
    ] as const) {
      expect(m.count).toBe(m === a ? 3 : 2);
      expect(m.errorBound).toBeGreaterThan(0);
      const { error, peak } = worstError(m, corr, clip);
      expect(error).toBeGreaterThan(0);
      expect(error).toBeLessThanOrEqual(m.errorBound + 1e-6 * peak);
    }
  });

  it('stop adding targets once the error bound is under the tolerance', () => {
    const corr = randomCorrectives(character);
    const loose = correctiveMorphs(corr, character.skeleton, clip, { tolerance: 2e-3 });
    const tight = correctiveMorphs(corr, character.skeleton, clip, { tolerance: 1e-5 });
    expect(loose.errorBound).toBeLessThanOrEqual(2e-3);
    expect(tight.errorBound).toBeLessThanOrEqual(1e-5);
    expect(loose.count).toBeLessThan(tight.count);
    expect(worstError(loose, corr, clip).error).toBeLessThanOrEqual(2e-3);
  });

  it('are none when no corrective joint moves in the shot, or no corrective is set', () => {
    const still = syntheticClip(character, 20, 30, 3, 0);
    expect(correctiveMorphs(randomCorrectives(character), character.skeleton, still).count).toBe(0);
    const zero = { ...randomCorrectives(character), coefficients: new Float32Array(0) };
    expect(correctiveMorphs(zero, character.skeleton, clip).count).toBe(0);
  });

  it('give the same bytes on every run', () => {
    const corr = randomCorrectives(character);
    const a = correctiveMorphs(corr, character.skeleton, clip, { maxTargets: 6 });
    const b = correctiveMorphs(corr, character.skeleton, clip, { maxTargets: 6 });
    expect(Buffer.from(a.basis.buffer).equals(Buffer.from(b.basis.buffer))).toBe(true);
    expect(Buffer.from(a.weights.buffer).equals(Buffer.from(b.weights.buffer))).toBe(true);
  });
});
