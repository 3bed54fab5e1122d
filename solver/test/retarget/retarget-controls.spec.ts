// Retarget with the artist's controls: gain is exactly linear, mute/solo silence the right modes,
// the displacement clamp holds, pre-roll starts the shot at rest, and live tuning reproduces a
// full retarget.
import { describe, expect, it } from 'vitest';
import { createLiveTuner, retarget } from '../../src/index.js';
import { landingMotion, sampledClip } from '../helpers/known-clips.js';
import { column, fixture } from './fixtures.js';

const { character, profile } = fixture();
const clip = sampledClip(character, 60, 2.5, landingMotion(0.3));

describe('retarget controls', () => {
  it('gain 2 gives exactly twice the offsets of gain 1, and gain 0 none', () => {
    const one = retarget(profile, character, clip).take;
    const two = retarget(profile, character, clip, { controls: { gain: 2 } }).take;
    const zero = retarget(profile, character, clip, { controls: { gain: 0 } }).take;
    expect(Math.max(...one.weights.map(Math.abs))).toBeGreaterThan(0.01);
    expect(Array.from(two.weights)).toEqual(Array.from(one.weights, (w) => 2 * w));
    expect(zero.weights.every((w) => w === 0)).toBe(true);
    expect(zero.metrics.peakDisplacement).toBe(0);
  });

  it('mute and solo silence exactly the chosen modes', () => {
    // The modes are decoupled: coefficient i is mode i alone.
    const all = retarget(profile, character, clip).take;
    const muted = retarget(profile, character, clip, { controls: { mutedModes: [1] } }).take;
    const solo = retarget(profile, character, clip, { controls: { soloModes: [1] } }).take;
    const peak = (a: number[]) => Math.max(...a.map(Math.abs));
    expect(peak(column(muted.coefficients, 2, 1))).toBeLessThan(1e-6);
    const ref = column(all.coefficients, 2, 0);
    column(muted.coefficients, 2, 0).forEach((v, i) => expect(v).toBeCloseTo(ref[i], 6));
    expect(peak(column(solo.coefficients, 2, 0))).toBeLessThan(1e-6);
    expect(peak(column(solo.coefficients, 2, 1))).toBeGreaterThan(1e-3);
  });

  it('keeps every vertex within the maximum displacement', () => {
    const free = retarget(profile, character, clip).take;
    const max = 0.5 * free.metrics.peakDisplacement;
    const clamped = retarget(profile, character, clip, { controls: { maxDisplacement: max } }).take;
    expect(clamped.metrics.peakDisplacement).toBeLessThanOrEqual(max * (1 + 1e-6));
    expect(clamped.metrics.peakDisplacement).toBeGreaterThan(0.5 * max);
  });

  it('live tuning from the stored drive equals a full retarget with the same controls', () => {
    const controls = {
      gain: 1.5,
      stiffness: 1.4,
      damping: 0.7,
      mutedModes: [0],
      soloModes: [],
      maxDisplacement: null,
    };
    const baked = retarget(profile, character, clip, { controls }).take;
    const base = retarget(profile, character, clip).take;
    const tuner = createLiveTuner(base.live, base.basis);
    const weights = tuner.tune(controls);
    expect(Array.from(weights)).toEqual(Array.from(baked.weights));
    expect(Array.from(tuner.a1)).toEqual(Array.from(baked.a1));
  });

  it('starts at rest after the pre-roll: equilibrium of the held pose, no jump', () => {
    // Spine bent 0.5 rad and held still for 0.5 s, then a bounce.
    const bent = sampledClip(character, 60, 2, (t) => ({
      rootY: 0,
      rootX: 0,
      bend: 0.5 + (t > 0.5 ? 0.3 * Math.sin(2 * Math.PI * 1.5 * (t - 0.5)) ** 3 : 0),
    }));
    const take = retarget(profile, character, bent, { controls: { prerollSeconds: 1 } }).take;
    // Chest mode: b = (0, −1, 0) on the chest's specific force; bent by 0.5 rad about X, gravity
    // reads 9.81·cos 0.5 on the chest's Y axis instead of 9.81. Static deflection b·Δf / ω_n².
    const wn = 2 * Math.PI * 3;
    const expected = (-1 * (9.81 * Math.cos(0.5) - 9.81)) / (wn * wn);
    expect(take.coefficients[0]).toBeCloseTo(expected, 6);
    const c0 = column(take.coefficients, 2, 0);
    for (let t = 1; t < 20; t++) expect(Math.abs(c0[t] - c0[t - 1])).toBeLessThan(1e-6);
    // The motion afterwards does move it (the check above is not vacuous).
    expect(Math.max(...c0.map((v) => Math.abs(v - expected)))).toBeGreaterThan(1e-3);
  });

  it('reports its stages in order with growing fractions', () => {
    const seen: [string, number][] = [];
    retarget(profile, character, clip, { onProgress: (s, f) => seen.push([s, f]) });
    expect(seen.map(([s]) => s)).toEqual([
      'check',
      'map',
      'transfer',
      'drive',
      'simulate',
      'metrics',
      'metrics',
    ]);
    for (let i = 1; i < seen.length; i++) expect(seen[i][1]).toBeGreaterThanOrEqual(seen[i - 1][1]);
  });
});
