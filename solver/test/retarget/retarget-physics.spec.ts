// Retarget physics: the shot's frame rate does not change the motion, physical size scaling
// follows dynamic similarity, and modes the shot cannot represent are flagged.
import { describe, expect, it } from 'vitest';
import { retarget } from '../../src/index.js';
import { bounceMotion, landingMotion, sampledClip } from '../helpers/known-clips.js';
import { column, fixture, freeDecayMode, scaledCharacter } from './fixtures.js';

describe('retarget physics', () => {
  it('gives the same offsets at common instants for a 24 fps and a 60 fps shot (within 2 % RMS)', () => {
    const { character, profile } = fixture();
    const at60 = retarget(profile, character, sampledClip(character, 60, 4, bounceMotion)).take;
    const at24 = retarget(profile, character, sampledClip(character, 24, 4, bounceMotion)).take;
    // Common instants: every 5th frame at 60 fps, every 2nd at 24 fps (t = n/12 s).
    let diff = 0;
    let ref = 0;
    for (let n = 0; 5 * n < at60.frameCount && 2 * n < at24.frameCount; n++) {
      for (let c = 0; c < 2; c++) {
        const a = at60.coefficients[5 * n * 2 + c];
        const b = at24.coefficients[2 * n * 2 + c];
        diff += (a - b) ** 2;
        ref += a * a;
      }
    }
    expect(ref).toBeGreaterThan(0);
    expect(Math.sqrt(diff / ref)).toBeLessThan(0.02);
  });

  // Dynamic similarity with gravity dominant (Alexander & Jayes 1983): frequency ∝ √(g/L), so a
  // body twice as long rings at 1/√2 of the frequency. Measured on the take by Prony's fit of the
  // free decay after the landing.
  it('scales frequencies by 1/√2 for a character twice as long, measured on the take', () => {
    const { character, profile } = fixture([
      { frequencyHz: 3, dampingRatio: 0.05, joint: 'chest', driver: 'chest', gain: [0, -1, 0] },
    ]);
    const big = scaledCharacter(character, 2);
    const decay = (c: typeof character, physicalScaling: boolean) => {
      const clip = sampledClip(c, 60, 3, landingMotion(0.4));
      const { take } = retarget(profile, c, clip, { controls: { physicalScaling } });
      expect(take.metrics.lengthRatio).toBeCloseTo(c === big ? 2 : 1, 9);
      // The fall ends at 0.55 s; the derivative window reaches 0.05 s past it.
      return freeDecayMode(column(take.coefficients, 1, 0, Math.round(0.7 * 60)), 60);
    };
    const small = decay(character, true);
    const large = decay(big, true);
    const stylised = decay(big, false);
    expect(small.frequencyHz / 3).toBeCloseTo(1, 3);
    expect(Math.abs(large.frequencyHz / small.frequencyHz - 1 / Math.SQRT2)).toBeLessThan(0.005);
    expect(large.dampingRatio / small.dampingRatio).toBeCloseTo(1, 2);
    expect(stylised.frequencyHz / small.frequencyHz).toBeCloseTo(1, 3);
  });

  it('flags and warns about a mode near the shot’s Nyquist frequency', () => {
    const { character, profile } = fixture([
      { frequencyHz: 2, dampingRatio: 0.1, joint: 'chest', driver: 'chest', gain: [0, -1, 0] },
      { frequencyHz: 11, dampingRatio: 0.2, joint: 'spine', driver: 'spine', gain: [0, -1, 0] },
    ]);
    const at24 = retarget(profile, character, sampledClip(character, 24, 2, bounceMotion)).take;
    expect(at24.modes[1].flags).toContain('near-nyquist');
    expect(at24.modes[0].flags).not.toContain('near-nyquist');
    expect(at24.warnings.some((w) => w.includes('Nyquist'))).toBe(true);
    const at60 = retarget(profile, character, sampledClip(character, 60, 2, bounceMotion)).take;
    expect(at60.warnings.some((w) => w.includes('Nyquist'))).toBe(false);
  });
});
