// Directions of tissue motion, region by region. Each region's unposed residual is decomposed
// into its leading components (method of snapshots), those standing above the region's noise are
// screened against the region's pose features (pose-screen.ts), and the ones the pose does not
// explain are the region's tissue directions. Working per region keeps two regions that move
// alike (the two upper arms in a symmetric bounce) on separate directions, each with the full
// signal, where a whole-body decomposition leaves their difference on a weak, noisy direction;
// and the noise in each direction is only that of its region's vertices.
import { leadingSubspace, type SubspaceMethod } from './dynamic-subspace.js';
import { frobeniusSquared } from '../linalg/subspace.js';
import { deriveRegions } from '../rig/regions.js';
import type { Character, Regions } from '../types.js';
import { FEATURES_PER_JOINT } from './pose-features.js';
import { screenComponents } from './pose-screen.js';
import { influencingJoints, jointChildren } from './vertex-groups.js';

/** Options of the direction search. */
export interface RegionDirectionOptions {
  /** Most components examined per region. */
  maxPerRegion?: number;
  /** Most directions kept over all regions (the strongest). */
  maxDirections?: number;
  /** A component counts as signal above noiseFactor/2 times the edge of the noise bulk. */
  noiseFactor?: number;
  /** …and with at least this share of the whole residual's energy. */
  minEnergyShare?: number;
  /** A direction the pose features explain to at least this share is pose-driven. */
  poseExplained?: number;
  method?: SubspaceMethod;
  seed?: number;
}

/**
 * Defaults. 0.95, as a share left unexplained of 5 %: on the demo captures the tissue directions
 * were explained to 0.03–0.46 (their slow sag follows the limbs' angle to gravity) and corrective
 * shapes to 0.97–1; a slow, smooth 3 s test motion leaves a 3 Hz mode explained to 0.86.
 */
export const REGION_DIRECTION_DEFAULTS: Required<RegionDirectionOptions> = {
  maxPerRegion: 16,
  maxDirections: 32,
  noiseFactor: 4,
  minEnergyShare: 1e-4,
  poseExplained: 0.95,
  method: 'auto',
  seed: 1,
};

/** What was found in one region. */
export interface RegionScreenReport {
  region: string;
  /** Components above the noise examined, and the explained share of each screened direction. */
  components: number;
  explained: number[];
  kept: number;
}

/** Tissue directions: K rows of 3N (each within one region, orthonormal) and their regions. */
export interface RegionDirections {
  k: number;
  basis: Float64Array;
  /** Region index of each row. */
  region: Int32Array;
  regions: Regions;
  report: RegionScreenReport[];
  /** No direction passed the screen and the least pose-explained one was kept. */
  fallback: boolean;
}

/** The character's regions, or regions derived from each vertex's dominant joint. */
export function regionsOf(character: Character): Regions {
  return (
    character.regions ??
    deriveRegions(character.skinJoints, character.skinWeights, character.skeleton.names)
  );
}

/**
 * Joints whose pose features screen a region: the influencing joints of its vertices, most
 * widespread first, as many as keep the feature count within a quarter of the frames.
 */
function regionJoints(
  character: Character,
  children: number[][],
  vertices: number[],
  frames: number,
): number[] {
  const count = new Map<number, number>();
  for (const i of vertices)
    for (const j of influencingJoints(character, i, children))
      count.set(j, (count.get(j) ?? 0) + 1);
  const most = Math.max(1, Math.floor(frames / 4 / FEATURES_PER_JOINT));
  return [...count]
    .sort((a, b) => b[1] - a[1] || a[0] - b[0])
    .slice(0, most)
    .map(([j]) => j)
    .sort((a, b) => a - b);
}

