// glTF clip import (interpolation modes, frame rate) and clip export round trips.
import { Document, WebIO } from '@gltf-transform/core';
import { Quaternion } from 'three';
import { describe, expect, it } from 'vitest';
import {
  readBvh,
  readClip,
  readGltfClip,
  resampleClip,
  writeClipGlb,
  type Clip,
} from '../../src/index.js';
import { makeBvh } from '../helpers/bvh-text.js';
import { randomQuat, seededRandom } from '../helpers/random.js';
import { validatorErrors } from '../helpers/validator.js';

type Mode = 'LINEAR' | 'STEP' | 'CUBICSPLINE';

/** A two-joint document with one channel on the child joint. */
async function oneChannel(
  path: 'rotation' | 'translation',
  mode: Mode,
  times: number[],
  values: number[],
  extras: Record<string, unknown> = {},
): Promise<Uint8Array> {
  const doc = new Document();
  const buffer = doc.createBuffer();
  const child = doc.createNode('child').setTranslation([0, 1, 0]);
  const root = doc.createNode('root').addChild(child);
  doc.createScene().addChild(root);
  const acc = (type: 'SCALAR' | 'VEC3' | 'VEC4', a: number[]) =>
    doc.createAccessor().setType(type).setArray(new Float32Array(a)).setBuffer(buffer);
  const sampler = doc
    .createAnimationSampler()
    .setInput(acc('SCALAR', times))
    .setOutput(acc(path === 'rotation' ? 'VEC4' : 'VEC3', values))
    .setInterpolation(mode);
  doc
    .createAnimation('take')
    .setExtras(extras)
    .addSampler(sampler)
    .addChannel(
      doc.createAnimationChannel().setTargetNode(child).setTargetPath(path).setSampler(sampler),
    );
  return new WebIO().writeBinary(doc);
}

const childTranslation = (clip: Clip, f: number) =>
  Array.from(clip.translations.subarray(3 * (2 * f + 1), 3 * (2 * f + 1) + 3));
const childRotation = (clip: Clip, f: number) =>
  Array.from(clip.rotations.subarray(4 * (2 * f + 1), 4 * (2 * f + 1) + 4));

describe('glTF clip sampling', () => {
  it('evaluates CUBICSPLINE with the Hermite form of the glTF 2.0 specification (appendix C)', async () => {
    // Keys at 0 s and 2 s: v0 = 0, out-tangent b0 = 0.5; v1 = 1, in-tangent a1 = 0 (x only).
    const values = [0, 0, 0, 0, 0, 0, 0.5, 0, 0, /* key 1: */ 0, 0, 0, 1, 0, 0, 0, 0, 0];
    const clip = await readGltfClip(
      await oneChannel('translation', 'CUBICSPLINE', [0, 2], values, { fps: 4 }),
    );
    expect(clip.frameCount).toBe(9);
    for (let f = 0; f <= 8; f++) {
      const u = f / 8;
      const dt = 2;
      // p(u) = (2u³−3u²+1) v0 + (u³−2u²+u) dt b0 + (−2u³+3u²) v1 + (u³−u²) dt a1
      const expected = (u ** 3 - 2 * u ** 2 + u) * dt * 0.5 + (-2 * u ** 3 + 3 * u ** 2) * 1;
      expect(childTranslation(clip, f)[0]).toBeCloseTo(expected, 6);
    }
  });

  it('holds values with STEP and slerps rotations with LINEAR (as three.js Quaternion.slerp)', async () => {
    const a = randomQuat(seededRandom(2), 2);
    const b = randomQuat(seededRandom(3), 2);
    const step = await readGltfClip(
      await oneChannel('rotation', 'STEP', [0, 1], [...a, ...b], { fps: 4 }),
    );
    childRotation(step, 3).forEach((v, i) => expect(v).toBeCloseTo(a[i], 6));
    childRotation(step, 4).forEach((v, i) => expect(v).toBeCloseTo(b[i], 6));
    const linear = await readGltfClip(
      await oneChannel('rotation', 'LINEAR', [0, 1], [...a, ...b], { fps: 4 }),
    );
    const ref = new Quaternion(...(a as [number, number, number, number])).slerp(
      new Quaternion(...(b as [number, number, number, number])),
      0.25,
    );
    const got = childRotation(linear, 1);
    const dot = got[0] * ref.x + got[1] * ref.y + got[2] * ref.z + got[3] * ref.w;
    expect(Math.abs(dot)).toBeCloseTo(1, 6);
  });

  it('takes the rate from key spacing when extras.fps is absent', async () => {
    const times = Array.from({ length: 11 }, (_, k) => k / 25);
    const values = times.flatMap((t) => [t, 0, 0]);
    const clip = await readGltfClip(await oneChannel('translation', 'LINEAR', times, values));
    expect(clip.fps).toBe(25);
    expect(clip.frameCount).toBe(11);
    expect(childTranslation(clip, 10)[0]).toBeCloseTo(0.4, 6);
  });
});

describe('clip .glb export', () => {
  it('round-trips a BVH clip through .glb (rotations, translations, rate)', async () => {
    const clip = readBvh(makeBvh(30, 1 / 30));
    const bytes = await writeClipGlb(clip);
    const back = await readClip(bytes, 'gltf');
    expect(back.fps).toBe(30);
    expect(back.frameCount).toBe(30);
    expect(back.jointNames).toEqual(clip.jointNames);
    expect(Array.from(back.parents)).toEqual(Array.from(clip.parents));
    expect(Array.from(back.translationAnimated)).toEqual(Array.from(clip.translationAnimated));
    back.rotations.forEach((v, i) => expect(Math.abs(v - clip.rotations[i])).toBeLessThan(1e-6));
    back.translations.forEach((v, i) =>
      expect(Math.abs(v - clip.translations[i])).toBeLessThan(1e-6),
    );
  });

  it('writes files the Khronos glTF validator accepts with 0 errors', async () => {
    expect(await validatorErrors(await writeClipGlb(readBvh(makeBvh(12, 1 / 24))))).toEqual([]);
  });
});

describe('resampleClip', () => {
  it('resamples 30 → 24 fps with slerp equal to three.js Quaternion.slerp', () => {
    const clip = readBvh(makeBvh(31, 1 / 30, 9, 60));
    const out = resampleClip(clip, 24);
    expect(out.fps).toBe(24);
    expect(out.frameCount).toBe(25); // 1 s of motion
    const jc = clip.jointNames.length;
    for (let f = 0; f < out.frameCount; f++) {
      const src = (f / 24) * 30;
      const a = Math.floor(src);
      const b = Math.min(a + 1, clip.frameCount - 1);
      for (let j = 0; j < jc; j++) {
        const qa = new Quaternion().fromArray(clip.rotations, 4 * (a * jc + j));
        const qb = new Quaternion().fromArray(clip.rotations, 4 * (b * jc + j));
        const ref = qa.slerp(qb, src - a);
        const got = new Quaternion().fromArray(out.rotations, 4 * (f * jc + j));
        expect(Math.abs(got.dot(ref))).toBeGreaterThan(1 - 1e-6);
      }
      const ta = clip.translations[3 * a * jc + 1];
      const tb = clip.translations[3 * b * jc + 1];
      expect(out.translations[3 * f * jc + 1]).toBeCloseTo(ta + (tb - ta) * (src - a), 5);
    }
  });
});
