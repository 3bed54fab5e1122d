// Pose estimation on synthetic skinned sequences with known joint rotations.
import { describe, expect, it } from 'vitest';
import { estimatePoses, quatConjugate, quatMultiply, type Clip } from '../../src/index.js';
import { syntheticCapture, syntheticClip } from '../helpers/synthetic-capture.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

/** Largest rotation angle (radians) between the clips' local rotations for joint j. */
function worstAngle(a: Clip, b: Clip, j: number): number {
  const jc = a.jointNames.length;
  let worst = 0;
  const d = new Float64Array(4);
  const qa = new Float64Array(4);
  for (let f = 0; f < a.frameCount; f++) {
    // Angle of conj(a)·b from atan2(|vector part|, |w|): well conditioned near zero, unlike acos.
    quatConjugate(qa, 0, a.rotations, 4 * (f * jc + j));
    quatMultiply(d, 0, qa, 0, b.rotations, 4 * (f * jc + j));
    worst = Math.max(worst, 2 * Math.atan2(Math.hypot(d[0], d[1], d[2]), Math.abs(d[3])));
  }
  return worst;
}

describe('estimatePoses', () => {
  const character = syntheticCharacter({ restAngle: 0.3 });
  const truth = syntheticClip(character, 90, 30);

  it('recovers known local rotations and root translation from a clean skinned sequence', () => {
    const { capture } = syntheticCapture(character, truth);
    const { clip, confidence } = estimatePoses(character, capture);
    // Within 1e-3 rad (0.06°) after the default passes; blended skins converge geometrically.
    character.skeleton.names.forEach((_, j) =>
      expect(worstAngle(clip, truth, j)).toBeLessThan(1e-3),
    );
    const jc = truth.jointNames.length;
    for (let f = 0; f < truth.frameCount; f++) {
      for (let c = 0; c < 3; c++)
        expect(clip.translations[3 * f * jc + c]).toBeCloseTo(
          truth.translations[3 * f * jc + c],
          5,
        );
    }
    expect(Math.min(...confidence)).toBeGreaterThan(0.5);
  });

  it('keeps bones steady under jiggling flesh by weighting with rigidity', () => {
    const { capture, soft } = syntheticCapture(character, truth, {
      jiggle: 0.02,
      softJoint: 'chest',
    });
    const chest = character.skeleton.names.indexOf('chest');
    const plain = estimatePoses(character, capture, { iterations: 1 });
    const weighted = estimatePoses(character, capture);
    const errPlain = worstAngle(plain.clip, truth, chest);
    const errWeighted = worstAngle(weighted.clip, truth, chest);
    expect(errWeighted).toBeLessThan((0.5 * Math.PI) / 180);
    expect(errWeighted).toBeLessThan(errPlain / 3);
    // Soft vertices end up far less rigid than the rest.
    let softMax = 0;
    let hardMin = 1;
    weighted.rigidity.forEach((r, i) =>
      soft[i] ? (softMax = Math.max(softMax, r)) : (hardMin = Math.min(hardMin, r)),
    );
    expect(softMax).toBeLessThan(0.5);
    expect(hardMin).toBeGreaterThan(0.9);
  });

  it('keeps quaternion signs continuous and reports confidence in [0, 1]', () => {
    const { capture } = syntheticCapture(character, syntheticClip(character, 60, 30, 3, 1.5));
    const { clip, confidence } = estimatePoses(character, capture);
    const jc = clip.jointNames.length;
    for (let f = 1; f < clip.frameCount; f++) {
      for (let j = 0; j < jc; j++) {
        let dot = 0;
        for (let c = 0; c < 4; c++)
          dot += clip.rotations[4 * (f * jc + j) + c] * clip.rotations[4 * ((f - 1) * jc + j) + c];
        expect(dot).toBeGreaterThan(0);
      }
    }
    confidence.forEach((c) => expect(c >= 0 && c <= 1).toBe(true));
  });
});
