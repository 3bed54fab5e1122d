// BVH import checked against three.js BVHLoader + AnimationMixer (three 0.187.0,
// examples/jsm/loaders/BVHLoader.js), a widely used reference reader of the format.
import { AnimationMixer, LoopOnce, Vector3, type Bone } from 'three';
import { BVHLoader } from 'three/examples/jsm/loaders/BVHLoader.js';
import { describe, expect, it } from 'vitest';
import { clipWorldMatrices, readBvh, readClip } from '../../src/index.js';
import { makeBvh } from '../helpers/bvh-text.js';

describe('readBvh', () => {
  it('gives the same joint world positions as three.js BVHLoader + AnimationMixer (≤ 1e-5 m)', () => {
    const frameTime = 1 / 30;
    const text = makeBvh(24, frameTime);
    const clip = readBvh(text);
    const { skeleton, clip: threeClip } = new BVHLoader().parse(text);
    const root = skeleton.bones[0];
    const mixer = new AnimationMixer(root);
    const action = mixer.clipAction(threeClip);
    action.setLoop(LoopOnce, 1);
    action.clampWhenFinished = true;
    action.play();
    const bones = new Map(
      skeleton.bones.filter((b: Bone) => b.name !== 'ENDSITE').map((b: Bone) => [b.name, b]),
    );
    expect([...bones.keys()].sort()).toEqual([...clip.jointNames].sort());
    const world = new Float64Array(16 * clip.jointNames.length);
    const v = new Vector3();
    let worst = 0;
    for (let f = 0; f < clip.frameCount; f++) {
      mixer.setTime(f * frameTime);
      root.updateMatrixWorld(true);
      clipWorldMatrices(clip, f, world);
      clip.jointNames.forEach((name, j) => {
        bones.get(name)!.getWorldPosition(v);
        worst = Math.max(
          worst,
          Math.hypot(world[16 * j + 12] - v.x, world[16 * j + 13] - v.y, world[16 * j + 14] - v.z),
        );
      });
    }
    expect(worst).toBeLessThan(1e-5);
  });

  it('reads the rate from Frame Time and the hierarchy from the nesting', async () => {
    const clip = await readClip(makeBvh(5, 0.0083333), 'bvh');
    expect(clip.fps).toBe(120);
    expect(clip.frameCount).toBe(5);
    expect(clip.jointNames).toEqual(['Hips', 'Spine', 'Head', 'LeftArm', 'LeftHand', 'RightLeg']);
    expect(Array.from(clip.parents)).toEqual([-1, 0, 1, 1, 3, 0]);
    expect(Array.from(clip.translationAnimated)).toEqual([1, 0, 0, 0, 1, 0]);
  });

  it('keeps quaternion signs continuous from frame to frame', () => {
    const clip = readBvh(makeBvh(60, 1 / 30, 4, 179));
    const jc = clip.jointNames.length;
    for (let f = 1; f < clip.frameCount; f++) {
      for (let j = 0; j < jc; j++) {
        let dot = 0;
        for (let c = 0; c < 4; c++)
          dot += clip.rotations[4 * (f * jc + j) + c] * clip.rotations[4 * ((f - 1) * jc + j) + c];
        expect(dot).toBeGreaterThanOrEqual(0);
      }
    }
  });

  it('scales lengths by unitScale and warns about centimetre-sized bones', () => {
    const text = makeBvh(2, 0.04).replace('OFFSET 0.5 0 0', 'OFFSET 50 0 0');
    const clip = readBvh(text);
    expect(clip.warnings.some((w) => w.includes('centimetres'))).toBe(true);
    const scaled = readBvh(text, { unitScale: 0.01 });
    expect(scaled.offsets[3 * 4]).toBeCloseTo(0.5, 12);
  });
});
