// Options of learning and their defaults.
import type { Clip } from '../types.js';
import type { SubspaceMethod } from './dynamic-subspace.js';

/** Stages reported to `onProgress`, in order. */
export type LearnStage =
  | 'validate'
  | 'poses'
  | 'unpose'
  | 'separate'
  | 'subspace'
  | 'dynamics'
  | 'modes'
  | 'spectra'
  | 'report';

/** Options of a learn. */
export interface LearnOptions {
  /** Skeleton motion to unpose with; else the capture's own clip; else estimated from the mesh. */
  clip?: Clip | null;
  /** Profile name (default: the capture's). */
  name?: string | null;
  /** Largest number of basis directions (K cap). */
  maxModes?: number;
  /** Low-pass cut-off (Hz) of the pose-driven fit (default half the lowest expected mode). */
  cutoffHz?: number;
  /** Variance target of the rank rule, and its noise tests (see linalg/rank-rule.ts). */
  varianceTarget?: number;
  noiseFactor?: number;
  minEnergyShare?: number;
  /** Share of frames at the end held out for the fit report. */
  heldOutFraction?: number;
  /** Refinement passes of the pose/dynamic separation (0: the plain low-pass fit). */
  refinementPasses?: number;
  /**
   * Fit the correctives jointly with every joint's specific force (minus its rest value), which
   * carries the tissue's quasi-static response, and keep only the pose-feature part.
   */
  separationInputs?: boolean;
  /** Derivatives of the specific force added to those signals (0–2). */
  separationDerivatives?: number;
  /** Keep the full-band corrective fit where it leaves under this share of the residual (0: off). */
  fullBandUnexplained?: number;
  /** Savitzky–Golay half-width and degree of the driver-input derivatives. */
  derivativeHalfWidth?: number;
  derivativeDegree?: number;
  /** Most driver joints. */
  maxDrivers?: number;
  /** Subspace algorithm. */
  subspaceMethod?: SubspaceMethod;
  /** Seed of every randomized step. */
  seed?: number;
  /** Shortest accepted capture (s). */
  minSeconds?: number;
  /** Called at each stage with the fraction of the whole learn done (0–1). */
  onProgress?: ((stage: LearnStage, fraction: number) => void) | null;
}

/**
 * Defaults. The 3-sample second-difference window (half-width 1, degree 2) keeps landing impacts
 * intact (wider windows blunted them by 5–8 % on the demo captures); widen it for noisy poses.
 */
export const LEARN_DEFAULTS: Required<LearnOptions> = {
  clip: null,
  name: null,
  maxModes: 32,
  cutoffHz: 0.8,
  varianceTarget: 0.95,
  noiseFactor: 4,
  minEnergyShare: 1e-4,
  heldOutFraction: 0.2,
  refinementPasses: 0,
  separationInputs: true,
  separationDerivatives: 2,
  fullBandUnexplained: 0.05,
  derivativeHalfWidth: 1,
  derivativeDegree: 2,
  maxDrivers: 10,
  subspaceMethod: 'auto',
  seed: 1,
  minSeconds: 2,
  onProgress: null,
};
