// Learn: character + capture → tissue profile. validate → poses → unpose → tissue directions per
// region → pose-driven correctives fitted with those directions projected out → dynamic basis
// (orthogonal to the corrective span) → dynamics per region (drivers, signals, ARX, output-error
// refinement, stability) → modes → spectra → fit report.
// Separation approaches tried, relative error of the pose-driven part on the synthetic demo
// captures (noise-free 10 s / noisy 8 s): a pose fit on the 0.8 Hz low-passed residual with every
// joint's specific force competing and the full-band fit where it explains a vertex, 0.10 / 0.27
// (the tissue's slow sag under gravity follows the limbs' pose and leaked into the correctives);
// alternating that fit with dynamics identified from it and run from the inputs, 0.18 / 0.36 after
// three passes (the dynamics learned from the leaky residual carried the leak back); projecting
// out a whole-body dynamic basis, 0.05 / 0.13 after four passes (the basis took in corrective
// shapes); per-region directions screened against the pose, 0.0004 / 0.05 in one pass; with root
// joints and round-off features left out of the correctives, 0.00006 / 0.047.
import { identifyModes } from '../dynamics/modes.js';
import { arxOfDynamics } from '../dynamics/simulate.js';
import { SolverInputError } from '../errors.js';
import { validateCapture } from '../io/validate-capture.js';
import { profileId } from '../io/profile-format.js';
import { multiplyByRows } from '../linalg/gram-kernel.js';
import { frobeniusSquared } from '../linalg/subspace.js';
import { estimatePoses } from '../rig/pose-estimate.js';
import { unpose } from '../rig/unpose.js';
import type { Capture, Character, TissueProfile } from '../types.js';
import { checkFinite, checkMoves, clipForCapture } from './check-capture.js';
import { correctiveSpan } from './corrective-span.js';
import { LEARN_DEFAULTS, type LearnOptions, type LearnStage } from './learn-options.js';

export { LEARN_DEFAULTS, type LearnOptions, type LearnStage };
import { basisFromDirections, type DynamicSubspace } from './dynamic-subspace.js';
import { fitReport } from './fit-report.js';
import { FEATURES_PER_JOINT, poseFeatures } from './pose-features.js';
import { modesMatchPeaks, regionSpectra, type RegionSpectrum } from './region-spectra.js';
import { identifyRegions } from './identify-regions.js';
import { regionDirections } from './region-directions.js';
import { separatePoseDriven } from './separate.js';

/** A learned profile with what was measured on the way. */
export interface LearnResult {
  profile: TissueProfile;
  /** Wall time per stage (ms). */
  timings: Record<LearnStage, number>;
  /** Where the skeleton motion came from. */
  clipSource: 'given' | 'capture' | 'estimated';
  /** Per region spectra, and whether each strong mode has a spectrum peak near it. */
  spectra: RegionSpectrum[];
  peakAgreement: ReturnType<typeof modesMatchPeaks>;
  /** Pose-driven displacement (T × 3N) of the final separation. */
  poseDisplacement: Float32Array;
  /** Dynamic basis and coefficients (before identification). */
  subspace: DynamicSubspace;
  /** Orthonormal rows spanning the corrective displacement the basis was made orthogonal to. */
  correctiveSpan: Float64Array;
}

const STAGE_WEIGHT: Record<LearnStage, number> = {
  validate: 0.02,
  poses: 0.08,
  unpose: 0.05,
  separate: 0.4,
  subspace: 0.3,
  dynamics: 0.1,
  modes: 0.02,
  spectra: 0.01,
  report: 0.02,
};

