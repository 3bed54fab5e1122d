// FFT and Welch spectra.
import fftJs from 'fft-js';
import { describe, expect, it } from 'vitest';
import { spectrumPeaks, welchPsd } from '../../src/index.js';

describe('FFT (fft-js)', () => {
  it('puts a pure cosine of k cycles at bins ±k with magnitude N/2 (the DFT of a sinusoid)', () => {
    const n = 64;
    const k = 5;
    const x = Array.from({ length: n }, (_, t) => Math.cos((2 * Math.PI * k * t) / n));
    const spec = fftJs.fft(x);
    spec.forEach(([re, im], b) => {
      const mag = Math.hypot(re, im);
      if (b === k || b === n - k) expect(mag).toBeCloseTo(n / 2, 9);
      else expect(mag).toBeLessThan(1e-9);
    });
  });

  it("satisfies Parseval's identity Σ|x|² = (1/N) Σ|X|²", () => {
    const n = 128;
    const x = Array.from(
      { length: n },
      (_, t) => Math.sin(t * 0.37) + 0.3 * Math.cos(t * 1.9) + (t % 7) * 0.01,
    );
    const spec = fftJs.fft(x);
    const time = x.reduce((s, v) => s + v * v, 0);
    const freq = spec.reduce((s, [re, im]) => s + re * re + im * im, 0) / n;
    expect(freq).toBeCloseTo(time, 9);
  });
});

describe('Welch power spectral density', () => {
  it('peaks at a sinusoid and integrates to its variance', () => {
    const fps = 60;
    const n = 1024;
    const x = Float64Array.from(
      { length: n },
      (_, t) => 2 * Math.sin(2 * Math.PI * 4.2 * (t / fps)),
    );
    const s = welchPsd(x, n, 1, fps);
    const [top] = spectrumPeaks(s);
    expect(Math.abs(top.frequencyHz - 4.2)).toBeLessThan(s.frequencies[1]);
    let area = 0;
    for (const p of s.power) area += p * s.frequencies[1];
    expect(area).toBeCloseTo(2, 1); // variance of 2 sin(·) = 2² / 2
  });
});
