import { describe, expect, it } from 'vitest';
import { sampleStepResponse, underdampedStep } from './step-response';

/** Integrates x'' + 2ζωx' + ω²x = ω² from rest with classic fourth-order Runge–Kutta. */
function integrateStep(zeta: number, omega: number, tEnd: number, dt = 1e-3): number {
  const accel = (x: number, v: number) => omega * omega * (1 - x) - 2 * zeta * omega * v;
  let x = 0;
  let v = 0;
  const steps = Math.round(tEnd / dt);
  for (let i = 0; i < steps; i++) {
    const k1x = v;
    const k1v = accel(x, v);
    const k2x = v + (dt / 2) * k1v;
    const k2v = accel(x + (dt / 2) * k1x, v + (dt / 2) * k1v);
    const k3x = v + (dt / 2) * k2v;
    const k3v = accel(x + (dt / 2) * k2x, v + (dt / 2) * k2v);
    const k4x = v + dt * k3v;
    const k4v = accel(x + dt * k3x, v + dt * k3v);
    x += (dt / 6) * (k1x + 2 * k2x + 2 * k3x + k4x);
    v += (dt / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
  }
  return x;
}

describe('underdamped step response', () => {
  it('matches a numerical solution of the second-order equation it stands for', () => {
    for (const [zeta, omega] of [
      [0.3, 1],
      [0.1, 2.5],
      [0.7, 0.8],
    ]) {
      for (const t of [0.5, 2, 3.7, 9]) {
        expect(underdampedStep(t, zeta, omega)).toBeCloseTo(integrateStep(zeta, omega, t), 6);
      }
    }
  });

  it('peaks at 1 + exp(−ζπ/√(1−ζ²)) at t = π/ω_d', () => {
    // Peak overshoot and peak time of a second-order underdamped system: the standard
    // result in control-engineering textbooks (quoted from memory).
    const zeta = 0.3;
    const omega = 1;
    const samples = sampleStepResponse({
      dampingRatio: zeta,
      naturalFrequency: omega,
      duration: 14,
      samples: 2801,
    });
    const peak = samples.reduce((best, s) => (s.y > best.y ? s : best));
    const root = Math.sqrt(1 - zeta * zeta);
    expect(peak.y).toBeCloseTo(1 + Math.exp((-zeta * Math.PI) / root), 4);
    expect(peak.t).toBeCloseTo(Math.PI / (omega * root), 2);
  });

  it('stays inside the decaying envelope 1 ± e^{−ζωt}/√(1−ζ²) and ends within 2 % of the target', () => {
    const zeta = 0.3;
    const samples = sampleStepResponse({ dampingRatio: zeta });
    const root = Math.sqrt(1 - zeta * zeta);
    for (const { t, y } of samples) {
      expect(Math.abs(y - 1)).toBeLessThanOrEqual(Math.exp(-zeta * t) / root + 1e-12);
    }
    // 2 % band: the usual settling criterion (common practice).
    expect(Math.abs(samples[samples.length - 1].y - 1)).toBeLessThan(0.02);
  });

  it('starts at rest at zero', () => {
    const [first, second] = sampleStepResponse({
      dampingRatio: 0.3,
      naturalFrequency: 1,
      duration: 1,
      samples: 1001,
    });
    expect(first).toEqual({ t: 0, y: 0 });
    // Zero initial slope: the response grows like (ωt)²/2 at first.
    expect(second.y).toBeCloseTo((second.t * second.t) / 2, 6);
  });

  it('rejects a damping ratio that is not underdamped, naming the option', () => {
    expect(() => sampleStepResponse({ dampingRatio: 1 })).toThrow(RangeError);
    expect(() => sampleStepResponse({ dampingRatio: 1 })).toThrow(/dampingRatio/);
    expect(() => sampleStepResponse({ samples: 1 })).toThrow(/samples/);
  });
});
