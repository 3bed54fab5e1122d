// Capture .glb import and export.
import { describe, expect, it } from 'vitest';
import { readCapture, writeCaptureGlb, type Capture } from '../../src/index.js';
import { seededRandom } from '../helpers/random.js';
import { syntheticCapture, syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { validatorErrors } from '../helpers/validator.js';

describe('capture .glb', () => {
  it('round-trips frames, rate and topology without a skeleton', async () => {
    const character = syntheticCharacter();
    const { capture } = syntheticCapture(character, syntheticClip(character, 12, 60), {
      jiggle: 0.01,
    });
    const back = await readCapture(await writeCaptureGlb(capture));
    expect(back.fps).toBe(60);
    expect(back.frameCount).toBe(12);
    expect(back.vertexCount).toBe(capture.vertexCount);
    expect(back.triangles).toEqual(capture.triangles);
    expect(back.clip).toBeNull();
    let worst = 0;
    back.positions.forEach((v, i) => (worst = Math.max(worst, Math.abs(v - capture.positions[i]))));
    expect(worst).toBeLessThan(1e-6);
  });

  it('round-trips the skeleton animation when written on the character', async () => {
    const character = syntheticCharacter({ restAngle: 0.2 });
    const clip = syntheticClip(character, 10, 30);
    const { capture } = syntheticCapture(character, clip);
    const bytes = await writeCaptureGlb({ ...capture, clip }, { character });
    const back = await readCapture(bytes);
    expect(back.clip?.jointNames).toEqual(character.skeleton.names);
    expect(back.clip?.frameCount).toBe(10);
    back.clip!.rotations.forEach((v, i) =>
      expect(Math.abs(v - clip.rotations[i])).toBeLessThan(1e-6),
    );
    expect(await validatorErrors(bytes)).toEqual([]);
  });

  it('writes files the Khronos glTF validator accepts with 0 errors', async () => {
    const character = syntheticCharacter();
    const { capture } = syntheticCapture(character, syntheticClip(character, 8, 24));
    expect(await validatorErrors(await writeCaptureGlb(capture))).toEqual([]);
  });

  it('loads a 10,000-vertex, 1,000-frame capture into one Float32Array', async () => {
    const n = 10_000;
    const t = 1_000;
    const rand = seededRandom(1);
    const base = Float32Array.from({ length: 3 * n }, () => rand());
    const positions = new Float32Array(3 * n * t);
    for (let f = 0; f < t; f++) {
      for (let i = 0; i < 3 * n; i++) positions[3 * n * f + i] = base[i] + 0.001 * f;
    }
    const triangles = Uint32Array.from(
      { length: 3 * (n - 2) },
      (_, k) => Math.floor(k / 3) + (k % 3),
    );
    const capture: Capture = {
      name: 'large',
      fps: 60,
      frameCount: t,
      vertexCount: n,
      positions,
      basePositions: base,
      triangles,
      clip: null,
      warnings: [],
    };
    const back = await readCapture(await writeCaptureGlb(capture));
    expect(back.positions).toBeInstanceOf(Float32Array);
    expect(back.positions.length).toBe(3 * n * t);
    expect(back.frameCount).toBe(t);
    expect(back.vertexCount).toBe(n);
    // First, middle and last frames hold their own shapes.
    for (const f of [0, 517, 999]) {
      expect(back.positions[3 * n * f + 5]).toBeCloseTo(base[5] + 0.001 * f, 4);
    }
  });
});
