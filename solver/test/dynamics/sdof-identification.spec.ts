// Single-degree-of-freedom checks: textbook relations, worked discrete values and identification
// of sampled free and forced responses by the ARX fit.
import { describe, expect, it } from 'vitest';
import { companionEigen, fitArx, modalToPole, poleToModal } from '../../src/index.js';

const FN = 3;
const ZETA = 0.1;
const WN = 2 * Math.PI * FN;
const WD = WN * Math.sqrt(1 - ZETA * ZETA);

/** Free response x(t) = e^{−ζωₙt}(cos ω_d t + ζωₙ/ω_d sin ω_d t) for x0 = 1, v0 = 0. */
function free(t: number, fn = FN, zeta = ZETA): number {
  const wn = 2 * Math.PI * fn;
  const wd = wn * Math.sqrt(1 - zeta * zeta);
  return Math.exp(-zeta * wn * t) * (Math.cos(wd * t) + ((zeta * wn) / wd) * Math.sin(wd * t));
}

describe('damped free vibration (Rao, Mechanical Vibrations; worked values of solver.md)', () => {
  it('gives the logarithmic decrement, amplitude ratio, damped frequency and x(0.5 s)', () => {
    const delta = (2 * Math.PI * ZETA) / Math.sqrt(1 - ZETA * ZETA);
    expect(delta).toBeCloseTo(0.631484, 6);
    expect(Math.exp(-delta)).toBeCloseTo(0.531802, 6);
    expect(WD / (2 * Math.PI)).toBeCloseTo(2.984962, 6);
    expect(free(0.5)).toBeCloseTo(-0.387377, 6);
  });
});

describe('discrete poles z = e^{sT} (Franklin, Powell & Workman, Digital Control of Dynamic Systems)', () => {
  it('matches the worked 24 fps pole and AR(2) coefficients', () => {
    const z = modalToPole(FN, ZETA, 24);
    expect(z.re).toBeCloseTo(0.656264, 6);
    expect(z.im).toBeCloseTo(0.651117, 6);
    expect(2 * z.re).toBeCloseTo(1.312528, 6);
    expect(-(z.re * z.re + z.im * z.im)).toBeCloseTo(-0.854636, 6);
  });

  it('matches the worked 60 fps pole magnitude and angle, and maps back to f_n and ζ', () => {
    const z = modalToPole(FN, ZETA, 60);
    expect(Math.hypot(z.re, z.im)).toBeCloseTo(0.969072, 6);
    expect(Math.atan2(z.im, z.re)).toBeCloseTo(0.312585, 6);
    const back = poleToModal(z.re, z.im, 60);
    expect(back.frequencyHz).toBeCloseTo(FN, 10);
    expect(back.dampingRatio).toBeCloseTo(ZETA, 10);
  });
});

/** Identified (f_n, ζ) of a one-coefficient ARX fit to `x` with input `u` (or none). */
function identify(
  x: Float64Array,
  u: Float64Array | null,
  fps: number,
): { frequencyHz: number; dampingRatio: number } {
  const m = u ? 1 : 0;
  const model = fitArx(x, u ?? new Float64Array(x.length * 0), 1, m, 2, x.length, 0);
  const eig = companionEigen(model.a1, model.a2, 1);
  const i = eig.zIm[0] >= 0 ? 0 : 1;
  return poleToModal(eig.zRe[i], eig.zIm[i], fps);
}

describe('identification of sampled single-degree-of-freedom responses', () => {
  for (const [fn, zeta, fps] of [
    [3, 0.1, 60],
    [3, 0.1, 24],
    [6.5, 0.3, 60],
    [1.6, 0.07, 30],
  ]) {
    it(`recovers f_n = ${fn} Hz, ζ = ${zeta} from the free response at ${fps} fps`, () => {
      const x = Float64Array.from({ length: 4 * fps }, (_, t) => free(t / fps, fn, zeta));
      const id = identify(x, null, fps);
      expect(Math.abs(id.frequencyHz / fn - 1)).toBeLessThan(0.005);
      expect(Math.abs(id.dampingRatio / zeta - 1)).toBeLessThan(0.02);
    });
  }

  it('recovers f_n and ζ from a response forced through a zero-order hold', () => {
    // Exact ZOH discretisation of ẍ + 2ζωₙẋ + ωₙ²x = ωₙ² u: x_t = a1 x + a2 x + b0 u_t + b1 u_{t−1}
    // with the ZOH numerator; the input is a seeded random step sequence.
    const fps = 60;
    const z = modalToPole(FN, ZETA, fps);
    const a1 = 2 * z.re;
    const a2 = -(z.re * z.re + z.im * z.im);
    const T = 1 / fps;
    const sig = ZETA * WN;
    const e = Math.exp(-sig * T);
    const c = Math.cos(WD * T);
    const s = Math.sin(WD * T);
    const b1 = 1 - e * (c + (sig / WD) * s);
    const b2 = e * e + e * ((sig / WD) * s - c);
    let seed = 7;
    const rand = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647 - 0.5;
    const n = 600;
    const u = new Float64Array(n);
    for (let t = 0; t < n; t++) u[t] = t % 12 === 0 ? rand() : u[t - 1];
    const x = new Float64Array(n);
    for (let t = 2; t < n; t++)
      x[t] = a1 * x[t - 1] + a2 * x[t - 2] + b1 * u[t - 1] + b2 * u[t - 2];
    // The ARX uses u_t and u_{t−1}: shift the input by one frame so the model structure matches.
    const shifted = new Float64Array(n);
    for (let t = 1; t < n; t++) shifted[t] = u[t - 1];
    const id = identify(x, shifted, fps);
    expect(Math.abs(id.frequencyHz / FN - 1)).toBeLessThan(0.005);
    expect(Math.abs(id.dampingRatio / ZETA - 1)).toBeLessThan(0.02);
  });
});
