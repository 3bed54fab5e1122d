// Figures of a take: its modes after the controls, and the size of its dynamic displacement.
import type { Mode, ModeFlag, TakeMetrics } from '../types.js';
import { poleGroups } from './modal-form.js';
import { poleToModal } from '../dynamics/poles.js';

/** Fraction of the Nyquist frequency from which a mode is flagged (our choice). */
export const NEAR_NYQUIST_FRACTION = 0.8;

/**
 * Modes of the edited poles, in the profile's order (poles no profile mode describes follow),
 * with region and energy share from the profile and flags against the shot's Nyquist frequency.
 */
export function takeModes(
  profileModes: Mode[],
  modeOf: Int32Array,
  zRe: Float64Array,
  zIm: Float64Array,
  simFps: number,
  shotFps: number,
): Mode[] {
  const nyquist = Math.min(simFps, shotFps) / 2;
  const matched: (Mode | null)[] = profileModes.map(() => null);
  const extra: Mode[] = [];
  for (const g of poleGroups(zIm)) {
    const { frequencyHz, dampingRatio } = poleToModal(zRe[g], zIm[g], simFps);
    const flags: ModeFlag[] = [];
    if (zIm[g] === 0 && zRe[g] < 0) flags.push('real-negative-pole');
    if (zIm[g] === 0 && zRe[g] >= 0) flags.push('overdamped');
    if (frequencyHz >= NEAR_NYQUIST_FRACTION * nyquist) flags.push('near-nyquist');
    const m = modeOf[g];
    const base = m >= 0 ? profileModes[m] : null;
    const mode: Mode = {
      frequencyHz,
      dampingRatio,
      region: base?.region ?? '',
      energyShare: base?.energyShare ?? 0,
      flags,
    };
    if (base && !matched[m]) matched[m] = mode;
    else extra.push(mode);
  }
  return [...matched.filter((x): x is Mode => x !== null), ...extra];
}

/** Vertex-frame-mode products above which the peak is searched on candidate vertices only. */
export const EXACT_PEAK_WORK = 2e8;
/** Candidate vertices per mode: those where the mode's own displacement is largest. */
export const PEAK_CANDIDATES_PER_MODE = 24;

/**
 * Peak and RMS displacement of basis × weights over the shot, and the largest pole magnitude.
 * The RMS is exact (through the K×K Gram matrix). The peak is exact on small takes; on large
 * ones it is taken over the vertices where some mode peaks (24 per mode), which is where a
 * superposition of localised modes peaks, at a small fraction of the 3N·K·T work.
 */
export function takeMetrics(
  basis: Float32Array,
  weights: Float32Array,
  k: number,
  zRe: Float64Array,
  zIm: Float64Array,
): Omit<TakeMetrics, 'lengthRatio' | 'frequencyFactor' | 'transfer'> {
  const n3 = basis.length / k;
  const frames = weights.length / k;
  const candidates = peakCandidates(basis, k, frames);
  // Gram matrix DᵀD gives Σ_i |D_i w|² = wᵀ G w without touching vertices per frame.
  const gram = new Float64Array(k * k);
  for (let a = 0; a < k; a++) {
    for (let b = a; b < k; b++) {
      let s = 0;
      for (let i = 0; i < n3; i++) s += basis[a * n3 + i] * basis[b * n3 + i];
      gram[a * k + b] = s;
      gram[b * k + a] = s;
    }
  }
  // Candidate rows gathered vertex-major so the per-frame loop runs over contiguous memory.
  const rows = new Float64Array(candidates.length * 3 * k);
  candidates.forEach((v, j) => {
    for (let a = 0; a < 3; a++)
      for (let c = 0; c < k; c++) rows[(3 * j + a) * k + c] = basis[c * n3 + 3 * v + a];
  });
  let peak = 0;
  let sum = 0;
  for (let f = 0; f < frames; f++) {
    const w = f * k;
    for (let j = 0; j < candidates.length; j++) {
      let m = 0;
      for (let a = 0; a < 3; a++) {
        const ro = (3 * j + a) * k;
        let d = 0;
        for (let c = 0; c < k; c++) d += rows[ro + c] * weights[w + c];
        m += d * d;
      }
      if (m > peak) peak = m;
    }
    for (let a = 0; a < k; a++) {
      let s = 0;
      for (let b = 0; b < k; b++) s += gram[a * k + b] * weights[w + b];
      sum += weights[w + a] * s;
    }
  }
  peak = Math.sqrt(peak);
  let maxPole = 0;
  for (let i = 0; i < zRe.length; i++) maxPole = Math.max(maxPole, Math.hypot(zRe[i], zIm[i]));
  return {
    peakDisplacement: peak,
    rmsDisplacement: Math.sqrt(Math.max(0, sum) / Math.max(1, frames * (n3 / 3))),
    maxPoleMagnitude: maxPole,
  };
}

/** Every vertex when the exact search is affordable, else the top vertices of each mode. */
function peakCandidates(basis: Float32Array, k: number, frames: number): Uint32Array {
  const n = basis.length / k / 3;
  if (n * k * frames <= EXACT_PEAK_WORK) return Uint32Array.from({ length: n }, (_, i) => i);
  const chosen = new Set<number>();
  const size = new Float64Array(n);
  const sorted = new Float64Array(n);
  for (let c = 0; c < k; c++) {
    const o = c * 3 * n;
    for (let i = 0; i < n; i++)
      size[i] = basis[o + 3 * i] ** 2 + basis[o + 3 * i + 1] ** 2 + basis[o + 3 * i + 2] ** 2;
    sorted.set(size);
    sorted.sort(); // native numeric sort; the threshold is the per-mode top-count-th value
    const threshold = sorted[Math.max(0, n - PEAK_CANDIDATES_PER_MODE)];
    let taken = 0;
    for (let i = 0; i < n && taken < PEAK_CANDIDATES_PER_MODE; i++) {
      if (size[i] >= threshold && size[i] > 0) {
        chosen.add(i);
        taken++;
      }
    }
  }
  return Uint32Array.from(chosen).sort();
}
