// Invented test data: a tissue profile built from KNOWN continuous modes rather than learned, so
// retarget tests know the ground truth. Each mode is q̈ + 2ζω_n q̇ + ω_n² q = b·(f − f_rest), with f
// the driver joint's specific force; its poles are discretised exactly (z = e^{sT}, Franklin,
// Powell & Workman, Digital Control of Dynamic Systems) and its input split evenly over B0 and
// B1 so the static deflection b·Δf/ω_n² is exact. Not a real asset.
import { restDriverInputs } from '../../src/dynamics/driver-inputs.js';
import {
  dominantJoints,
  type Character,
  type Driver,
  type Mode,
  type TissueProfile,
} from '../../src/index.js';

/** One known mode. */
export interface KnownMode {
  frequencyHz: number;
  dampingRatio: number;
  /** Joint whose dominated vertices move (the mode's region). */
  joint: string;
  /** Region label of the character to use instead of the joint's vertices (amplitude 1). */
  region?: string;
  /** Driver joint and input gain b on its specific force (joint frame), 1/s² per (m/s²) … */
  driver: string;
  gain: [number, number, number];
  /** Direction of the mode shape in rest space (unit). */
  direction?: [number, number, number];
}

/** Builds the profile on `character` at `fps`. Basis column k: mode k's shape, peak 1. */
export function knownProfile(
  character: Character,
  fps: number,
  modes: KnownMode[],
  options: { correctiveJoint?: string; name?: string } = {},
): TissueProfile {
  const n = character.restPositions.length / 3;
  const k = modes.length;
  const names = character.skeleton.names;
  const driverNames = [...new Set(modes.map((m) => m.driver))];
  const drivers: Driver[] = driverNames.map((joint) => ({ joint, signals: ['specificForce'] }));
  const m = 3 * drivers.length;
  const dominant = dominantJoints(character.skinJoints, character.skinWeights);
  const basis = new Float32Array(3 * n * k);
  modes.forEach((mode, c) => {
    const j = names.indexOf(mode.joint);
    if (j < 0) throw new Error(`no joint ${mode.joint}`);
    const dir = mode.direction ?? [0, -1, 0];
    const label = mode.region ? (character.regions?.names.indexOf(mode.region) ?? -1) : -1;
    if (mode.region && label < 0) throw new Error(`no region ${mode.region}`);
    for (let i = 0; i < n; i++) {
      if (label >= 0) {
        if (character.regions!.labels[i] === label)
          for (let a = 0; a < 3; a++) basis[c * 3 * n + 3 * i + a] = dir[a];
        continue;
      }
      if (dominant[i] !== j) continue;
      // Smooth within the region: the skin weight on the joint, so the border is zero-ish.
      let w = 0;
      for (let s = 0; s < 4; s++)
        if (character.skinJoints[4 * i + s] === j) w += character.skinWeights[4 * i + s];
      const amp = Math.max(0, 2 * w - 1);
      for (let a = 0; a < 3; a++) basis[c * 3 * n + 3 * i + a] = amp * dir[a];
    }
  });
  const a1 = new Float64Array(k * k);
  const a2 = new Float64Array(k * k);
  const b0 = new Float64Array(k * m);
  const b1 = new Float64Array(k * m);
  const dt = 1 / fps;
  modes.forEach((mode, c) => {
    const wn = 2 * Math.PI * mode.frequencyHz;
    const z = mode.dampingRatio;
    const wd = wn * Math.sqrt(1 - z * z);
    const r = Math.exp(-z * wn * dt);
    a1[c * k + c] = 2 * r * Math.cos(wd * dt);
    a2[c * k + c] = -r * r;
    const dc = (1 - a1[c * k + c] - a2[c * k + c]) / (wn * wn);
    const col = 3 * driverNames.indexOf(mode.driver);
    for (let a = 0; a < 3; a++) {
      b0[c * m + col + a] = 0.5 * dc * mode.gain[a];
      b1[c * m + col + a] = 0.5 * dc * mode.gain[a];
    }
  });
  const fpv = 36;
  const coefficients = new Float32Array(n * 3 * fpv);
  if (options.correctiveJoint) {
    // A known corrective: vertices dominated by the joint bulge along +X with entry (1,1) of R − I.
    const j = names.indexOf(options.correctiveJoint);
    for (let i = 0; i < n; i++) {
      for (let s = 0; s < 4; s++) {
        if (character.skinJoints[4 * i + s] === j && dominant[i] === j) {
          coefficients[(i * 3 + 0) * fpv + s * 9 + 4] = -0.05;
        }
      }
    }
  }
  const profileModes: Mode[] = modes.map((mode) => ({
    frequencyHz: mode.frequencyHz,
    dampingRatio: mode.dampingRatio,
    region: mode.region ?? mode.joint,
    energyShare: 1 / k,
    flags: [],
  }));
  return {
    formatVersion: 1,
    id: 'known-modes-test',
    name: options.name ?? 'known modes (invented test profile)',
    fps,
    settings: { invented: true },
    source: character,
    drivers,
    basis,
    singularValues: new Float64Array(k).fill(1),
    correctives: {
      featuresPerVertex: fpv,
      featureJoints: character.skinJoints.slice(),
      coefficients,
      ridgeLambda: 0,
    },
    dynamics: {
      k,
      m,
      a1,
      a2,
      b0,
      b1,
      inputMean: restDriverInputs(character.skeleton, drivers),
      inputScale: new Float64Array(m).fill(1),
    },
    modes: profileModes,
    fitReport: {
      trainFrames: 0,
      heldOutFrames: 0,
      oneStepNrmse: 0,
      freeRunNrmse: 0,
      varianceExplained: 1,
      stabilityMargin:
        1 -
        Math.max(...modes.map((x) => Math.exp(-x.dampingRatio * 2 * Math.PI * x.frequencyHz * dt))),
      poseShare: 0,
      dynamicShare: 1,
      spectrumPeaks: [],
    },
  };
}
