// The take .glb carries the pose correctives as morph targets after the K dynamic ones, so any
// glTF viewer plays skinning + correctives + gain × dynamics, and live tuning rescales only the
// dynamic part. three.js is the reference glTF implementation; the Khronos validator checks the file.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  clipFramePose,
  createLiveTuner,
  createPose,
  matchClipJoints,
  readCharacter,
  readClip,
  readTakeGlb,
  retarget,
  skinningMatrices,
  skinPositions,
  takeFramePositions,
  worldMatrices,
  writeTakeGlb,
  type TakeExtras,
} from '../../src/index.js';
import { setDynamicMorphWeights, takeMorphLayout } from '../../src/io/take-extras.js';
import { sampledClip } from '../helpers/known-clips.js';
import { knownProfile } from '../helpers/known-profile.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { validatorErrors } from '../helpers/validator.js';
import { TWO_MODES } from '../retarget/fixtures.js';
import { maxDiff, parseGlb, skinnedMeshOf, threeFrame } from './take-three.js';

const character = syntheticCharacter();
const profile = knownProfile(character, 60, TWO_MODES, { correctiveJoint: 'spine' });
const bend = (t: number) => 0.8 * Math.sin(2 * Math.PI * 0.7 * t) ** 2;
const clip = sampledClip(character, 30, 2, (t) => ({
  rootY: 0.05 * Math.sin(6 * t),
  rootX: 0,
  bend: bend(t),
}));
const K = TWO_MODES.length;

/** Skinning of rest + the known corrective at frame f: spine vertices move −0.05·(cos θ − 1) along X. */
function skinningPlusKnownCorrective(f: number): Float64Array {
  // The known profile's corrective is on entry (1,1) of R − I, which is cos θ − 1 for a bend θ
  // about X (the rotation matrix about X).
  const fpv = profile.correctives.featuresPerVertex;
  const spine = character.skeleton.names.indexOf('spine');
  const rest = Float64Array.from(character.restPositions);
  for (let i = 0; i < rest.length / 3; i++) {
    for (let s = 0; s < 4; s++) {
      const c = profile.correctives.coefficients[i * 3 * fpv + s * 9 + 4];
      if (c !== 0 && profile.correctives.featureJoints[4 * i + s] === spine)
        rest[3 * i] += c * (Math.cos(bend(f / 30)) - 1);
    }
  }
  const s = character.skeleton;
  const pose = clipFramePose(clip, f, s, matchClipJoints(clip, s), createPose(s.names.length));
  const skin = new Float64Array(16 * s.names.length);
  worldMatrices(s, pose, skin);
  skinningMatrices(s, skin, skin);
  const out = new Float64Array(rest.length);
  skinPositions(rest, character.skinJoints, character.skinWeights, skin, out);
  return out;
}

