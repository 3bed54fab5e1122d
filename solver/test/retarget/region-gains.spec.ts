// Region gains: a per-vertex field that keeps each region's gain inside it and blends across
// borders without a seam.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { characterRegionNames, readCharacter, retarget, vertexGainField } from '../../src/index.js';
import { bounceMotion, sampledClip } from '../helpers/known-clips.js';
import { fixture } from './fixtures.js';

const { character, profile } = fixture();

describe('region gains', () => {
  it('holds each region’s gain inside it and blends at borders without a jump', async () => {
    const coach = await readCharacter(
      new Uint8Array(
        readFileSync(
          new URL('../../../assets-sample/files/characters/coach-madge.glb', import.meta.url),
        ),
      ),
    );
    expect(characterRegionNames(coach)).toContain('belly');
    const field = vertexGainField(coach, { belly: 3 });
    const hard = vertexGainField(coach, { belly: 3 }, { borderRings: 0 });
    const t = coach.triangles;
    let jump = 0;
    let hardJump = 0;
    for (let e = 0; e < t.length; e += 3) {
      for (const [a, b] of [
        [t[e], t[e + 1]],
        [t[e + 1], t[e + 2]],
        [t[e + 2], t[e]],
      ]) {
        jump = Math.max(jump, Math.abs(field[a] - field[b]));
        hardJump = Math.max(hardJump, Math.abs(hard[a] - hard[b]));
      }
    }
    expect(hardJump).toBe(2);
    expect(jump).toBeLessThan(0.5 * hardJump);
    // Deep inside the belly and far from it the gains are exact.
    expect(Math.max(...field)).toBeCloseTo(3, 5);
    expect(Math.min(...field)).toBeCloseTo(1, 5);
  });

  it('bakes the field into the take’s basis', () => {
    const clip = sampledClip(character, 30, 2, bounceMotion);
    const plain = retarget(profile, character, clip).take;
    const loud = retarget(profile, character, clip, {
      controls: { regionGains: { chest: 3 } },
    }).take;
    const n3 = character.restPositions.length;
    for (let i = 0; i < n3; i++) {
      expect(loud.basis[i]).toBeCloseTo(plain.basis[i] * loud.vertexGains[(i / 3) | 0], 6);
    }
    expect(Array.from(loud.weights)).toEqual(Array.from(plain.weights));
    expect(loud.metrics.peakDisplacement).toBeGreaterThan(2 * plain.metrics.peakDisplacement);
  });
});
