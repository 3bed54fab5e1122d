// Posed take vertices: skinning, plus the pose correctives, plus gain × the dynamic offsets.
import { describe, expect, it } from 'vitest';
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  retarget,
  skinningMatrices,
  skinPositions,
  takeFramePositions,
  worldMatrices,
  type Character,
  type Clip,
} from '../../src/index.js';
import { knownProfile } from '../helpers/known-profile.js';
import { sampledClip } from '../helpers/known-clips.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { TWO_MODES } from './fixtures.js';

const character = syntheticCharacter();
const profile = knownProfile(character, 60, TWO_MODES, { correctiveJoint: 'spine' });
// The spine bends about X: a bend angle θ(t) and a root bounce.
const bend = (t: number) => 0.8 * Math.sin(2 * Math.PI * 0.7 * t) ** 2;
const clip = sampledClip(character, 30, 2, (t) => ({
  rootY: 0.05 * Math.sin(6 * t),
  rootX: 0,
  bend: bend(t),
}));

function skinned(c: Character, shot: Clip, f: number, rest: Float64Array): Float64Array {
  const pose = clipFramePose(
    shot,
    f,
    c.skeleton,
    matchClipJoints(shot, c.skeleton),
    createPose(c.skeleton.names.length),
  );
  const skin = new Float64Array(16 * c.skeleton.names.length);
  worldMatrices(c.skeleton, pose, skin);
  skinningMatrices(c.skeleton, skin, skin);
  return skinPositions(
    rest,
    c.skinJoints,
    c.skinWeights,
    skin,
    new Float64Array(rest.length),
  ) as Float64Array;
}

describe('take positions', () => {
  it('at gain 0 are skinning plus the pose correctives only', () => {
    const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain: 0 } });
    const f = 11; // near the largest bend
    // The known corrective moves spine vertices by −0.05·(R₁₁ − 1) along X, with R₁₁ = cos θ for
    // a rotation θ about X (entry (1,1) of the rotation matrix).
    const fpv = profile.correctives.featuresPerVertex;
    const rest = Float64Array.from(character.restPositions);
    const spine = character.skeleton.names.indexOf('spine');
    let moved = 0;
    for (let i = 0; i < rest.length / 3; i++) {
      for (let s = 0; s < 4; s++) {
        const c = profile.correctives.coefficients[i * 3 * fpv + s * 9 + 4];
        if (c === 0 || profile.correctives.featureJoints[4 * i + s] !== spine) continue;
        rest[3 * i] += c * (Math.cos(bend(f / 30)) - 1);
        moved++;
      }
    }
    expect(moved).toBeGreaterThan(0);
    const expected = skinned(character, shot, f, rest);
    const got = takeFramePositions(take, character, shot, f);
    got.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 5));
    const bare = skinned(character, shot, f, Float64Array.from(character.restPositions));
    expect(Math.max(...got.map((v, i) => Math.abs(v - bare[i])))).toBeGreaterThan(1e-3);
  });

  it('add gain × the dynamic offsets on top: gain 2 moves twice as far as gain 1', () => {
    const at = (gain: number) => {
      const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain } });
      return takeFramePositions(take, character, shot, 40);
    };
    const [g0, g1, g2] = [at(0), at(1), at(2)];
    let size = 0;
    g0.forEach((v, i) => {
      expect(g2[i] - v).toBeCloseTo(2 * (g1[i] - v), 5);
      size = Math.max(size, Math.abs(g1[i] - v));
    });
    expect(size).toBeGreaterThan(1e-3);
  });
});
