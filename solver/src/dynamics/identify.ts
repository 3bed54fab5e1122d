// From coefficients and driver inputs to stable LinearDynamics: scale the inputs, choose the
// input ridge on held-out frames, fit, enforce stability, then fold the intercept into the input
// mean so that the profile's dynamics rest exactly when the inputs equal inputMean.
import { pseudoInverse, Matrix } from 'ml-matrix';
import type { LinearDynamics } from '../types.js';
import { ARX_FIT_DEFAULTS, fitArx, type ArxFitOptions, type ArxModel } from './arx-fit.js';
import { freeRun } from './simulate.js';
import { enforceStability, MAX_POLE_RADIUS, type StabilityResult } from './stability.js';

/** Options for identification. */
export interface IdentifyOptions extends ArxFitOptions {
  /** Stability bound on pole magnitudes. */
  maxPoleRadius?: number;
}

/** Defaults: the ARX fit's, and |z| ≤ 0.995. */
export const IDENTIFY_DEFAULTS: Required<IdentifyOptions> = {
  ...ARX_FIT_DEFAULTS,
  maxPoleRadius: MAX_POLE_RADIUS,
};

/** Identified dynamics with the evidence of how they were chosen. */
export interface Identification {
  dynamics: LinearDynamics;
  /** Inputs scaled with the final inputMean and inputScale (T×M). */
  scaledInputs: Float64Array;
  /** Chosen relative input ridge and the validation error of each grid value. */
  lambda: number;
  ridgeErrors: number[];
  stability: StabilityResult;
}

/** Squared free-run error over [from, to) started from the measured coefficients. */
function freeRunError(
  model: ArxModel,
  c: Float64Array,
  u: Float64Array,
  from: number,
  to: number,
): number {
  const k = model.k;
  const out = new Float64Array(c.length);
  const start = c.slice((from - 2) * k, from * k);
  freeRun(model, u, from, to, start, out);
  let e = 0;
  for (let i = from * k; i < to * k; i++) e += (out[i] - c[i]) ** 2;
  return Number.isFinite(e) ? e : Infinity;
}

/**
 * Identifies second-order dynamics of coefficients `c` (T×K) driven by raw inputs (T×M) from
 * frames [2, trainEnd). `rest` is the input of the character standing still (M).
 */
export function identifyDynamics(
  c: Float64Array,
  rawInputs: Float64Array,
  rest: Float64Array,
  frames: number,
  k: number,
  m: number,
  trainEnd: number,
  options: IdentifyOptions = {},
): Identification {
  const opts = { ...IDENTIFY_DEFAULTS, ...options };
  const inputScale = new Float64Array(m);
  for (let t = 0; t < trainEnd; t++) {
    for (let j = 0; j < m; j++) inputScale[j] += (rawInputs[t * m + j] - rest[j]) ** 2;
  }
  for (let j = 0; j < m; j++) inputScale[j] = Math.sqrt(inputScale[j] / trainEnd) || 1;
  const scaled = (mean: ArrayLike<number>): Float64Array => {
    const u = new Float64Array(frames * m);
    for (let t = 0; t < frames; t++) {
      for (let j = 0; j < m; j++) u[t * m + j] = (rawInputs[t * m + j] - mean[j]) / inputScale[j];
    }
    return u;
  };
  const u = scaled(rest);
  const valFrom = Math.max(4, Math.round(trainEnd * (1 - opts.validationFraction)));
  const ridgeErrors = opts.ridgeGrid.map((lam) =>
    valFrom < trainEnd - 2
      ? freeRunError(fitArx(c, u, k, m, 2, valFrom, lam), c, u, valFrom, trainEnd)
      : 0,
  );
  let best = 0;
  for (let i = 1; i < ridgeErrors.length; i++) if (ridgeErrors[i] < ridgeErrors[best]) best = i;
  const lambda = opts.ridgeGrid[best];
  const fitted = fitArx(c, u, k, m, 2, trainEnd, lambda);
  const stability = enforceStability(fitted, c, u, 2, trainEnd, lambda, opts.maxPoleRadius);
  const model = stability.model;
  // Fold the intercept into the input mean: (B0 + B1) δ = d, least-norm δ.
  const g = new Matrix(k, m);
  for (let r = 0; r < k; r++)
    for (let j = 0; j < m; j++) g.set(r, j, model.b0[r * m + j] + model.b1[r * m + j]);
  const delta = pseudoInverse(g).mmul(Matrix.columnVector(Array.from(model.d)));
  const inputMean = Float64Array.from(rest, (r, j) => r - inputScale[j] * delta.get(j, 0));
  const dynamics: LinearDynamics = {
    k,
    m,
    a1: model.a1,
    a2: model.a2,
    b0: model.b0,
    b1: model.b1,
    inputMean,
    inputScale,
  };
  return { dynamics, scaledInputs: scaled(inputMean), lambda, ridgeErrors, stability };
}
