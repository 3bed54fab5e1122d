// Spectra of each region's dynamic displacement, computed in coefficient space: with the region's
// rows of the basis U_r, ‖U_r c_t‖² = ‖Λ^(1/2) Qᵀ c_t‖² for U_rᵀU_r = Q Λ Qᵀ, so a K-channel
// Welch estimate gives the region's summed squared displacement per hertz without touching 3N.
import { spectrumPeaks, welchPsd, type Spectrum } from '../dynamics/spectrum.js';
import { symmetricEigen } from '../linalg/sym-eigen.js';
import type { Mode, Regions, SpectrumPeak } from '../types.js';

/** One region's spectrum and peaks. */
export interface RegionSpectrum {
  region: string;
  /** Share of the dynamic energy in this region. */
  energyShare: number;
  spectrum: Spectrum;
  peaks: SpectrumPeak[];
}

/** Spectra of regions holding at least `minShare` of the dynamic energy. */
export function regionSpectra(
  basis: Float32Array | Float64Array,
  k: number,
  coefficients: Float64Array,
  frames: number,
  fps: number,
  regions: Regions | null,
  minShare = 0.01,
): RegionSpectrum[] {
  const d = basis.length / Math.max(1, k);
  const n = d / 3;
  const names = regions ? regions.names : ['body'];
  const grams = names.map(() => new Float64Array(k * k));
  for (let i = 0; i < n; i++) {
    const g = grams[regions ? regions.labels[i] : 0];
    for (let ax = 0; ax < 3; ax++) {
      for (let a = 0; a < k; a++) {
        const ua = basis[a * d + 3 * i + ax];
        if (ua === 0) continue;
        for (let b = 0; b < k; b++) g[a * k + b] += ua * basis[b * d + 3 * i + ax];
      }
    }
  }
  let total = 0;
  const energies = grams.map((g) => {
    let e = 0;
    for (let t = 0; t < frames; t++) {
      for (let a = 0; a < k; a++) {
        for (let b = 0; b < k; b++)
          e += coefficients[t * k + a] * g[a * k + b] * coefficients[t * k + b];
      }
    }
    total += e;
    return e;
  });
  const out: RegionSpectrum[] = [];
  const values = new Float64Array(k);
  const vectors = new Float64Array(k * k);
  grams.forEach((g, r) => {
    const share = total > 0 ? energies[r] / total : 0;
    if (share < minShare) return;
    symmetricEigen(Float64Array.from(g), k, values, vectors);
    const y = new Float64Array(frames * k);
    for (let t = 0; t < frames; t++) {
      for (let q = 0; q < k; q++) {
        let s = 0;
        for (let a = 0; a < k; a++) s += vectors[a * k + q] * coefficients[t * k + a];
        y[t * k + q] = Math.sqrt(Math.max(0, values[q])) * s;
      }
    }
    const spectrum = welchPsd(y, frames, k, fps);
    const peaks = spectrumPeaks(spectrum, 0.1).map((p) => ({ region: names[r], ...p }));
    out.push({ region: names[r], energyShare: share, spectrum, peaks });
  });
  return out;
}

/**
 * For each mode with at least `minShare` of the energy, whether its region's spectrum has a peak
 * within `tolerance` (relative) or two bins of its damped frequency.
 */
export function modesMatchPeaks(
  modes: Mode[],
  spectra: RegionSpectrum[],
  fps: number,
  minShare = 0.02,
  tolerance = 0.15,
): { mode: number; frequencyHz: number; peakHz: number | null; agrees: boolean }[] {
  return modes.flatMap((m, i) => {
    if (m.energyShare < minShare || m.flags.length > 0) return [];
    const s = spectra.find((x) => x.region === m.region);
    const fd = m.frequencyHz * Math.sqrt(Math.max(0, 1 - m.dampingRatio ** 2));
    const bin = s ? s.spectrum.frequencies[1] - s.spectrum.frequencies[0] : fps;
    let best: number | null = null;
    for (const p of s?.peaks ?? []) {
      if (best === null || Math.abs(p.frequencyHz - fd) < Math.abs(best - fd)) best = p.frequencyHz;
    }
    const agrees = best !== null && Math.abs(best - fd) <= Math.max(2 * bin, tolerance * fd);
    return [{ mode: i, frequencyHz: fd, peakHz: best, agrees }];
  });
}
