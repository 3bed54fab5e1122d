// Take .glb: valid for the Khronos validator, played by three.js (as the reference glTF
// implementation) with the same morph targets, weights and skinned vertices, and carrying what
// live tuning needs.
import { readFileSync } from 'node:fs';
import { SkinnedMesh } from 'three';
import { describe, expect, it } from 'vitest';
import {
  clipFramePose,
  createLiveTuner,
  createPose,
  liveTuneDataFromExtras,
  matchClipJoints,
  readCharacter,
  readClip,
  readTakeGlb,
  retarget,
  skinningMatrices,
  skinPositions,
  worldMatrices,
  writeTakeGlb,
  type Character,
  type Clip,
  type Take,
} from '../../src/index.js';
import { landingMotion, sampledClip } from '../helpers/known-clips.js';
import { knownProfile } from '../helpers/known-profile.js';
import { validatorErrors } from '../helpers/validator.js';
import { fixture } from '../retarget/fixtures.js';
import { maxDiff, parseGlb as parse, threeFrame } from './take-three.js';

const { character, profile } = fixture();
const clip = sampledClip(character, 30, 2, landingMotion(0.3));

/** Our skinned positions of frame f: LBS(rest + Σ_k w_k · basis_k). */
function ourFrame(take: Take, c: Character, shot: Clip, f: number): Float32Array {
  const k = take.live.k;
  const n3 = c.restPositions.length;
  const rest = Float32Array.from(c.restPositions);
  for (let m = 0; m < k; m++) {
    const w = take.weights[f * k + m];
    for (let i = 0; i < n3; i++) rest[i] += w * take.basis[m * n3 + i];
  }
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
    new Float32Array(n3),
  ) as Float32Array;
}

describe('take .glb', () => {
  it('passes the Khronos validator and three.js plays its morph targets and weights', async () => {
    const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain: 1.5 } });
    const bytes = await writeTakeGlb(take, character, shot);
    expect(await validatorErrors(bytes)).toEqual([]);
    const gltf = await parse(bytes);
    let mesh: SkinnedMesh | null = null;
    gltf.scene.traverse((o) => {
      if ((o as SkinnedMesh).isSkinnedMesh) mesh = o as SkinnedMesh;
    });
    expect((mesh as unknown as SkinnedMesh).morphTargetInfluences).toHaveLength(2);
    const track = gltf.animations[0].tracks.find((t) => t.name.endsWith('morphTargetInfluences'))!;
    expect(track.times).toHaveLength(take.frameCount);
    for (let i = 1; i < track.times.length; i++)
      expect(track.times[i]).toBeGreaterThan(track.times[i - 1]);
    expect(Array.from(track.values)).toEqual(Array.from(take.weights));
    expect(gltf.userData.overshoot).toMatchObject({
      kind: 'take',
      fps: 30,
      profile: { id: profile.id, name: profile.name },
      controls: { gain: 1.5 },
    });
  });

  it('poses the same vertices in three.js as in the solver, with and without gain', async () => {
    for (const gain of [0, 1]) {
      const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain } });
      const gltf = await parse(await writeTakeGlb(take, character, shot));
      const f = 17; // just after the landing
      const ours = ourFrame(take, character, shot, f);
      expect(maxDiff(threeFrame(gltf, f / 30), ours)).toBeLessThan(1e-5);
      if (gain === 0) {
        const rigid = ourFrame(
          { ...take, weights: new Float32Array(take.weights.length) },
          character,
          shot,
          f,
        );
        expect(maxDiff(ours, rigid)).toBe(0); // skinning only: no dynamic offsets at gain 0
      } else {
        expect(take.metrics.peakDisplacement).toBeGreaterThan(0.01);
      }
    }
  });

  it('reads back live-tuning data that re-simulates the same weights', async () => {
    const controls = { gain: 1, stiffness: 1.2, damping: 0.9 };
    const { take, clip: shot } = retarget(profile, character, clip, { controls });
    const file = await readTakeGlb(await writeTakeGlb(take, character, shot));
    expect(Array.from(file.weights)).toEqual(Array.from(take.weights));
    expect(Array.from(file.basis)).toEqual(Array.from(take.basis));
    const tuner = createLiveTuner(file.live, file.basis);
    expect(Array.from(tuner.tune({ ...take.controls }))).toEqual(Array.from(take.weights));
    expect(() => liveTuneDataFromExtras({ overshoot: { kind: 'capture' } })).toThrow(
      expect.objectContaining({ code: 'NOT_A_TAKE' }),
    );
  });

  it('is valid and plays in three.js for a coach profile on each sample character and clip', async () => {
    const files = new URL('../../../assets-sample/files/', import.meta.url);
    const load = async (name: string) =>
      readCharacter(new Uint8Array(readFileSync(new URL(`characters/${name}`, files))));
    const coach = await load('coach-madge.glb');
    const coachProfile = knownProfile(coach, 60, [
      {
        frequencyHz: 2.2,
        dampingRatio: 0.12,
        joint: 'Spine',
        region: 'belly',
        driver: 'Spine',
        gain: [0, -0.21, 0],
        direction: [0, 0, 1],
      },
      {
        frequencyHz: 4.2,
        dampingRatio: 0.2,
        joint: 'LeftArm',
        region: 'upper_arm_l',
        driver: 'LeftArm',
        gain: [0, -0.8, 0],
      },
    ]);
    const cases = [
      ['coach-madge.glb', 'coach-jump-and-land.bvh', null],
      [
        'swimmer-otto.glb',
        'swimmer-run.glb',
        {
          Hips: 'pelvis',
          Spine: 'spine_01',
          Spine1: 'spine_02',
          Spine2: 'spine_03',
          LeftArm: 'upperarm_l',
        },
      ],
      [
        'creature-grumbletusk.glb',
        'creature-waddle.bvh',
        {
          Hips: 'root',
          Spine: 'spine.001',
          Spine1: 'spine.002',
          Spine2: 'spine.003',
          LeftArm: 'flipper_upper.L',
        },
      ],
    ] as const;
    for (const [name, clipName, jointMap] of cases) {
      const target = await load(name);
      const bytes = readFileSync(new URL(`clips/${clipName}`, files));
      const shot = clipName.endsWith('.bvh')
        ? await readClip(bytes.toString('utf8'), 'bvh')
        : await readClip(new Uint8Array(bytes), 'gltf');
      const result = retarget(coachProfile, target, shot, { jointMap });
      expect(result.take.metrics.transfer).toBe(
        name === 'coach-madge.glb' ? 'identity' : 'closest-point',
      );
      const glb = await writeTakeGlb(result.take, target, result.clip);
      expect(await validatorErrors(glb)).toEqual([]);
      const gltf = await parse(glb);
      const track = gltf.animations[0].tracks.find((t) =>
        t.name.endsWith('morphTargetInfluences'),
      )!;
      expect(track.values.length).toBe(2 * result.take.frameCount);
      expect(Array.from(track.values)).toEqual(Array.from(result.take.weights));
    }
  });
});
