// Which driver signals the dynamics take. Specific force always drives the tissue; angular
// velocity and acceleration are kept only when they at least halve the held-out free-run error.
// Inputs the data do not need are not harmless: fitted on a capture where an axis is barely
// excited (no turn in the training frames), their gains are large and arbitrary, and a motion that
// does excite it (a turn in the held-out frames) drives the model far off (held-out free-run NRMSE
// 18.6 with all three signals on the noise-free demo capture, 0.004 with specific force alone). A
// richer set that only trims the error (by 9 and 17 % for two regions of that capture) is fitting
// small mismatches, and costs more on unseen motion than it gains (free-run NRMSE 0.24 with those
// two regions on it, against 0.0007 with specific force).
import type { DriverInputs } from '../dynamics/driver-inputs.js';
import { ALL_DRIVER_SIGNALS } from '../dynamics/driver-inputs.js';
import { identifyDynamics, type Identification } from '../dynamics/identify.js';
import type { Driver, DriverSignal } from '../types.js';

/** A richer signal set must bring the held-out error below this share of the simpler one's. */
export const RICHER_SIGNALS_GAIN = 0.5;

/** Signal sets tried, simplest first (specific force is in every one). */
export const SIGNAL_CANDIDATES: DriverSignal[][] = [
  ['specificForce'],
  ['specificForce', 'angularAcceleration'],
  ['specificForce', 'angularVelocity'],
  ['specificForce', 'angularVelocity', 'angularAcceleration'],
];

/** The chosen signals with their inputs and identification. */
export interface SignalChoice {
  drivers: Driver[];
  inputs: DriverInputs;
  identification: Identification;
  /** Best held-out free-run error of each candidate, in SIGNAL_CANDIDATES order. */
  errors: number[];
}

/** Columns of `all` (inputs of drivers carrying every signal) restricted to `signals`. */
export function selectSignalColumns(
  all: DriverInputs,
  driverCount: number,
  signals: DriverSignal[],
): DriverInputs {
  const keep = ALL_DRIVER_SIGNALS.map((s) => signals.includes(s));
  const columns: number[] = [];
  for (let d = 0; d < driverCount; d++) {
    keep.forEach((k, s) => {
      if (k) for (let a = 0; a < 3; a++) columns.push((d * ALL_DRIVER_SIGNALS.length + s) * 3 + a);
    });
  }
  const m = columns.length;
  const frames = all.values.length / all.m;
  const values = new Float64Array(frames * m);
  for (let t = 0; t < frames; t++)
    for (let j = 0; j < m; j++) values[t * m + j] = all.values[t * all.m + columns[j]];
  return { m, values, rest: Float64Array.from(columns, (c) => all.rest[c]) };
}

/**
 * Identifies the dynamics of coefficients `c` (T×K) with each signal set, simplest first, and
 * moves to a richer set only when it at least halves the held-out free-run error of the one kept.
 * `drivers` carry every signal and `all` is their inputs.
 */
export function chooseSignals(
  c: Float64Array,
  drivers: Driver[],
  all: DriverInputs,
  frames: number,
  k: number,
  trainEnd: number,
): SignalChoice {
  let best: SignalChoice | null = null;
  let bestError = Infinity;
  const errors: number[] = [];
  for (const signals of SIGNAL_CANDIDATES) {
    const inputs = selectSignalColumns(all, drivers.length, signals);
    const id = identifyDynamics(c, inputs.values, inputs.rest, frames, k, inputs.m, trainEnd);
    const error = Math.min(...id.ridgeErrors);
    errors.push(error);
    if (!best || error < RICHER_SIGNALS_GAIN * bestError) {
      bestError = error;
      best = {
        drivers: drivers.map((d) => ({ joint: d.joint, signals: [...signals] })),
        inputs,
        identification: id,
        errors,
      };
    }
  }
  return best as SignalChoice;
}
