// Running ARX dynamics: the free run from inputs alone (what a retarget does) and the one-step
// prediction from measured past coefficients (how well the model explains each next frame).
import type { LinearDynamics } from '../types.js';
import type { ArxModel } from './arx-fit.js';

/**
 * Free run of `model` over frames [from, to) of scaled inputs `u` (T×M), starting from the
 * coefficients `start` (frames from−2 and from−1, 2K values; zeros for rest). Writes frames
 * [from, to) of `out` (T×K) and returns it.
 */
export function freeRun(
  model: ArxModel,
  u: Float64Array,
  from: number,
  to: number,
  start: Float64Array,
  out: Float64Array,
): Float64Array {
  const { k, m, a1, a2, b0, b1, d } = model;
  let p2 = Float64Array.from(start.subarray(0, k));
  let p1 = Float64Array.from(start.subarray(k, 2 * k));
  let next = new Float64Array(k);
  for (let t = from; t < to; t++) {
    const tu = t * m;
    const pu = Math.max(0, t - 1) * m;
    for (let q = 0; q < k; q++) {
      let s = d[q];
      for (let j = 0; j < k; j++) s += a1[q * k + j] * p1[j] + a2[q * k + j] * p2[j];
      for (let j = 0; j < m; j++) s += b0[q * m + j] * u[tu + j] + b1[q * m + j] * u[pu + j];
      next[q] = s;
    }
    out.set(next, t * k);
    const tmp = p2;
    p2 = p1;
    p1 = next;
    next = tmp;
  }
  return out;
}

/** One-step prediction over frames [from, to) (from ≥ 2) from the measured coefficients `c`. */
export function oneStepPrediction(
  model: ArxModel,
  c: Float64Array,
  u: Float64Array,
  from: number,
  to: number,
  out: Float64Array,
): Float64Array {
  const { k, m, a1, a2, b0, b1, d } = model;
  for (let t = from; t < to; t++) {
    for (let q = 0; q < k; q++) {
      let s = d[q];
      for (let j = 0; j < k; j++) {
        s += a1[q * k + j] * c[(t - 1) * k + j] + a2[q * k + j] * c[(t - 2) * k + j];
      }
      for (let j = 0; j < m; j++)
        s += b0[q * m + j] * u[t * m + j] + b1[q * m + j] * u[(t - 1) * m + j];
      out[t * k + q] = s;
    }
  }
  return out;
}

/** Scales raw inputs (T×M) as the dynamics expect: (u − inputMean) / inputScale. */
export function scaleInputs(
  dynamics: LinearDynamics,
  raw: Float64Array,
  frames: number,
): Float64Array {
  const { m, inputMean, inputScale } = dynamics;
  const out = new Float64Array(frames * m);
  for (let t = 0; t < frames; t++) {
    for (let j = 0; j < m; j++) out[t * m + j] = (raw[t * m + j] - inputMean[j]) / inputScale[j];
  }
  return out;
}

/** The profile's dynamics as an ARX model without intercept (the mean is in inputMean). */
export function arxOfDynamics(dynamics: LinearDynamics): ArxModel {
  const { k, m, a1, a2, b0, b1 } = dynamics;
  return { k, m, a1, a2, b0, b1, d: new Float64Array(k) };
}

/** Free run of a profile's dynamics from rest over raw inputs (T×M): coefficients T×K. */
export function simulateDynamics(
  dynamics: LinearDynamics,
  rawInputs: Float64Array,
  frames: number,
): Float64Array {
  const u = scaleInputs(dynamics, rawInputs, frames);
  const out = new Float64Array(frames * dynamics.k);
  return freeRun(arxOfDynamics(dynamics), u, 0, frames, new Float64Array(2 * dynamics.k), out);
}
