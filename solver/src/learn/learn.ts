// Learn: character + capture → tissue profile. validate → poses → unpose → separate pose-driven
// from dynamic → dynamic basis → drivers → ARX dynamics → modes → spectra → fit report.
// The pose-driven fit on the low-passed residual would also take up the low-frequency part of the
// tissue's own response (sag under gravity, slow sway), which is correlated with pose. Three
// measures keep it out (relative error of the pose-driven part on the synthetic demo capture,
// noise-free, 10 s, 0.74 with none of them): (1) every joint's specific force and its first two
// derivatives compete with the pose features in the fit and are then dropped, since they carry
// the quasi-static tissue response; (2) the cut-off is 0.8 Hz, half the lowest expected tissue
// mode (1.5 Hz), with the features filtered alike so the pose relation survives the filter;
// (3) where the full-band pose fit leaves under 5 % of a vertex's residual there is no tissue
// motion to protect, so the full-band fit is kept (a low-pass would blunt fast correctives).
// Together: 0.10 (0.27 on the noisy 8 s capture, from 20). Optional refinement passes identify
// dynamics from the current dynamic residual, run them freely from the driver inputs, and refit
// the correctives to the residual minus that input-driven motion (off by default: with drivers
// chosen automatically it can diverge).
import { driverInputs } from '../dynamics/driver-inputs.js';
import { identifyDynamics } from '../dynamics/identify.js';
import { identifyModes } from '../dynamics/modes.js';
import { arxOfDynamics, freeRun } from '../dynamics/simulate.js';
import { SolverInputError } from '../errors.js';
import { validateCapture } from '../io/validate-capture.js';
import { profileId } from '../io/profile-format.js';
import { frobeniusSquared } from '../linalg/subspace.js';
import { estimatePoses } from '../rig/pose-estimate.js';
import { unpose } from '../rig/unpose.js';
import type { Capture, Character, Driver, TissueProfile } from '../types.js';
import { checkFinite, checkMoves, clipForCapture } from './check-capture.js';
import { correctiveSpan } from './corrective-span.js';
import { LEARN_DEFAULTS, type LearnOptions, type LearnStage } from './learn-options.js';

