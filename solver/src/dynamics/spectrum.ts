// Power spectral density by Welch's method (Welch 1967): Hann-windowed segments with 50 %
// overlap, FFT (fft-js, power-of-two lengths), one-sided density in units² per hertz. Used on
// each region's dynamic displacement; its peaks should sit at the identified modes.
import fftJs from 'fft-js';

/** Options for the Welch estimate. */
export interface WelchOptions {
  /** Segment length (a power of two); defaults to the largest power of two ≤ frames / 2, at least 16. */
  segmentLength?: number;
}

/** A one-sided power spectral density. */
export interface Spectrum {
  /** Bin frequencies (Hz), 0 … fps/2. */
  frequencies: Float64Array;
  /** Density per bin. */
  power: Float64Array;
}

/** Largest power of two ≤ n (1 for n < 2). */
export function floorPowerOfTwo(n: number): number {
  let p = 1;
  while (p * 2 <= n) p *= 2;
  return p;
}

/**
 * Welch PSD summed over `channels` interleaved series (frame-major, `frames` samples each) at
 * rate `fps`. The total is the sum of the channels' densities, so for displacements of a region
 * it is the region's summed squared displacement per hertz.
 */
export function welchPsd(
  x: ArrayLike<number>,
  frames: number,
  channels: number,
  fps: number,
  options: WelchOptions = {},
): Spectrum {
  const len = options.segmentLength ?? Math.max(16, floorPowerOfTwo(Math.max(2, frames / 2)));
  const seg = Math.min(len, floorPowerOfTwo(frames));
  const hop = seg / 2;
  const window = Float64Array.from(
    { length: seg },
    (_, i) => 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / seg),
  );
  let wss = 0;
  for (const w of window) wss += w * w;
  const bins = seg / 2 + 1;
  const power = new Float64Array(bins);
  let segments = 0;
  const buffer: number[] = new Array(seg);
  for (let start = 0; start + seg <= frames; start += hop) {
    segments++;
    for (let ch = 0; ch < channels; ch++) {
      let mean = 0;
      for (let i = 0; i < seg; i++) mean += x[(start + i) * channels + ch];
      mean /= seg;
      for (let i = 0; i < seg; i++) buffer[i] = (x[(start + i) * channels + ch] - mean) * window[i];
      const spec = fftJs.fft(buffer);
      for (let b = 0; b < bins; b++) {
        const [re, im] = spec[b];
        const one = b === 0 || b === seg / 2 ? 1 : 2;
        power[b] += (one * (re * re + im * im)) / (fps * wss);
      }
    }
  }
  if (segments > 0) for (let b = 0; b < bins; b++) power[b] /= segments;
  const frequencies = Float64Array.from({ length: bins }, (_, b) => (b * fps) / seg);
  return { frequencies, power };
}

/**
 * Local maxima of a spectrum above `minRelative` of its largest value (DC excluded), refined by
 * a parabola through the peak bin and its neighbours; strongest first.
 */
export function spectrumPeaks(
  spectrum: Spectrum,
  minRelative = 0.1,
): { frequencyHz: number; power: number }[] {
  const { frequencies, power } = spectrum;
  let max = 0;
  for (let b = 1; b < power.length; b++) max = Math.max(max, power[b]);
  const peaks: { frequencyHz: number; power: number }[] = [];
  const step = frequencies.length > 1 ? frequencies[1] - frequencies[0] : 0;
  for (let b = 1; b < power.length - 1; b++) {
    const p = power[b];
    if (!(p > power[b - 1] && p >= power[b + 1] && p >= minRelative * max)) continue;
    const denom = power[b - 1] - 2 * p + power[b + 1];
    const shift = denom !== 0 ? (0.5 * (power[b - 1] - power[b + 1])) / denom : 0;
    peaks.push({ frequencyHz: frequencies[b] + shift * step, power: p });
  }
  return peaks.sort((a, b) => b.power - a.power);
}
