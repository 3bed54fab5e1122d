// Skinning checked against three.js SkinnedMesh.applyBoneTransform (three 0.187.0), a widely
// used reference implementation of linear blend skinning.
import { Vector3 } from 'three';
import { describe, expect, it } from 'vitest';
import {
  createPose,
  restPose,
  skinNormals,
  skinPositions,
  skinningMatrices,
  worldMatrices,
} from '../../src/index.js';
import { randomQuat, seededRandom } from '../helpers/random.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { threeSkinnedMesh } from '../helpers/three-skinned-mesh.js';

describe('skinPositions', () => {
  it('equals three.js applyBoneTransform on random poses (relative error ≤ 1e-5)', () => {
    const character = syntheticCharacter({ restAngle: 0.4, scaledJoint: true });
    const { mesh, bones } = threeSkinnedMesh(character);
    const s = character.skeleton;
    const rand = seededRandom(5);
    const n = character.restPositions.length / 3;
    const pose = createPose(s.names.length);
    const skin = new Float64Array(16 * s.names.length);
    const out = new Float32Array(3 * n);
    const v = new Vector3();
    for (let trial = 0; trial < 5; trial++) {
      restPose(s, pose);
      pose.translations[0] += rand() - 0.5; // root moves
      for (let j = 0; j < s.names.length; j++) {
        pose.rotations.set(randomQuat(rand, 1.2), 4 * j);
        bones[j].quaternion.fromArray(pose.rotations, 4 * j);
      }
      bones[0].position.fromArray(pose.translations, 0);
      mesh.updateMatrixWorld(true);
      worldMatrices(s, pose, skin);
      skinningMatrices(s, skin, skin);
      skinPositions(
        character.restPositions,
        character.skinJoints,
        character.skinWeights,
        skin,
        out,
      );
      let worst = 0;
      for (let i = 0; i < n; i++) {
        mesh.applyBoneTransform(i, v.fromArray(character.restPositions, 3 * i));
        const err = Math.hypot(out[3 * i] - v.x, out[3 * i + 1] - v.y, out[3 * i + 2] - v.z);
        worst = Math.max(worst, err / Math.max(v.length(), 1e-9));
      }
      expect(worst).toBeLessThan(1e-5);
    }
  });

  it('leaves the rest mesh unchanged in the rest pose', () => {
    const character = syntheticCharacter({ restAngle: 0.5 });
    const s = character.skeleton;
    const skin = new Float64Array(16 * s.names.length);
    worldMatrices(s, restPose(s), skin);
    skinningMatrices(s, skin, skin);
    const out = new Float32Array(character.restPositions.length);
    skinPositions(character.restPositions, character.skinJoints, character.skinWeights, skin, out);
    out.forEach((x, i) => expect(x).toBeCloseTo(character.restPositions[i], 5));
  });
});

describe('skinNormals', () => {
  it('rotates normals rigidly for a single-joint vertex and keeps them unit length', () => {
    const character = syntheticCharacter();
    const s = character.skeleton;
    const pose = restPose(s);
    pose.rotations.set([0, 0, Math.SQRT1_2, Math.SQRT1_2], 0); // hips turned 90° about z
    const skin = new Float64Array(16 * s.names.length);
    worldMatrices(s, pose, skin);
    skinningMatrices(s, skin, skin);
    const out = new Float32Array(character.restNormals.length);
    skinNormals(character.restNormals, character.skinJoints, character.skinWeights, skin, out);
    // Vertex bound only to the hips: its normal turns by the same 90° (x, y, z) → (−y, x, z).
    const i = Array.from({ length: out.length / 3 }, (_, k) => k).find(
      (k) => character.skinJoints[4 * k] === 0 && character.skinWeights[4 * k] === 1,
    )!;
    const r = character.restNormals;
    expect(out[3 * i]).toBeCloseTo(-r[3 * i + 1], 6);
    expect(out[3 * i + 1]).toBeCloseTo(r[3 * i], 6);
    expect(out[3 * i + 2]).toBeCloseTo(r[3 * i + 2], 6);
    for (let k = 0; k < out.length; k += 3)
      expect(Math.hypot(out[k], out[k + 1], out[k + 2])).toBeCloseTo(1, 5);
  });
});