export { LEARN_DEFAULTS, type LearnOptions, type LearnStage };
import { dynamicSubspace, type DynamicSubspace } from './dynamic-subspace.js';
import { fitReport } from './fit-report.js';
import { FEATURES_PER_JOINT, poseFeatures } from './pose-features.js';
import { modesMatchPeaks, regionSpectra, type RegionSpectrum } from './region-spectra.js';
import { separatePoseDriven, type Separation } from './separate.js';
import { preferFullBand } from './full-band.js';
import { separationSignals } from './separation-signals.js';
import { selectDrivers } from './select-drivers.js';

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
  const rankOptions = {
    varianceTarget: opts.varianceTarget,
    maxRank: opts.maxModes,
    noiseFactor: opts.noiseFactor,
    minEnergyShare: opts.minEnergyShare,
  };
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
  const passes = opts.refinementPasses + 1;
  const sg = { halfWidth: opts.derivativeHalfWidth, degree: opts.derivativeDegree };
  const competing = opts.separationInputs
    ? separationSignals(character.skeleton, clip, opts.separationDerivatives, sg)
    : null;
  let target = residuals;
  let sep: Separation | null = null;
  let drivers: Driver[] = [];
  let inputs: ReturnType<typeof driverInputs> | null = null;
  const dynamic = new Float32Array(T * d);
  for (let pass = 0; pass < passes; pass++) {
    const s = stage('separate', 1 / passes, () =>
      separatePoseDriven(target, T, character, features, fps, {
        cutoffHz: opts.cutoffHz,
        competing,
      }),
    );
    sep = s;
    for (let i = 0; i < dynamic.length; i++) dynamic[i] = residuals[i] - s.poseDisplacement[i];
    if (pass === passes - 1) break;
    const sub = stage('subspace', 0.5 / passes, () =>
      dynamicSubspace(
        Float32Array.from(dynamic),
        T,
        d,
        new Float64Array(0),
        0,
        rankOptions,
        opts.subspaceMethod,
        opts.seed,
      ),
    );
    if (sub.k === 0) break;
    stage('dynamics', 0.5 / passes, () => {
      if (!inputs) {
        drivers = selectDrivers(character, sub.basis, sub.k, { maxDrivers: opts.maxDrivers });
        inputs = driverInputs(character.skeleton, clip, drivers, sg);
      }
      const id = identifyDynamics(
        sub.coefficients,
        inputs.values,
        inputs.rest,
        T,
        sub.k,
        inputs.m,
        trainEnd,
      );
      const sim = new Float64Array(T * sub.k);
      sim.set(sub.coefficients.subarray(0, 2 * sub.k));
      freeRun(
        arxOfDynamics(id.dynamics),
        id.scaledInputs,
        2,
        T,
        sub.coefficients.slice(0, 2 * sub.k),
        sim,
      );
      // Next target: the residual minus the input-driven dynamic motion.
      const next = Float32Array.from(residuals);
      for (let t = 0; t < T; t++) {
        for (let q = 0; q < sub.k; q++) {
          const w = sim[t * sub.k + q];
          for (let c = 0; c < d; c++) next[t * d + c] -= w * sub.basis[q * d + c];
        }
      }
      target = next;
    });
  }
  let separation = sep as Separation;
  if (opts.fullBandUnexplained > 0) {
    const full = stage('separate', 0, () =>
      separatePoseDriven(residuals, T, character, features, fps, {
        cutoffHz: fps,
        competing: null,
      }),
    );
    separation = preferFullBand(
      separation,
      full,
      residuals,
      T,
      opts.fullBandUnexplained,
    ).separation;
    for (let i = 0; i < dynamic.length; i++)
      dynamic[i] = residuals[i] - separation.poseDisplacement[i];
  }
  // Corrective span: the dominant directions of the pose-driven displacement, keeping only those
  // along which the pose-driven part moves more than the dynamic residual does (a direction the
  // dynamics dominate is tissue motion the correctives took up, not a corrective shape).
  const span = stage('subspace', 0.25, () =>
    correctiveSpan(separation.poseDisplacement, dynamic, T, d, opts),
  );
  const sub = stage('subspace', 0.25, () =>
    dynamicSubspace(dynamic, T, d, span.basis, span.k, rankOptions, opts.subspaceMethod, opts.seed),
  );
  if (sub.k === 0) {
    throw new SolverInputError(
      'NO_MOTION',
      'the capture shows no soft-tissue motion beyond skinning and correctives',
      { item: capture.name },
    );
  }
  if (!inputs || drivers.length === 0) {
    drivers = selectDrivers(character, sub.basis, sub.k, { maxDrivers: opts.maxDrivers });
    inputs = driverInputs(character.skeleton, clip, drivers, sg);
  }
  const inp = inputs as ReturnType<typeof driverInputs>;
  const id = stage('dynamics', 1, () =>
    identifyDynamics(sub.coefficients, inp.values, inp.rest, T, sub.k, inp.m, trainEnd),
  );
  const modes = stage('modes', 1, () =>
    identifyModes(id.dynamics, fps, sub.coefficients, T, sub.basis, character.regions),
  );
  const spectra = stage('spectra', 1, () =>
    regionSpectra(sub.basis, sub.k, sub.coefficients, T, fps, character.regions),
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
      cutoffHz: opts.cutoffHz,
      maxModes: opts.maxModes,
      varianceTarget: opts.varianceTarget,
      noiseFactor: opts.noiseFactor,
      minEnergyShare: opts.minEnergyShare,
      heldOutFraction: opts.heldOutFraction,
      refinementPasses: opts.refinementPasses,
      separationInputs: opts.separationInputs,
      separationDerivatives: opts.separationDerivatives,
      fullBandUnexplained: opts.fullBandUnexplained,
      derivativeHalfWidth: opts.derivativeHalfWidth,
      derivativeDegree: opts.derivativeDegree,
      seed: opts.seed,
      basisSize: sub.k,
      correctiveSpanRank: span.k,
      inputRidge: id.lambda,
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
