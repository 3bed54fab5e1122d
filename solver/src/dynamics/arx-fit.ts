// Second-order ARX identification by least squares (Ljung, System Identification, 1999):
// c_t = A1 c_{t−1} + A2 c_{t−2} + B0 u_t + B1 u_{t−1} + d.
// At 60 fps c_{t−1} and c_{t−2} are nearly collinear, so a ridge on the raw autoregressive terms
// would pull the poles (frequencies by per cents, damping by tens of per cents). Every regressor
// is standardised (centred, unit variance) and only the input block is penalised; its strength is
// chosen by the free-run error on held-out frames at the end of the training range.
import { gramColumns, crossColumns, ridgeSolve } from '../linalg/ridge.js';

/** An ARX model with an intercept d (K); matrices row-major (A: K×K, B: K×M). */
export interface ArxModel {
  k: number;
  m: number;
  a1: Float64Array;
  a2: Float64Array;
  b0: Float64Array;
  b1: Float64Array;
  d: Float64Array;
}

/** Options for the ARX fit. */
export interface ArxFitOptions {
  /** Input-block ridge strengths tried, relative to the row count (regressors have unit variance). */
  ridgeGrid?: number[];
  /** Share of the training frames (at their end) used to choose the ridge strength. */
  validationFraction?: number;
}

/** Defaults: a zero-to-strong ridge grid; the last quarter of training frames validates it. */
export const ARX_FIT_DEFAULTS: Required<ArxFitOptions> = {
  ridgeGrid: [0, 1e-5, 1e-4, 1e-3, 1e-2, 1e-1, 1],
  validationFraction: 0.25,
};

/** Which blocks are estimated; the others are taken from `fixed`. */
type Blocks = 'all' | 'inputs';

/**
 * Least-squares ARX fit over target frames [from, to) (from ≥ 2) of coefficients `c` (T×K) and
 * scaled inputs `u` (T×M). `lambda` is the relative input-block ridge. With blocks = 'inputs',
 * A1 and A2 come from `fixed` and only B0, B1 and d are fitted.
 */
export function fitArx(
  c: Float64Array,
  u: Float64Array,
  k: number,
  m: number,
  from: number,
  to: number,
  lambda: number,
  blocks: Blocks = 'all',
  fixed: ArxModel | null = null,
): ArxModel {
  const ar = blocks === 'all' ? 2 * k : 0;
  const p = ar + 2 * m;
  const n = to - from;
  const x = new Float64Array(n * p);
  const y = new Float64Array(n * k);
  for (let r = 0; r < n; r++) {
    const t = from + r;
    const o = r * p;
    if (ar) {
      for (let q = 0; q < k; q++) {
        x[o + q] = c[(t - 1) * k + q];
        x[o + k + q] = c[(t - 2) * k + q];
      }
    }
    for (let q = 0; q < m; q++) {
      x[o + ar + q] = u[t * m + q];
      x[o + ar + m + q] = u[(t - 1) * m + q];
    }
    for (let q = 0; q < k; q++) {
      let v = c[t * k + q];
      if (!ar && fixed) {
        for (let s = 0; s < k; s++) {
          v -= fixed.a1[q * k + s] * c[(t - 1) * k + s] + fixed.a2[q * k + s] * c[(t - 2) * k + s];
        }
      }
      y[r * k + q] = v;
    }
  }
  // Standardise columns and centre targets; the intercept absorbs the means.
  const mean = new Float64Array(p);
  const std = new Float64Array(p);
  const ymean = new Float64Array(k);
  for (let r = 0; r < n; r++) {
    for (let j = 0; j < p; j++) mean[j] += x[r * p + j] / n;
    for (let q = 0; q < k; q++) ymean[q] += y[r * k + q] / n;
  }
  for (let r = 0; r < n; r++) for (let j = 0; j < p; j++) std[j] += (x[r * p + j] - mean[j]) ** 2;
  for (let j = 0; j < p; j++) std[j] = Math.sqrt(std[j] / n) || 1;
  for (let r = 0; r < n; r++) {
    for (let j = 0; j < p; j++) x[r * p + j] = (x[r * p + j] - mean[j]) / std[j];
    for (let q = 0; q < k; q++) y[r * k + q] -= ymean[q];
  }
  const penalty = new Float64Array(p);
  for (let j = ar; j < p; j++) penalty[j] = lambda * n;
  const w = ridgeSolve(gramColumns(x, p, 0, n), crossColumns(x, p, y, k, 0, n), p, k, penalty);
  const model: ArxModel = {
    k,
    m,
    a1: fixed && !ar ? Float64Array.from(fixed.a1) : new Float64Array(k * k),
    a2: fixed && !ar ? Float64Array.from(fixed.a2) : new Float64Array(k * k),
    b0: new Float64Array(k * m),
    b1: new Float64Array(k * m),
    d: Float64Array.from(ymean),
  };
  for (let j = 0; j < p; j++) {
    for (let q = 0; q < k; q++) {
      const v = w[j * k + q] / std[j];
      model.d[q] -= v * mean[j];
      if (j < k && ar) model.a1[q * k + j] = v;
      else if (j < 2 * k && ar) model.a2[q * k + (j - k)] = v;
      else if (j < ar + m) model.b0[q * m + (j - ar)] = v;
      else model.b1[q * m + (j - ar - m)] = v;
    }
  }
  return model;
}
