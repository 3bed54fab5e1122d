// Modes of identified dynamics: one per complex pole pair (or real pole), with natural frequency,
// damping ratio, the region whose vertices move most in its shape, and its share of the dynamic
// energy. Shares come from the modal decomposition of the measured trajectory: with the state
// x_t = [c_t; c_{t−1}] = V η_t, each mode's contribution to c_t is its columns of V times its η.
import { Matrix, inverse } from 'ml-matrix';
import type { LinearDynamics, Mode, ModeFlag, Regions } from '../types.js';
import { companionEigen, poleToModal } from './poles.js';

/** Options for naming modes. */
export interface ModesOptions {
  /** A mode whose damped frequency exceeds this fraction of the Nyquist frequency is flagged. */
  nyquistFraction?: number;
}

/** Default: flag above 80 % of Nyquist (common practice margin against aliasing). */
export const MODES_DEFAULTS: Required<ModesOptions> = { nyquistFraction: 0.8 };

/** Pole indices grouped per mode: a complex pair counts once (its +Im pole first). */
function groupsOf(zIm: Float64Array): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < zIm.length; i++) {
    if (zIm[i] !== 0 && i + 1 < zIm.length && zIm[i + 1] === -zIm[i]) {
      out.push([i, i + 1]);
      i++;
    } else out.push([i]);
  }
  return out;
}

/**
 * Modes of `dynamics` at `fps`, sorted by natural frequency. `coefficients` (T×K) is the measured
 * trajectory used for energy shares; `basis` (K rows of 3N) and `regions` name each mode's region.
 */
export function identifyModes(
  dynamics: LinearDynamics,
  fps: number,
  coefficients: Float64Array,
  frames: number,
  basis: Float32Array | Float64Array,
  regions: Regions | null,
  options: ModesOptions = {},
): Mode[] {
  const opts = { ...MODES_DEFAULTS, ...options };
  const { k } = dynamics;
  if (k === 0) return [];
  const n = 2 * k;
  const eig = companionEigen(dynamics.a1, dynamics.a2, k);
  const v = new Matrix(n, n);
  for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) v.set(r, c, eig.vectors[r * n + c]);
  const vInv = inverse(v);
  const groups = groupsOf(eig.zIm);
  const d = basis.length / k;
  const nv = d / 3;
  const regionCount = regions ? regions.names.length : 0;
  const modes: Mode[] = [];
  const energies: number[] = [];
  const x = new Float64Array(n);
  for (const cols of groups) {
    // η for this mode's columns over the trajectory, then its contribution to c_t (top half).
    const m2 = new Float64Array(cols.length * cols.length); // Σ_t η ηᵀ
    let energy = 0;
    for (let t = 1; t < frames; t++) {
      x.set(coefficients.subarray(t * k, (t + 1) * k), 0);
      x.set(coefficients.subarray((t - 1) * k, t * k), k);
      const eta = cols.map((c) => {
        let s = 0;
        for (let j = 0; j < n; j++) s += vInv.get(c, j) * x[j];
        return s;
      });
      for (let a = 0; a < cols.length; a++) {
        for (let b = 0; b < cols.length; b++) m2[a * cols.length + b] += eta[a] * eta[b];
      }
      for (let q = 0; q < k; q++) {
        let s = 0;
        for (let a = 0; a < cols.length; a++) s += v.get(q, cols[a]) * eta[a];
        energy += s * s;
      }
    }
    // Region: per-vertex energy of the mode's shape g = basisᵀ V_top[:, cols] under Σ η ηᵀ.
    const regionEnergy = new Float64Array(Math.max(1, regionCount));
    for (let i = 0; i < nv; i++) {
      let e = 0;
      for (let ax = 0; ax < 3; ax++) {
        const g = cols.map((c) => {
          let s = 0;
          for (let q = 0; q < k; q++) s += basis[q * d + 3 * i + ax] * v.get(q, c);
          return s;
        });
        for (let a = 0; a < cols.length; a++) {
          for (let b = 0; b < cols.length; b++) e += g[a] * m2[a * cols.length + b] * g[b];
        }
      }
      regionEnergy[regions ? regions.labels[i] : 0] += e;
    }
    let best = 0;
    for (let r = 1; r < regionEnergy.length; r++)
      if (regionEnergy[r] > regionEnergy[best]) best = r;
    const re = eig.zRe[cols[0]];
    const im = eig.zIm[cols[0]];
    const { frequencyHz, dampingRatio } = poleToModal(re, im, fps);
    const flags: ModeFlag[] = [];
    if (im === 0 && re < 0) flags.push('real-negative-pole');
    if (im === 0 && re >= 0) flags.push('overdamped');
    const dampedHz = (Math.abs(Math.atan2(im, re)) * fps) / (2 * Math.PI);
    if (dampedHz > opts.nyquistFraction * (fps / 2)) flags.push('near-nyquist');
    modes.push({
      frequencyHz,
      dampingRatio,
      region: regions ? (regions.names[best] ?? 'body') : 'body',
      energyShare: 0,
      flags,
    });
    energies.push(energy);
  }
  const total = energies.reduce((a, b) => a + b, 0) || 1;
  modes.forEach((m, i) => (m.energyShare = energies[i] / total));
  return modes
    .map((m, i) => ({ m, i }))
    .sort((a, b) => a.m.frequencyHz - b.m.frequencyHz || a.i - b.i)
    .map(({ m }) => m);
}
