// Savitzky–Golay weights and the zero-phase low-pass.
import { describe, expect, it } from 'vitest';
import { lowPassZeroPhase, savitzkyGolay, savitzkyGolayWeights } from '../../src/index.js';

describe('Savitzky–Golay filters (Savitzky & Golay 1964, Analytical Chemistry 36, Table I)', () => {
  it('gives the 5-point quadratic smoothing weights (−3, 12, 17, 12, −3)/35', () => {
    const w = savitzkyGolayWeights(2, 2, 0);
    [-3, 12, 17, 12, -3].forEach((v, i) => expect(w[i]).toBeCloseTo(v / 35, 12));
  });

  it('gives the 5-point first-derivative weights (−2, −1, 0, 1, 2)/10', () => {
    const w = savitzkyGolayWeights(2, 2, 1);
    [-2, -1, 0, 1, 2].forEach((v, i) => expect(w[i]).toBeCloseTo(v / 10, 12));
  });

  it('differentiates a cubic exactly everywhere, ends included', () => {
    const dt = 0.05;
    const x = Float64Array.from({ length: 40 }, (_, t) => (t * dt) ** 3 - 2 * (t * dt) ** 2);
    const d2 = savitzkyGolay(x, 40, 1, 2, dt, new Float64Array(40), { halfWidth: 3, degree: 3 });
    for (let t = 0; t < 40; t++) expect(d2[t]).toBeCloseTo(6 * t * dt - 4, 8);
  });
});

describe('zero-phase low-pass', () => {
  it('keeps a slow sinusoid without delay and removes a fast one', () => {
    const fps = 60;
    const n = 600;
    const slow = (t: number): number => Math.sin(2 * Math.PI * 0.3 * (t / fps));
    const x = Float64Array.from(
      { length: n },
      (_, t) => slow(t) + 0.5 * Math.sin(2 * Math.PI * 8 * (t / fps)),
    );
    lowPassZeroPhase(x, n, 1, 1.5, fps);
    let err = 0;
    for (let t = 60; t < n - 60; t++) err = Math.max(err, Math.abs(x[t] - slow(t)));
    expect(err).toBeLessThan(0.01);
  });

  it('has half amplitude at the cut-off after the two passes (Butterworth: −3 dB per pass)', () => {
    const fps = 60;
    const n = 2400;
    const x = Float64Array.from({ length: n }, (_, t) => Math.sin(2 * Math.PI * 1.5 * (t / fps)));
    lowPassZeroPhase(x, n, 1, 1.5, fps);
    let peak = 0;
    for (let t = 600; t < 1800; t++) peak = Math.max(peak, Math.abs(x[t]));
    expect(peak).toBeCloseTo(0.5, 2);
  });
});
