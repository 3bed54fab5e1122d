// BVH export: written text reads back through the solver's BVH reader as the same motion, and
// each generated .bvh holds the same motion as its glTF twin.
import { readBvh, readClip, type Clip } from '@overshoot/solver';
import { describe, expect, it } from 'vitest';
import { writeBvh } from '../generate/io/bvh-writer.js';
import { fileBytes, manifest } from './helpers/sample-files.js';

/** Largest difference of rotations (quaternion components, sign-aligned) and translations. */
function compare(a: Clip, b: Clip): { rotation: number; translation: number } {
  const ja = a.jointNames.length;
  const jb = b.jointNames.length;
  let rotation = 0;
  let translation = 0;
  for (let f = 0; f < a.frameCount; f++) {
    a.jointNames.forEach((name, j) => {
      const k = b.jointNames.indexOf(name);
      expect(k, name).toBeGreaterThanOrEqual(0);
      const ra = a.rotations.subarray(4 * (f * ja + j), 4 * (f * ja + j) + 4);
      const rb = b.rotations.subarray(4 * (f * jb + k), 4 * (f * jb + k) + 4);
      const sign = ra[0] * rb[0] + ra[1] * rb[1] + ra[2] * rb[2] + ra[3] * rb[3] < 0 ? -1 : 1;
      for (let c = 0; c < 4; c++) rotation = Math.max(rotation, Math.abs(ra[c] - sign * rb[c]));
      for (let c = 0; c < 3; c++) {
        const d = a.translations[3 * (f * ja + j) + c] - b.translations[3 * (f * jb + k) + c];
        translation = Math.max(translation, Math.abs(d));
      }
    });
  }
  return { rotation, translation };
}

function quat(axis: [number, number, number], angle: number): number[] {
  const s = Math.sin(angle / 2) / Math.hypot(...axis);
  return [axis[0] * s, axis[1] * s, axis[2] * s, Math.cos(angle / 2)];
}

describe('BVH writer', () => {
  it('round-trips rotations, including near gimbal lock, and root motion', () => {
    const rotations = [
      quat([1, 0, 0], Math.PI / 2),
      quat([0.3, 1, -0.2], 2.9),
      quat([1, 0, 0], Math.PI / 2 - 1e-7),
      quat([0, 0, 1], -3.1),
      quat([1, 1, 1], 0.01),
      quat([0, 1, 0], Math.PI),
    ].flat();
    const clip: Clip = {
      name: 'test',
      fps: 30,
      frameCount: 3,
      jointNames: ['root', 'child'],
      parents: Int32Array.from([-1, 0]),
      offsets: Float64Array.from([0, 1, 0, 0.2, 0.3, 0]),
      rotations: Float32Array.from(rotations),
      translations: Float32Array.from([0.5, 1.1, -2, 0.2, 0.3, 0, 0, 1, 0, 0.2, 0.3, 0, 3, 0.9, 1, 0.2, 0.3, 0]), // prettier-ignore
      translationAnimated: Uint8Array.from([1, 0]),
      warnings: [],
    };
    const back = readBvh(writeBvh(clip));
    expect(back.fps).toBe(30);
    expect(back.frameCount).toBe(3);
    expect(Array.from(back.offsets)).toEqual(Array.from(clip.offsets));
    const d = compare(clip, back);
    expect(d.rotation).toBeLessThan(1e-6);
    expect(d.translation).toBeLessThan(2e-6);
  });

  it('writes every generated clip as the same motion as its .glb twin', async () => {
    for (const c of manifest().clips) {
      const bvh = await readClip(fileBytes(c.bvh), 'bvh');
      const glb = await readClip(fileBytes(c.glb), 'gltf');
      expect([bvh.fps, bvh.frameCount], c.bvh).toEqual([c.fps, c.frameCount]);
      expect([glb.fps, glb.frameCount], c.glb).toEqual([c.fps, c.frameCount]);
      expect(bvh.jointNames, c.bvh).toEqual(glb.jointNames);
      expect(bvh.warnings.concat(glb.warnings), c.bvh).toEqual([]);
      const d = compare(glb, bvh);
      // BVH text keeps 1e-6 degrees and 1e-6 m. glTF key times are float32 (t = 8 s is off by
      // up to 5e-7 s), and a knee landing at 10 rad/s turns 5e-6 rad in that time.
      expect(d.rotation, c.bvh).toBeLessThan(2e-5);
      expect(d.translation, c.bvh).toBeLessThan(2e-6);
    }
  });
});
