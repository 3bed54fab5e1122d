// Unposing (inverse linear blend skinning) on synthetic captures with known rest-space offsets.
import { describe, expect, it } from 'vitest';
import { unpose, unposeFrame } from '../../src/index.js';
import { syntheticCapture, syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

describe('unpose', () => {
  const character = syntheticCharacter({ restAngle: 0.3 });
  const clip = syntheticClip(character, 40, 30);

  it('gives zero residual for pure skinning', () => {
    const { capture } = syntheticCapture(character, clip);
    const { residuals, degenerate } = unpose(character, capture, clip);
    expect(degenerate).toBe(0);
    expect(Math.max(...residuals.map(Math.abs))).toBeLessThan(1e-5);
  });

  it('recovers rest-space offsets added before skinning: r_t = (Σ w M)⁻¹ v_t − v_rest', () => {
    const { capture, soft } = syntheticCapture(character, clip, { jiggle: 0.02 });
    const { residuals } = unpose(character, capture, clip);
    const n = capture.vertexCount;
    const normals = character.restNormals;
    for (const f of [5, 17, 33]) {
      const t = f / clip.fps;
      const wobble = 0.02 * Math.sin(2 * Math.PI * 3.1 * t) * Math.exp(-0.2 * t);
      for (let i = 0; i < n; i++) {
        for (let c = 0; c < 3; c++) {
          const expected = soft[i] ? wobble * normals[3 * i + c] : 0;
          expect(Math.abs(residuals[3 * (n * f + i) + c] - expected)).toBeLessThan(2e-5);
        }
      }
    }
  });

  it('returns zero and counts vertices whose blended matrix is singular', () => {
    const skin = new Float64Array(16); // one all-zero joint matrix
    const out = new Float32Array([9, 9, 9]);
    const count = unposeFrame([1, 2, 3], [0, 0, 0, 0], [1, 0, 0, 0], skin, [4, 5, 6], 0, out, 0);
    expect(count).toBe(1);
    expect(Array.from(out)).toEqual([0, 0, 0]);
  });
});