/** Tissue directions of `residuals` (T × 3N) with pose `features` (T × J × 9). */
export function regionDirections(
  residuals: Float32Array,
  frames: number,
  character: Character,
  features: Float64Array,
  options: RegionDirectionOptions = {},
): RegionDirections {
  const opts = { ...REGION_DIRECTION_DEFAULTS, ...options };
  const regions = regionsOf(character);
  const n = character.restPositions.length / 3;
  const d = 3 * n;
  const jc = character.skeleton.names.length;
  const children = jointChildren(character.skeleton.parents);
  const total = frobeniusSquared(residuals.subarray(0, frames * d));
  const found: { row: Float64Array; region: number; energy: number }[] = [];
  let leastExplained: {
    row: Float64Array;
    region: number;
    energy: number;
    explained: number;
  } | null = null;
  const report: RegionScreenReport[] = [];
  regions.names.forEach((name, r) => {
    const vertices: number[] = [];
    for (let i = 0; i < n; i++) if (regions.labels[i] === r) vertices.push(i);
    const dr = 3 * vertices.length;
    if (dr === 0) return;
    const x = new Float32Array(frames * dr);
    for (let t = 0; t < frames; t++) {
      vertices.forEach((v, j) => {
        for (let a = 0; a < 3; a++) x[t * dr + 3 * j + a] = residuals[t * d + 3 * v + a];
      });
    }
    const lmax = Math.min(opts.maxPerRegion, frames, dr);
    // A region needs a few components: the randomized path (~6·T·D·(L + 10)) beats the Gram's T²·D.
    const method = opts.method === 'auto' ? 'randomized' : opts.method;
    const sub = leadingSubspace(x, frames, dr, lmax, method, opts.seed);
    const l0 = Math.min(sub.k, sub.spectrum.length);
    // Noise: mean unresolved eigenvalue; white noise fills the Marchenko–Pastur bulk up to
    // (1 + √γ)² times that mean, γ the aspect ratio of the region's snapshot matrix.
    const dims = Math.min(frames, dr);
    let resolved = 0;
    for (let q = 0; q < sub.spectrum.length; q++) resolved += sub.spectrum[q];
    const floor =
      dims > sub.spectrum.length
        ? Math.max(0, sub.totalEnergy - resolved) / (dims - sub.spectrum.length)
        : sub.spectrum[sub.spectrum.length - 1] || 0;
    const edge = (opts.noiseFactor / 2) * (1 + Math.sqrt(dims / Math.max(frames, dr))) ** 2 * floor;
    let signal = 0;
    while (
      signal < l0 &&
      sub.spectrum[signal] > edge &&
      sub.spectrum[signal] > opts.minEnergyShare * total
    )
      signal++;
    const l = signal;
    if (l === 0) return;
    const c = new Float64Array(frames * l);
    for (let t = 0; t < frames; t++)
      for (let q = 0; q < l; q++) c[t * l + q] = sub.coefficients[t * sub.k + q];
    const joints = regionJoints(character, children, vertices, frames);
    const p = joints.length * FEATURES_PER_JOINT;
    const fx = new Float64Array(frames * p);
    for (let t = 0; t < frames; t++) {
      joints.forEach((j, s) => {
        for (let f = 0; f < FEATURES_PER_JOINT; f++)
          fx[t * p + s * FEATURES_PER_JOINT + f] = features[(t * jc + j) * FEATURES_PER_JOINT + f];
      });
    }
    const screen = screenComponents(c, frames, l, fx, p);
    const pattern = (i: number): Float64Array => {
      const row = new Float64Array(d);
      vertices.forEach((v, j) => {
        for (let a = 0; a < 3; a++) {
          let s = 0;
          for (let q = 0; q < l; q++)
            s += screen.patterns[i * l + q] * sub.basis[q * dr + 3 * j + a];
          row[3 * v + a] = s;
        }
      });
      return row;
    };
    let kept = 0;
    for (let i = 0; i < l; i++) {
      if (screen.explained[i] >= opts.poseExplained) continue;
      kept++;
      found.push({ row: pattern(i), region: r, energy: screen.energy[i] });
    }
    if (!leastExplained || screen.explained[0] < leastExplained.explained) {
      const explained = screen.explained[0];
      leastExplained = { row: pattern(0), region: r, energy: screen.energy[0], explained };
    }
    report.push({ region: name, components: l, explained: Array.from(screen.explained), kept });
  });
  // Motion beyond skinning that the pose explains everywhere: poses estimated from the mesh can
  // follow the flesh and take its motion with them. The least explained direction is kept, so the
  // capture still gives a profile (with a small dynamic part) rather than none.
  const fallback = found.length === 0 && leastExplained !== null;
  if (fallback) found.push(leastExplained!);
  // The strongest directions over all regions, then orthonormal within each region.
  const chosen = found
    .map((f, i) => ({ ...f, i }))
    .sort((a, b) => b.energy - a.energy || a.i - b.i)
    .slice(0, opts.maxDirections)
    .sort((a, b) => a.region - b.region || b.energy - a.energy || a.i - b.i);
  const k = chosen.length;
  const basis = new Float64Array(k * d);
  chosen.forEach((f, q) => {
    const row = basis.subarray(q * d, (q + 1) * d);
    row.set(f.row);
    for (let p2 = q - 1; p2 >= 0 && chosen[p2].region === f.region; p2--) {
      const other = basis.subarray(p2 * d, (p2 + 1) * d);
      let dot = 0;
      for (let c = 0; c < d; c++) dot += row[c] * other[c];
      for (let c = 0; c < d; c++) row[c] -= dot * other[c];
    }
    let norm = 0;
    for (let c = 0; c < d; c++) norm += row[c] * row[c];
    norm = Math.sqrt(norm) || 1;
    for (let c = 0; c < d; c++) row[c] /= norm;
  });
  return { k, basis, region: Int32Array.from(chosen, (f) => f.region), regions, report, fallback };
}