/** Learns a tissue profile from `capture` of `character`. Throws SolverInputError on bad input. */
export function learnProfile(
  character: Character,
  capture: Capture,
  options: LearnOptions = {},
): LearnResult {
  const opts = { ...LEARN_DEFAULTS, ...options };
  const timings = Object.fromEntries(Object.keys(STAGE_WEIGHT).map((s) => [s, 0])) as Record<
    LearnStage,
    number
  >;
  let done = 0;
  const stage = <R>(name: LearnStage, share: number, fn: () => R): R => {
    const t0 = performance.now();
    const r = fn();
    timings[name] += performance.now() - t0;
    done += STAGE_WEIGHT[name] * share;
    opts.onProgress?.(name, Math.min(1, done));
    return r;
  };
  const T = capture.frameCount;
  const n = character.restPositions.length / 3;
  const d = 3 * n;
  const fps = capture.fps;
  stage('validate', 1, () => {
    validateCapture(character, capture, { minSeconds: opts.minSeconds });
    checkFinite(capture);
    checkMoves(capture);
  });
  const clipSource = opts.clip ? 'given' : capture.clip ? 'capture' : 'estimated';
  const clip = stage('poses', 1, () =>
    clipForCapture(opts.clip ?? capture.clip ?? estimatePoses(character, capture).clip, capture),
  );
  const residuals = stage('unpose', 1, () => unpose(character, capture, clip).residuals);
  const features = poseFeatures(character.skeleton, clip).subarray(
    0,
    T * character.skeleton.names.length * FEATURES_PER_JOINT,
  );
  const trainEnd = Math.max(4, Math.round(T * (1 - opts.heldOutFraction)));
  const sg = { halfWidth: opts.derivativeHalfWidth, degree: opts.derivativeDegree };
  // Tissue directions per region, found in the residual itself; the pose-driven fit then sees the
  // residual with them projected out, so tissue motion (its slow sag included) cannot leak into
  // the correctives, and the correctives' own shapes never enter the tissue directions.
  const directions = stage('subspace', 0.5, () =>
    regionDirections(residuals, T, character, features, {
      maxDirections: opts.maxModes,
      noiseFactor: opts.noiseFactor,
      minEnergyShare: opts.minEnergyShare,
      poseExplained: opts.poseExplained,
      method: opts.subspaceMethod,
      seed: opts.seed,
    }),
  );
  const separation = stage('separate', 1, () =>
    separatePoseDriven(
      withoutDirections(residuals, T, d, directions.basis, directions.k),
      T,
      character,
      features,
      fps,
      { cutoffHz: opts.cutoffHz, perGroupRidge: true },
    ),
  );
  const dynamic = new Float32Array(T * d);
  for (let i = 0; i < dynamic.length; i++)
    dynamic[i] = residuals[i] - separation.poseDisplacement[i];
  // Corrective span: the dominant directions of the pose-driven displacement, keeping only those
  // along which the pose-driven part moves more than the dynamic residual does (a direction the
  // dynamics dominate is tissue motion the correctives took up, not a corrective shape).
  const span = stage('subspace', 0.25, () =>
    correctiveSpan(separation.poseDisplacement, dynamic, T, d, opts),
  );
  const sub = stage('subspace', 0.25, () =>
    basisFromDirections(dynamic, T, d, directions.basis, directions.region, span.basis, span.k),
  );
  if (sub.k === 0) {
    throw new SolverInputError(
      'NO_MOTION',
      'the capture shows no soft-tissue motion beyond skinning and correctives',
      { item: capture.name },
    );
  }
  const id = stage('dynamics', 1, () =>
    identifyRegions(
      sub.coefficients,
      T,
      sub.basis,
      sub.region as Int32Array,
      character,
      clip,
      trainEnd,
      { maxDrivers: opts.maxDrivers, sg },
    ),
  );
  const drivers = id.drivers;
  const modes = stage('modes', 1, () =>
    identifyModes(id.dynamics, fps, sub.coefficients, T, sub.basis, directions.regions),
  );
  const spectra = stage('spectra', 1, () =>
    regionSpectra(sub.basis, sub.k, sub.coefficients, T, fps, directions.regions),
  );
  const total = frobeniusSquared(residuals) || 1;
  let poseErr = 0;
  for (let i = 0; i < residuals.length; i++)
    poseErr += (residuals[i] - separation.poseDisplacement[i]) ** 2;
  const report = stage('report', 1, () =>
    fitReport({
      model: arxOfDynamics(id.dynamics),
      coefficients: sub.coefficients,
      inputs: id.scaledInputs,
      frames: T,
      trainEnd,
      poseShare: Math.max(0, 1 - poseErr / total),
      dynamicShare: frobeniusSquared(sub.coefficients) / total,
      spectrumPeaks: spectra.flatMap((s) => s.peaks.slice(0, 3)),
    }),
  );
  if (done < 1) opts.onProgress?.('report', 1);
  const profile: TissueProfile = {
    formatVersion: 1,
    id: '',
    name: opts.name ?? capture.name,
    fps,
    settings: {
      cutoffHz: Number.isFinite(opts.cutoffHz) ? opts.cutoffHz : 'off',
      maxModes: opts.maxModes,
      noiseFactor: opts.noiseFactor,
      minEnergyShare: opts.minEnergyShare,
      poseExplained: opts.poseExplained,
      heldOutFraction: opts.heldOutFraction,
      derivativeHalfWidth: opts.derivativeHalfWidth,
      derivativeDegree: opts.derivativeDegree,
      seed: opts.seed,
      basisSize: sub.k,
      correctiveSpanRank: span.k,
      inputRidge: id.fits.map((f) => f.lambda).join(' '),
      clipSource,
    },
    source: character,
    drivers,
    basis: Float32Array.from(sub.basis),
    singularValues: sub.singularValues,
    correctives: separation.correctives,
    dynamics: id.dynamics,
    modes,
    fitReport: report,
  };
  profile.id = profileId(profile);
  return {
    profile,
    timings,
    clipSource,
    spectra,
    peakAgreement: modesMatchPeaks(modes, spectra, fps),
    poseDisplacement: separation.poseDisplacement,
    subspace: sub,
    correctiveSpan: span.basis,
  };
}

/** The residual (T×D) with its components along the orthonormal `rows` (K×D) removed. */
function withoutDirections(
  residuals: Float32Array,
  frames: number,
  d: number,
  rows: Float64Array,
  k: number,
): Float32Array {
  const out = Float32Array.from(residuals);
  if (k === 0) return out;
  const along = multiplyByRows(residuals, frames, d, rows, k);
  for (let t = 0; t < frames; t++) {
    for (let q = 0; q < k; q++) {
      const w = along[t * k + q];
      for (let c = 0; c < d; c++) out[t * d + c] -= w * rows[q * d + c];
    }
  }
  return out;
}
