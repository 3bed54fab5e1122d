// What keeps learned correctives from extrapolating: root joints and round-off features stay out
// of the fit, the training range of every feature goes into the profile (and with the joints onto
// another character), and evaluation clamps the features into it.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  applyCorrectives,
  FEATURES_PER_JOINT,
  influencingJoints,
  readCharacter,
  readClip,
  retarget,
  separatePoseDriven,
  type PoseCorrectives,
} from '../../src/index.js';
import { knownProfile } from '../helpers/known-profile.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

const character = syntheticCharacter();
const jc = character.skeleton.names.length;
const n = character.restPositions.length / 3;
const fw = jc * FEATURES_PER_JOINT;
const forearm = character.skeleton.names.indexOf('forearm_l');

const parents = Array.from(character.skeleton.parents);
const children = parents.map((_, j) => parents.flatMap((p, c) => (p === j ? [c] : [])));

/** Vertices whose influencing joints include `joint`. */
function verticesOf(joint: number): number[] {
  return Array.from({ length: n }, (_, i) => i).filter((i) =>
    influencingJoints(character, i, children).includes(joint),
  );
}

describe('corrective training range', () => {
  it('leaves root joints out: their rotation turns the whole character and deforms nothing', () => {
    const roots = parents.flatMap((p, j) => (p < 0 ? [j] : []));
    expect(roots.length).toBeGreaterThan(0);
    for (let i = 0; i < n; i++) {
      const joints = influencingJoints(character, i, children);
      expect(joints.some((j) => roots.includes(j))).toBe(false);
    }
  });

  it('gives no coefficient to a feature that varies by round-off only, and records each feature range', () => {
    // The forearm bends (entry 4 of R − I swings) while entry 5 carries only 1e-12 of noise that
    // happens to follow the residual exactly: scaled to unit RMS it would take a 1e9 coefficient.
    const frames = 240;
    const features = new Float64Array(frames * fw);
    const residuals = new Float32Array(frames * 3 * n);
    const moved = verticesOf(forearm);
    for (let t = 0; t < frames; t++) {
      const o = t * fw + forearm * FEATURES_PER_JOINT;
      features[o + 4] = 0.3 * Math.cos(0.05 * t) - 0.3;
      features[o + 5] = 1e-12 * Math.sin(0.7 * t);
      for (const i of moved) residuals[t * 3 * n + 3 * i] = 0.01 * Math.sin(0.7 * t);
    }
    const { correctives } = separatePoseDriven(residuals, frames, character, features, 60, {
      cutoffHz: Infinity,
    });
    const fpv = correctives.featuresPerVertex;
    let slots = 0;
    for (const i of moved) {
      for (let s = 0; s < 4; s++) {
        if (correctives.featureJoints[4 * i + s] !== forearm) continue;
        slots++;
        for (let ax = 0; ax < 3; ax++)
          expect(correctives.coefficients[(3 * i + ax) * fpv + 9 * s + 5]).toBe(0);
      }
    }
    expect(slots).toBeGreaterThan(0);
    for (const c of correctives.coefficients) expect(Math.abs(c)).toBeLessThan(1);
    const o = forearm * FEATURES_PER_JOINT;
    expect(correctives.featureMin![o + 4]).toBeCloseTo(-0.6, 3);
    expect(correctives.featureMax![o + 4]).toBe(0);
    expect(correctives.featureMax![o + 5]).toBeGreaterThan(0);
    expect(correctives.featureMax![o + 5]).toBeLessThan(1e-11);
  });

  it('evaluates a pose beyond the range as the pose at its edge', () => {
    const fpv = 36;
    const featureJoints = new Uint16Array(4).fill(forearm);
    const coefficients = new Float32Array(3 * fpv);
    coefficients[4] = 0.05; // x offset per unit of entry 4
    coefficients[fpv + 1] = -0.02; // y offset per unit of entry 1
    const featureMin = new Float64Array(fw);
    const featureMax = new Float64Array(fw);
    featureMin[forearm * 9 + 4] = -0.4;
    featureMin[forearm * 9 + 1] = -0.1;
    featureMax[forearm * 9 + 1] = 0.2;
    const clamped: PoseCorrectives = { featuresPerVertex: fpv, featureJoints, coefficients, ridgeLambda: 0, featureMin, featureMax }; // prettier-ignore
    const free: PoseCorrectives = { featuresPerVertex: fpv, featureJoints, coefficients, ridgeLambda: 0 }; // prettier-ignore
    const pose = new Float64Array(fw);
    pose[forearm * 9 + 4] = -2; // beyond −0.4
    pose[forearm * 9 + 1] = 0.1; // inside
    const out = new Float64Array(3);
    applyCorrectives(clamped, pose, 0, out);
    expect(out[0]).toBeCloseTo(0.05 * -0.4, 7);
    expect(out[1]).toBeCloseTo(-0.02 * 0.1, 7);
    applyCorrectives(free, pose, 0, out);
    expect(out[0]).toBeCloseTo(0.05 * -2, 7);
  });

  it('carries each joint range onto the mapped joint of another character', async () => {
    const files = new URL('../../../assets-sample/files/', import.meta.url);
    const load = async (name: string) =>
      readCharacter(new Uint8Array(readFileSync(new URL(`characters/${name}`, files))));
    const coach = await load('coach-madge.glb');
    const swimmer = await load('swimmer-otto.glb');
    const mode = { frequencyHz: 2.2, dampingRatio: 0.12, joint: 'Spine', driver: 'Spine', gain: [0, -0.21, 0] as [number, number, number] }; // prettier-ignore
    const profile = knownProfile(coach, 60, [mode], { correctiveJoint: 'Spine' });
    const width = coach.skeleton.names.length * 9;
    // Joint j's range is ±(j + 1): each target joint shows which source joint it came from.
    const featureMin = Float64Array.from({ length: width }, (_, k) => -(Math.floor(k / 9) + 1));
    const featureMax = featureMin.map((v) => -v);
    profile.correctives = { ...profile.correctives, featureMin, featureMax };
    const shot = await readClip(new Uint8Array(readFileSync(new URL('clips/swimmer-run.glb', files))), 'gltf'); // prettier-ignore
    const jointMap = { Hips: 'pelvis', Spine: 'spine_01', Spine1: 'spine_02', Spine2: 'spine_03' };
    const { take, joints } = retarget(profile, swimmer, shot, { jointMap });
    const got = take.correctives;
    expect(got.featureMax).toHaveLength(swimmer.skeleton.names.length * 9);
    let mapped = 0;
    joints.targetOf.forEach((t, j) => {
      if (t < 0) return;
      mapped++;
      for (let f = 0; f < 9; f++) {
        expect(got.featureMin![9 * t + f]).toBe(-(j + 1));
        expect(got.featureMax![9 * t + f]).toBe(j + 1);
      }
    });
    expect(mapped).toBeGreaterThanOrEqual(4);
    const targets = new Set(Array.from(joints.targetOf));
    swimmer.skeleton.names.forEach((_, t) => {
      if (!targets.has(t)) expect(got.featureMax![9 * t]).toBe(0);
    });
  });
});
