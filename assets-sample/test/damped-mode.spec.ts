// The exact damped-mode simulation against closed forms of the single-degree-of-freedom
// oscillator (any mechanical vibrations textbook, e.g. Rao, "Mechanical Vibrations") and the
// worked values in design/solver.md (computed from those formulas).
import { describe, expect, it } from 'vitest';
import { simulateMode, zohStep } from '../generate/capture/damped-mode.js';

const mode = { frequencyHz: 3, dampingRatio: 0.1 };
const wn = 2 * Math.PI * mode.frequencyHz;
const zeta = mode.dampingRatio;
const wd = wn * Math.sqrt(1 - zeta * zeta);

/** Free vibration, amplitude–phase form (Rao): x = A e^{−ζωₙt} cos(ω_d t + φ). */
function textbookFree(x0: number, v0: number, t: number): number {
  const b = (v0 + zeta * wn * x0) / wd;
  const amplitude = Math.hypot(x0, b);
  const phase = Math.atan2(-b, x0);
  return amplitude * Math.exp(-zeta * wn * t) * Math.cos(wd * t + phase);
}

function run(x0: number, v0: number, steps: number, h: number, input = 0): Float64Array {
  const q = new Float64Array(steps + 1);
  simulateMode(mode, h, new Float64Array(steps).fill(input), x0, v0, q);
  return q;
}

describe('damped mode simulation', () => {
  // Rao, free vibration of an underdamped system: x(t) = A e^{−ζωₙt} cos(ω_d t + φ).
  it('follows the closed-form free response at every step', () => {
    const h = 1 / 1200;
    const q = run(0.8, -1.5, 2400, h);
    let worst = 0;
    q.forEach((x, k) => (worst = Math.max(worst, Math.abs(x - textbookFree(0.8, -1.5, k * h)))));
    expect(worst).toBeLessThan(1e-12);
  });

  // Worked value in solver.md: f_n = 3 Hz, ζ = 0.1, x0 = 1, v0 = 0 → x(0.5 s) = −0.387377.
  it('gives the worked value x(0.5 s) = −0.387377', () => {
    const q = run(1, 0, 600, 1 / 1200);
    expect(q[600]).toBeCloseTo(-0.387377, 6);
    // Exact discretisation: a coarse step lands on the same value.
    expect(run(1, 0, 30, 1 / 60)[30]).toBeCloseTo(-0.387377, 6);
  });

  // Logarithmic decrement δ = 2πζ/√(1 − ζ²) = 0.631484: one damped period (1/2.984962 Hz)
  // multiplies the response by e^{−δ} = 0.531802 (worked values in solver.md).
  it('decays by e^{−δ} = 0.531802 per damped period of 1/2.984962 s', () => {
    expect(wd / (2 * Math.PI)).toBeCloseTo(2.984962, 6);
    const period = 1 / 2.984962;
    const q = run(1, 0, 200, period / 200);
    expect(q[200] / q[0]).toBeCloseTo(0.531802, 5);
  });

  // Rao, step response of an underdamped system to a constant force per unit mass F:
  // x(t) = (F/ωₙ²)[1 − e^{−ζωₙt}(cos ω_d t + ζ/√(1−ζ²) sin ω_d t)].
  it('follows the closed-form step response under a constant input', () => {
    const F = 2.5;
    const h = 1 / 240;
    const q = run(0, 0, 480, h, F);
    let worst = 0;
    q.forEach((x, k) => {
      const t = k * h;
      const e = Math.exp(-zeta * wn * t);
      const expected = (F / (wn * wn)) * (1 - e * (Math.cos(wd * t) + (zeta / Math.sqrt(1 - zeta * zeta)) * Math.sin(wd * t))); // prettier-ignore
      worst = Math.max(worst, Math.abs(x - expected));
    });
    expect(worst).toBeLessThan(1e-14);
  });

  // Discrete poles z = e^{sT} (Franklin, Powell & Workman): at 60 fps |z| = 0.969072 and
  // arg z = 0.312585 for 3 Hz, ζ = 0.1 (worked values in solver.md); the transition matrix's
  // eigenvalues are those poles.
  it('has a transition matrix whose eigenvalues are the poles e^{sT}', () => {
    const [a, b, c, d] = zohStep(mode, 1 / 60).phi;
    const tr = a + d;
    const det = a * d - b * c;
    expect(Math.sqrt(det)).toBeCloseTo(0.969072, 6);
    expect(Math.atan2(Math.sqrt(det - (tr * tr) / 4), tr / 2)).toBeCloseTo(0.312585, 6);
  });

  it('refuses overdamped or non-positive settings', () => {
    expect(() => zohStep({ frequencyHz: 3, dampingRatio: 1.2 }, 0.01)).toThrow(/0 < ζ < 1/);
    expect(() => zohStep({ frequencyHz: 0, dampingRatio: 0.1 }, 0.01)).toThrow();
    expect(() => zohStep(mode, 0)).toThrow();
  });
});
