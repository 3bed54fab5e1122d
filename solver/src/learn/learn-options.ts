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
  /**
   * Low-pass cut-off (Hz) of the pose-driven fit; at or above the capture's Nyquist frequency
   * (the default, Infinity) the fit sees the full band. The tissue directions are projected out
   * before the fit, so no filter is needed to keep oscillation out of the correctives.
   */
  cutoffHz?: number;
  /**
   * Not used any more: the tissue directions are those above each region's noise (noiseFactor,
   * minEnergyShare) that the pose does not explain. Accepted so that existing callers still work.
   * @deprecated
   */
  varianceTarget?: number;
  /** A component counts as signal above noiseFactor/2 times the edge of its region's noise bulk. */
  noiseFactor?: number;
  /** …and with at least this share of the unposed residual's energy. */
  minEnergyShare?: number;
  /** A region direction the pose features explain to at least this share is pose-driven. */
  poseExplained?: number;
  /** Share of frames at the end held out for the fit report. */
  heldOutFraction?: number;
  /** Savitzky–Golay half-width and degree of the driver-input derivatives. */
  derivativeHalfWidth?: number;
  derivativeDegree?: number;
  /** Most driver joints per region. */
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
 * No low-pass: on the noisy demo capture the pose-driven part's relative error is 0.047
 * unfiltered and with cut-offs of 15 and 3 Hz, 0.065 at 1.5 Hz and 0.10 at 0.8 Hz.
 */
export const LEARN_DEFAULTS: Required<LearnOptions> = {
  clip: null,
  name: null,
  maxModes: 32,
  cutoffHz: Infinity,
  varianceTarget: 0.95,
  noiseFactor: 4,
  minEnergyShare: 1e-4,
  poseExplained: 0.9,
  heldOutFraction: 0.2,
  derivativeHalfWidth: 1,
  derivativeDegree: 2,
  maxDrivers: 10,
  subspaceMethod: 'auto',
  seed: 1,
  minSeconds: 2,
  onProgress: null,
};
