// Basis transfer onto other meshes: identity for a shared topology, closest points through
// mapped joints otherwise, with amplitudes scaled by the size ratio.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { mapJoints, readCharacter, transferBasis, type Character } from '../../src/index.js';
import { knownProfile } from '../helpers/known-profile.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { fixture, scaledCharacter } from './fixtures.js';

const CHARACTERS = new URL('../../../assets-sample/files/characters/', import.meta.url);
const load = async (file: string) =>
  readCharacter(new Uint8Array(readFileSync(new URL(file, CHARACTERS))));

/** Share of a basis column's squared norm on the vertices with region label `label`. */
function regionShare(c: Character, basis: Float32Array, label: number): number {
  let inside = 0;
  let total = 0;
  for (let i = 0; i < basis.length / 3; i++) {
    const e = basis[3 * i] ** 2 + basis[3 * i + 1] ** 2 + basis[3 * i + 2] ** 2;
    total += e;
    if (c.regions!.labels[i] === label) inside += e;
  }
  return inside / total;
}

describe('basis transfer', () => {
  it('copies the basis for the same topology, scaled by the size ratio', () => {
    const { character, profile } = fixture();
    const map = mapJoints(character.skeleton.names, character.skeleton.names);
    const same = transferBasis(character, character, profile.basis, 2, map, 1);
    expect(same.method).toBe('identity');
    expect(Array.from(same.basis)).toEqual(Array.from(profile.basis));
    const big = transferBasis(character, scaledCharacter(character, 2), profile.basis, 2, map, 2);
    expect(Array.from(big.basis)).toEqual(Array.from(profile.basis, (v) => 2 * v));
  });

  it('carries a mode onto a differently meshed, larger body in the same place and direction', () => {
    const { character, profile } = fixture();
    const target = scaledCharacter(syntheticCharacter({ sides: 11, rings: 9 }), 1.5);
    const map = mapJoints(character.skeleton.names, target.skeleton.names);
    const out = transferBasis(character, target, profile.basis, 2, map, 1.5);
    expect(out.method).toBe('closest-point');
    const n = target.restPositions.length / 3;
    const chest = target.skeleton.names.indexOf('chest');
    // Column 0 is the chest mode along −Y with peak 1: on the target it peaks near 1.5 · 1.
    let peak = 0;
    let offChest = 0;
    for (let i = 0; i < n; i++) {
      const y = out.basis[3 * i + 1];
      peak = Math.min(peak, y);
      const dominant =
        target.skinWeights[4 * i] >= 0.5 ? target.skinJoints[4 * i] : target.skinJoints[4 * i + 1];
      if (
        dominant !== chest &&
        target.skeleton.parents[dominant] !== chest &&
        dominant !== target.skeleton.parents[chest]
      ) {
        offChest = Math.max(offChest, Math.hypot(out.basis[3 * i], y, out.basis[3 * i + 2]));
      }
    }
    expect(peak).toBeLessThan(-1.2);
    expect(peak).toBeGreaterThan(-1.6);
    expect(offChest).toBeLessThan(0.05);
  });

  it('lands the coach’s belly mode on the swimmer’s belly through a joint map', async () => {
    const coach = await load('coach-madge.glb');
    const swimmer = await load('swimmer-otto.glb');
    const profile = knownProfile(coach, 60, [
      {
        frequencyHz: 2.2,
        dampingRatio: 0.12,
        joint: 'Spine',
        region: 'belly',
        driver: 'Spine',
        gain: [0, -1, 0],
        direction: [0, 0, 1],
      },
    ]);
    const overrides = Object.fromEntries(
      [
        ['Hips', 'pelvis'], ['Spine', 'spine_01'], ['Spine1', 'spine_02'], ['Spine2', 'spine_03'], ['Neck', 'neck_01'],
        ['LeftShoulder', 'clavicle_l'], ['LeftArm', 'upperarm_l'], ['LeftForeArm', 'lowerarm_l'],
        ['RightShoulder', 'clavicle_r'], ['RightArm', 'upperarm_r'], ['RightForeArm', 'lowerarm_r'],
        ['LeftUpLeg', 'thigh_l'], ['LeftLeg', 'calf_l'], ['LeftToeBase', 'ball_l'],
        ['RightUpLeg', 'thigh_r'], ['RightLeg', 'calf_r'], ['RightToeBase', 'ball_r'],
      ], // prettier-ignore
    );
    const map = mapJoints(coach.skeleton.names, swimmer.skeleton.names, overrides);
    const out = transferBasis(coach, swimmer, profile.basis, 1, map, 1);
    // The stout coach's belly is a larger share of her body than the swimmer's belly region is of
    // his, so the mode covers his belly and spills onto the surrounding torso, never on limbs.
    const names = swimmer.regions!.names;
    expect(regionShare(swimmer, out.basis, names.indexOf('belly'))).toBeGreaterThan(0.5);
    for (const far of ['glutes', 'calf_l', 'calf_r', 'upper_arm_l', 'upper_arm_r', 'cheeks']) {
      expect(regionShare(swimmer, out.basis, names.indexOf(far))).toBeLessThan(0.001);
    }
    let covered = 0;
    let count = 0;
    for (let i = 0; i < out.basis.length / 3; i++) {
      if (swimmer.regions!.labels[i] !== names.indexOf('belly')) continue;
      covered += Math.hypot(out.basis[3 * i], out.basis[3 * i + 1], out.basis[3 * i + 2]);
      count++;
    }
    expect(covered / count).toBeGreaterThan(0.7);
    // Direction kept: the belly moves forward (+Z) on the swimmer too.
    let z = 0;
    let all = 0;
    for (let i = 0; i < out.basis.length / 3; i++) {
      z += out.basis[3 * i + 2];
      all += Math.hypot(out.basis[3 * i], out.basis[3 * i + 1], out.basis[3 * i + 2]);
    }
    expect(z / all).toBeGreaterThan(0.9);
  });

  it('throws PROFILE_MISMATCH when no joint of the target corresponds', () => {
    const { character, profile } = fixture();
    const other = syntheticCharacter({ sides: 5 });
    const renamed = {
      ...other,
      skeleton: { ...other.skeleton, names: other.skeleton.names.map((n) => `zz${n}x`) },
    };
    const map = mapJoints(character.skeleton.names, renamed.skeleton.names);
    expect(() => transferBasis(character, renamed, profile.basis, 2, map, 1)).toThrow(
      expect.objectContaining({ code: 'PROFILE_MISMATCH' }),
    );
  });
});
