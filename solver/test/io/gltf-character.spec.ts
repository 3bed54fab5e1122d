// Character .glb import and export: round trip, regions, warnings and validity.
import { describe, expect, it } from 'vitest';
import { readCharacter, writeCharacterGlb, type Character } from '../../src/index.js';
import { elementOffset, patchGlb } from '../helpers/glb-patch.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';
import { validatorErrors } from '../helpers/validator.js';

function withRegions(c: Character): Character {
  const n = c.restPositions.length / 3;
  const labels = new Uint16Array(n);
  for (let i = 0; i < n; i++) labels[i] = c.restPositions[3 * i + 1] > 1 ? 1 : 0;
  return { ...c, regions: { labels, names: ['lower', 'upper'], source: 'attribute' } };
}

describe('character .glb', () => {
  it('round-trips mesh, skeleton, skin and regions', async () => {
    const original = withRegions(syntheticCharacter({ restAngle: 0.3 }));
    const back = await readCharacter(await writeCharacterGlb(original));
    expect(back.restPositions).toEqual(original.restPositions);
    expect(back.triangles).toEqual(original.triangles);
    expect(back.skeleton.names).toEqual(original.skeleton.names);
    expect(back.skeleton.parents).toEqual(original.skeleton.parents);
    const near = (a: ArrayLike<number>, b: ArrayLike<number>, tol: number) =>
      Array.from(a).forEach((v, i) => expect(Math.abs(v - b[i])).toBeLessThan(tol));
    near(back.skeleton.restTranslations, original.skeleton.restTranslations, 1e-6);
    near(back.skeleton.restRotations, original.skeleton.restRotations, 1e-6);
    near(back.skeleton.inverseBindMatrices, original.skeleton.inverseBindMatrices, 1e-6);
    near(back.skinWeights, original.skinWeights, 1e-6);
    expect(back.skinJoints).toEqual(original.skinJoints);
    expect(back.regions?.names).toEqual(['lower', 'upper']);
    expect(back.regions?.labels).toEqual(original.regions?.labels);
    expect(back.regions?.source).toBe('attribute');
  });

  it('writes files the Khronos glTF validator accepts with 0 errors', async () => {
    const bytes = await writeCharacterGlb(withRegions(syntheticCharacter({ restAngle: 0.3 })));
    expect(await validatorErrors(bytes)).toEqual([]);
  });

  it('derives regions from dominant joints when the file has none', async () => {
    const c = syntheticCharacter();
    const back = await readCharacter(await writeCharacterGlb(c));
    expect(back.regions?.source).toBe('dominant-joint');
    // Every vertex's region is named after its largest-weight joint.
    for (let i = 0; i < c.restPositions.length / 3; i++) {
      const k = c.skinWeights[4 * i] >= c.skinWeights[4 * i + 1] ? 0 : 1;
      expect(back.regions!.names[back.regions!.labels[i]]).toBe(
        c.skeleton.names[c.skinJoints[4 * i + k]],
      );
    }
  });

  it('renormalises weights within tolerance and says so', async () => {
    const bytes = patchGlb(await writeCharacterGlb(syntheticCharacter()), (parts) => {
      const acc = parts.json.meshes[0].primitives[0].attributes.WEIGHTS_0;
      const view = new DataView(parts.bin.buffer);
      const o = elementOffset(parts, acc, 7, 16);
      for (let k = 0; k < 4; k++)
        view.setFloat32(o + 4 * k, view.getFloat32(o + 4 * k, true) * 1.02, true);
    });
    const back = await readCharacter(bytes);
    const sum = back.skinWeights.subarray(28, 32).reduce((a, b) => a + b);
    expect(sum).toBeCloseTo(1, 6);
    expect(back.warnings.some((w) => w.includes('renormalised'))).toBe(true);
  });
});