describe('take .glb with pose correctives', () => {
  it('adds corrective morph targets after the dynamic ones, names them and passes the validator', async () => {
    const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain: 1 } });
    const bytes = await writeTakeGlb(take, character, shot);
    expect(await validatorErrors(bytes)).toEqual([]);
    const gltf = await parseGlb(bytes);
    const layout = (gltf.userData.overshoot as TakeExtras).morphTargets!;
    const r = layout.corrective.count;
    expect(r).toBeGreaterThanOrEqual(1);
    expect(layout).toMatchObject({ count: K + r, dynamic: { first: 0, count: K }, corrective: { first: K } }); // prettier-ignore
    const mesh = skinnedMeshOf(gltf);
    expect(mesh.morphTargetInfluences).toHaveLength(K + r);
    expect(Object.keys(mesh.morphTargetDictionary!)).toEqual([
      ...Array.from({ length: K }, (_, c) => `dynamic_${c}`),
      ...Array.from({ length: r }, (_, c) => `corrective_${c}`),
    ]);
    const track = gltf.animations[0].tracks.find((t) => t.name.endsWith('morphTargetInfluences'))!;
    expect(track.values).toHaveLength(take.frameCount * (K + r));
    const dynamic = Array.from({ length: take.frameCount * K }, (_, i) => track.values[Math.floor(i / K) * (K + r) + (i % K)]); // prettier-ignore
    expect(dynamic).toEqual(Array.from(take.weights));
  });

  it('plays skinning plus correctives in three.js at gain 0', async () => {
    const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain: 0 } });
    const gltf = await parseGlb(await writeTakeGlb(take, character, shot));
    let moved = 0;
    // (The last frame is left out: a looping three.js action at t = duration shows frame 0.)
    for (const f of [0, 11, 17, 40, 59]) {
      const got = threeFrame(gltf, f / 30);
      const want = skinningPlusKnownCorrective(f);
      expect(maxDiff(got, want)).toBeLessThan(1e-5);
      expect(maxDiff(got, takeFramePositions(take, character, shot, f))).toBeLessThan(1e-5);
      moved = Math.max(moved, maxDiff(want, skinningWithoutCorrectives(f)));
    }
    expect(moved).toBeGreaterThan(1e-3); // the correctives do move vertices
  });

  it('plays skinning + correctives + gain × dynamics at gain 2', async () => {
    const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain: 2 } });
    const gltf = await parseGlb(await writeTakeGlb(take, character, shot));
    for (const f of [17, 40]) {
      expect(maxDiff(threeFrame(gltf, f / 30), takeFramePositions(take, character, shot, f))).toBeLessThan(1e-5); // prettier-ignore
    }
    expect(take.metrics.peakDisplacement).toBeGreaterThan(0.01);
  });

  it('lets live tuning rescale the dynamic weights only', async () => {
    const read = async (gain: number) => {
      const { take, clip: shot } = retarget(profile, character, clip, { controls: { gain } });
      return { take, file: await readTakeGlb(await writeTakeGlb(take, character, shot)) };
    };
    const [g0, g2] = [await read(0), await read(2)];
    expect(g2.file.weights).toEqual(g2.take.weights);
    expect(g2.file.basis).toEqual(g2.take.basis);
    expect(g2.file.correctiveWeights.length).toBeGreaterThan(0);
    expect(g2.file.correctiveWeights).toEqual(g0.file.correctiveWeights);
    expect(g2.file.correctiveBasis).toEqual(g0.file.correctiveBasis);
    // Re-tune the gain-0 file to gain 2 and write the result into its interleaved weights.
    const tuned = createLiveTuner(g0.file.live, g0.file.basis).tune({ ...g0.take.controls, gain: 2 }); // prettier-ignore
    expect(Array.from(tuned)).toEqual(Array.from(g2.take.weights));
    const layout = g0.file.layout;
    const all = new Float32Array(g0.take.frameCount * layout.count).fill(-9);
    setDynamicMorphWeights(all, layout, tuned);
    for (let f = 0; f < g0.take.frameCount; f++) {
      for (let c = 0; c < layout.count; c++) {
        const v = all[f * layout.count + c];
        if (c < K) expect(v).toBe(Math.fround(tuned[f * K + c]));
        else expect(v).toBe(-9);
      }
    }
  });

  it('is valid with corrective targets carried onto another topology (closest-point transfer)', async () => {
    const files = new URL('../../../assets-sample/files/', import.meta.url);
    const load = async (name: string) =>
      readCharacter(new Uint8Array(readFileSync(new URL(`characters/${name}`, files))));
    const coach = await load('coach-madge.glb');
    const swimmer = await load('swimmer-otto.glb');
    const mode = { frequencyHz: 2.2, dampingRatio: 0.12, joint: 'Spine', driver: 'Spine', gain: [0, -0.21, 0] as [number, number, number] }; // prettier-ignore
    const coachProfile = knownProfile(coach, 60, [mode], { correctiveJoint: 'Spine' });
    const shot = await readClip(new Uint8Array(readFileSync(new URL('clips/swimmer-run.glb', files))), 'gltf'); // prettier-ignore
    const jointMap = { Hips: 'pelvis', Spine: 'spine_01', Spine1: 'spine_02', Spine2: 'spine_03' };
    const result = retarget(coachProfile, swimmer, shot, { jointMap });
    expect(result.take.metrics.transfer).toBe('closest-point');
    const glb = await writeTakeGlb(result.take, swimmer, result.clip);
    expect(await validatorErrors(glb)).toEqual([]);
    const file = await readTakeGlb(glb);
    expect(file.layout.corrective.count).toBeGreaterThanOrEqual(1);
    const gltf = await parseGlb(glb);
    expect(skinnedMeshOf(gltf).morphTargetInfluences).toHaveLength(file.layout.count);
  });

  it('reads version 1 takes as dynamic targets only and rejects a layout that does not add up', async () => {
    const { take, clip: shot } = retarget(profile, character, clip);
    const file = await readTakeGlb(await writeTakeGlb(take, character, shot));
    const v1 = { ...file.extras, formatVersion: 1, morphTargets: undefined };
    expect(takeMorphLayout(v1)).toMatchObject({ count: K, corrective: { count: 0 } });
    const broken = { ...file.extras, morphTargets: { ...file.layout, dynamic: { first: 1, count: K } } }; // prettier-ignore
    expect(() => takeMorphLayout(broken)).toThrow(expect.objectContaining({ code: 'NOT_A_TAKE' }));
  });
});

/** Skinning of the rest mesh alone at frame f. */
function skinningWithoutCorrectives(f: number): Float64Array {
  const s = character.skeleton;
  const pose = clipFramePose(clip, f, s, matchClipJoints(clip, s), createPose(s.names.length));
  const skin = new Float64Array(16 * s.names.length);
  worldMatrices(s, pose, skin);
  skinningMatrices(s, skin, skin);
  const out = new Float64Array(character.restPositions.length);
  skinPositions(Float64Array.from(character.restPositions), character.skinJoints, character.skinWeights, skin, out); // prettier-ignore
  return out;
}
