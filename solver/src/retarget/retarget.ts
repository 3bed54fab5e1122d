// Retarget: a tissue profile, a target character and a clip → a take. Maps drivers and joints,
// carries the basis onto the target, computes the drive from the clip at the profile's rate, and
// runs the live-tuning simulation with the requested controls (so a tuned take equals a bake).
import { driverInputs } from '../dynamics/driver-inputs.js';
import type { SavitzkyGolayOptions } from '../dynamics/savitzky-golay.js';
import { createLiveTuner } from '../live/live-tune.js';
import { mapDrivers, mapJoints, type DriverMapping, type JointMapping } from '../rig/joint-map.js';
import type {
  Character,
  Clip,
  Controls,
  LiveTuneData,
  ModalForm,
  Take,
  TissueProfile,
} from '../types.js';
import { checkCharacter, checkClip, checkProfile } from './check-inputs.js';
import { resolveControls } from './controls.js';
import { modalForm } from './modal-form.js';
import { createPoleEditor, editPoles } from './pole-edit.js';
import { vertexGainField } from './region-gains.js';
import { lengthRatio, sizeFrequencyFactor } from './scaling.js';
import { clipFrameRange, simulationClip } from './shot-clip.js';
import { takeMetrics, takeModes } from './take-metrics.js';
import { transferBasis } from './transfer.js';
import { transferCorrectives } from './transfer-correctives.js';
import { resampleClip } from '../rig/resample-clip.js';

/** Stages reported to `onProgress`, in order. */
export type RetargetStage = 'check' | 'map' | 'transfer' | 'drive' | 'simulate' | 'metrics';

/** Options of a retarget. */
export interface RetargetOptions {
  controls?: Partial<Controls>;
  /** Source → target joint names that override name matching (null: leave unmapped). */
  jointMap?: Record<string, string | null> | null;
  /** Inclusive clip frame range [first, last]; null for the whole clip. */
  frames?: [number, number] | null;
  /** Shot rate; null for the clip's own. */
  fps?: number | null;
  /** Length ratio λ to use instead of measuring the skeletons. */
  lengthRatio?: number | null;
  /** Share of input energy from which an unmapped driver is an error. */
  essentialShare?: number;
  /** Derivative filter of the driver inputs (the learner's defaults unless the profile says). */
  derivatives?: SavitzkyGolayOptions;
  /** Called at each stage with the fraction of the work done (0–1). */
  onProgress?: ((stage: RetargetStage, fraction: number) => void) | null;
}

/** Default retarget options. */
export const RETARGET_DEFAULTS: Required<RetargetOptions> = {
  controls: {},
  jointMap: null,
  frames: null,
  fps: null,
  lengthRatio: null,
  essentialShare: 0.05,
  derivatives: {},
  onProgress: null,
};

/** A take together with how its joints were matched. */
export interface RetargetResult {
  take: Take;
  /** The shot clip (frame range and rate applied), as the take's joint animation. */
  clip: Clip;
  drivers: DriverMapping;
  joints: JointMapping;
}

