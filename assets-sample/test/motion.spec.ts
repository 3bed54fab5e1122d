// Procedural motion: smooth schedules, free fall in the air, a hard landing, feet on the ground.
import { describe, expect, it } from 'vitest';
import { coachPlan } from '../generate/body/coach.js';
import { specificForce } from '../generate/capture/specific-force.js';
import { coachJump, coachWalk } from '../generate/motion/clip-scripts.js';
import { GRAVITY, hopOffset, type Hop } from '../generate/motion/hops.js';
import { rigInfo } from '../generate/motion/rig-info.js';
import { FINE_RATE, fineKinematics } from '../generate/motion/sample-motion.js';
import { integralAt, rampTrack, valueAt } from '../generate/motion/tracks.js';

const rig = rigInfo(coachPlan());

describe('motion schedules', () => {
  it('integrate tracks exactly (against a fine midpoint sum)', () => {
    const tr = rampTrack(0.7, [
      [0.5, 1.5, 1.2],
      [2.0, 2.4, 0.3],
    ]);
    const h = 1e-4;
    let sum = 0;
    for (let t = h / 2; t < 3; t += h) sum += valueAt(tr, t) * h;
    expect(integralAt(tr, 3)).toBeCloseTo(sum, 6);
  });

  it('keep hop heights continuous in position, velocity and acceleration', () => {
    const hops: Hop[] = [{ takeoff: 1, flight: 0.4, crouch: 0.1, absorb: 0.16 }];
    const h = 1e-4;
    let worstJerkStep = 0;
    let prevAcc = NaN;
    for (let t = 0.3; t < 2.2; t += h) {
      const acc = (hopOffset(hops, t + h) - 2 * hopOffset(hops, t) + hopOffset(hops, t - h)) / (h * h); // prettier-ignore
      if (!Number.isNaN(prevAcc)) worstJerkStep = Math.max(worstJerkStep, Math.abs(acc - prevAcc));
      prevAcc = acc;
    }
    // A jump in acceleration would show as a step of metres per s² between neighbours.
    expect(worstJerkStep).toBeLessThan(0.2);
  });
});

describe('specific force of the coach in a jump', () => {
  const hips = rig.hips;
  const kin = fineKinematics(rig, coachJump, [hips]);
  const f = specificForce(kin, 0);
  const at = (t: number) => {
    const k = kin.pad + Math.round(t * FINE_RATE);
    return [f[3 * k], f[3 * k + 1], f[3 * k + 2]];
  };
  const hop = coachJump.hops[0];

  it('is gravity reversed while standing still', () => {
    const [x, y, z] = at(0.1);
    expect(Math.hypot(x, y - GRAVITY, z)).toBeLessThan(1e-6);
  });

  it('vanishes in free fall', () => {
    const [x, y, z] = at(hop.takeoff + hop.flight / 2);
    expect(Math.hypot(x, y, z)).toBeLessThan(1e-3);
  });

  it('peaks above twice gravity on landing', () => {
    let peak = 0;
    for (let t = hop.takeoff + hop.flight; t < hop.takeoff + hop.flight + hop.absorb; t += 0.002) {
      peak = Math.max(peak, at(t)[1]);
    }
    expect(peak).toBeGreaterThan(2 * GRAVITY);
  });
});

describe('walking', () => {
  it('keeps the feet on or above the ground and below knee height', () => {
    const feet = [rig.legs[0].end, rig.legs[1].end];
    const kin = fineKinematics({ ...rig }, { ...coachWalk, duration: 3 }, feet);
    const restAnkle = rig.rest[feet[0]].y;
    let low = Infinity;
    let high = -Infinity;
    for (const p of kin.positions) {
      for (let k = 0; k < kin.count; k += 10) {
        low = Math.min(low, p[3 * k + 1]);
        high = Math.max(high, p[3 * k + 1]);
      }
    }
    expect(low).toBeGreaterThan(restAnkle - 0.01);
    expect(high).toBeLessThan(restAnkle + 0.2);
    expect(high).toBeGreaterThan(restAnkle + 0.03);
  });
});