/** Retargets `profile` onto `character` for `clip`. Throws SolverInputError on bad input. */
export function retarget(
  profile: TissueProfile,
  character: Character,
  clip: Clip,
  options: RetargetOptions = {},
): RetargetResult {
  const opts = { ...RETARGET_DEFAULTS, ...options };
  const progress = opts.onProgress ?? (() => undefined);
  progress('check', 0);
  checkProfile(profile);
  checkCharacter(character);
  checkClip(clip, character);
  const controls = resolveControls(opts.controls, profile.modes.length);
  const ranged = opts.frames ? clipFrameRange(clip, opts.frames[0], opts.frames[1]) : clip;
  const shot =
    opts.fps && Math.abs(opts.fps - ranged.fps) > 1e-9 ? resampleClip(ranged, opts.fps) : ranged;
  const sim = simulationClip(shot, profile.fps, controls.prerollSeconds);
  const warnings: string[] = [];

  progress('map', 0.05);
  const source = profile.source;
  const joints = mapJoints(source.skeleton.names, character.skeleton.names, opts.jointMap);
  const drivers = mapDrivers(
    profile.drivers,
    profile.dynamics,
    source.skeleton.names,
    character.skeleton.names,
    {
      overrides: opts.jointMap,
      essentialShare: opts.essentialShare,
    },
  );
  for (const name of drivers.unmapped) {
    warnings.push(
      `driver "${name}" has no joint on "${character.name}"; its inputs are held at rest`,
    );
  }
  const lambda = opts.lengthRatio ?? lengthRatio(source, character, joints);
  const kappa = sizeFrequencyFactor(lambda, controls);

  progress('transfer', 0.1);
  const k = profile.dynamics.k;
  const transferred = transferBasis(source, character, profile.basis, k, joints, lambda);
  const vertexGains = vertexGainField(character, controls.regionGains);
  const basis = transferred.basis;
  const n3 = character.restPositions.length;
  for (let c = 0; c < k; c++) {
    for (let i = 0; i < n3; i++) basis[c * n3 + i] *= vertexGains[(i / 3) | 0];
  }

  progress('drive', 0.4);
  const drive = computeDrive(
    profile,
    character,
    sim.clip,
    drivers,
    kappa * kappa,
    opts.derivatives,
  );

  progress('simulate', 0.7);
  const modal = modalForm(profile.dynamics, profile.fps, profile.modes);
  const live: LiveTuneData = {
    k,
    simFps: profile.fps,
    simFrames: sim.clip.frameCount,
    drive,
    modal: scaledModal(modal, kappa),
    frameCount: shot.frameCount,
    fps: shot.fps,
    sampleIndex: sim.sampleIndex,
    sampleWeight: sim.sampleWeight,
  };
  const tuner = createLiveTuner(live, basis);
  tuner.tune(controls);
  if (tuner.capped > 0) {
    warnings.push(
      `${tuner.capped} mode(s) were held just below the simulation's Nyquist frequency`,
    );
  }

  progress('metrics', 0.9);
  const modes = takeModes(
    profile.modes,
    live.modal.modeOf,
    tuner.poles.re,
    tuner.poles.im,
    profile.fps,
    shot.fps,
  );
  for (const [i, m] of modes.entries()) {
    if (m.flags.includes('near-nyquist')) {
      warnings.push(
        `mode ${i} (${m.frequencyHz.toFixed(2)} Hz) is near or above the shot's Nyquist frequency (${(shot.fps / 2).toFixed(1)} Hz): it will alias`,
      );
    }
  }
  const metrics = takeMetrics(basis, tuner.weights, k, tuner.poles.re, tuner.poles.im);
  const take: Take = {
    formatVersion: 1,
    profileId: profile.id,
    profileName: profile.name,
    controls,
    fps: shot.fps,
    frameCount: shot.frameCount,
    basis,
    vertexGains,
    correctives: transferCorrectives(profile.correctives, character, joints, transferred, lambda),
    coefficients: tuner.coefficients.slice(),
    weights: tuner.weights.slice(),
    a1: tuner.a1.slice(),
    a2: tuner.a2.slice(),
    modes,
    live,
    metrics: {
      ...metrics,
      lengthRatio: lambda,
      frequencyFactor: kappa,
      transfer: transferred.method,
    },
    warnings,
  };
  progress('metrics', 1);
  return { take, clip: shot, drivers, joints };
}

/**
 * e_t = scale · (B0 u_t + B1 u_{t−1}) with u scaled as the profile learned it; unmapped
 * drivers give u = 0 (their mean). `scale` = κ² keeps the dimensionless response under size
 * scaling (the forcing of a second-order system scales with ω²).
 */
function computeDrive(
  profile: TissueProfile,
  character: Character,
  clip: Clip,
  drivers: DriverMapping,
  scale: number,
  derivatives: SavitzkyGolayOptions,
): Float32Array {
  const { k, m, b0, b1, inputMean, inputScale } = profile.dynamics;
  // Inputs of the mapped drivers on the target, then placed in the profile's input columns.
  const mapped = profile.drivers
    .map((d, i) => ({ d, i, j: drivers.targetJoints[i] }))
    .filter((x) => x.j >= 0);
  const raw = driverInputs(
    character.skeleton,
    clip,
    mapped.map(({ d, j }) => ({ joint: character.skeleton.names[j], signals: d.signals })),
    derivatives,
  );
  const columnOf = new Int32Array(profile.drivers.length + 1);
  profile.drivers.forEach((d, i) => (columnOf[i + 1] = columnOf[i] + 3 * d.signals.length));
  const frames = clip.frameCount;
  const u = new Float64Array(frames * m);
  let rawCol = 0;
  for (const { d, i } of mapped) {
    const width = 3 * d.signals.length;
    const col = columnOf[i];
    for (let t = 0; t < frames; t++) {
      for (let c = 0; c < width; c++) {
        u[t * m + col + c] =
          (raw.values[t * raw.m + rawCol + c] - inputMean[col + c]) / inputScale[col + c];
      }
    }
    rawCol += width;
  }
  const drive = new Float32Array(frames * k);
  for (let t = 0; t < frames; t++) {
    const prev = t > 0 ? t - 1 : 0;
    for (let r = 0; r < k; r++) {
      let s = 0;
      for (let c = 0; c < m; c++)
        s += b0[r * m + c] * u[t * m + c] + b1[r * m + c] * u[prev * m + c];
      drive[t * k + r] = scale * s;
    }
  }
  return drive;
}

/** The modal form with every natural frequency multiplied by `factor` (same mode vectors). */
function scaledModal(modal: ModalForm, factor: number): ModalForm {
  if (factor === 1) return modal;
  const ed = createPoleEditor(modal);
  editPoles(ed, factor, 1);
  return { ...modal, zRe: ed.zRe, zIm: ed.zIm };
}
