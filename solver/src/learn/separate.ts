// Pose-driven part of the unposed residual: per vertex, a ridge regression of its rest-space
// offset on the pose features (R − I) of the joints that skin it (local support keeps it sparse;
// pose space deformation, Lewis, Cordner & Fong 2000); the joints are the skin joints and their
// children, at most four (no root: see vertex-groups.ts). With a cut-off, the regression is
// fitted to the residual and the features after the same zero-phase low-pass, so oscillation
// above it stays in the dynamic part (learning projects the tissue directions out instead and
// uses none); optional competing signals (tissue inputs) are fitted alongside and dropped, so
// that the slow tissue response they explain does not leak into the correctives.
// Vertices skinned by the same joints share one normal matrix, factored once per group; the ridge
// strength (per group, or one for the whole mesh) minimises the error on held-out frames at the
// end of the capture, then every frame is used for the final fit. The correctives carry each
// feature's range over the capture, into which evaluation clamps them (pose-features.ts).
import { lowPassZeroPhase } from '../dynamics/low-pass.js';
import { cholesky, choleskySolve, gramColumns } from '../linalg/ridge.js';
import { symmetricEigen } from '../linalg/sym-eigen.js';
import type { Character, PoseCorrectives } from '../types.js';
import { FEATURES_PER_JOINT, featureRange } from './pose-features.js';
import { groupVertices } from './vertex-groups.js';
import { crossRows, poseRows } from './separate-kernels.js';

export { influencingJoints } from './vertex-groups.js';

/** Options for the pose-driven fit. */
export interface SeparateOptions {
  /** Low-pass cut-off (Hz) applied to the residual before the fit. */
  cutoffHz?: number;
  /** Butterworth order of each pass of the zero-phase low-pass. */
  lowPassOrder?: number;
  /** Share of frames (at the end) held out to choose the ridge strength. */
  heldOutFraction?: number;
  /** Ridge strengths tried, relative to the training frame count (features have unit RMS). */
  ridgeGrid?: number[];
  /**
   * Per-joint signals (T × J × perJoint) fitted alongside the pose features but not kept in the
   * correctives: they take the share of the low-passed residual that tissue dynamics explain
   * (e.g. sag under the joint's specific force), so it does not leak into the correctives.
   */
  competing?: { values: Float64Array; perJoint: number } | null;
  /** Choose the ridge strength per group of vertices with the same joints (else one for all). */
  perGroupRidge?: boolean;
  /**
   * Low-pass the regressors with the same filter as the residual. The pose-driven part is linear
   * in the features, so filtering both sides keeps that relation exact whatever the cut-off;
   * otherwise a cut-off below the pose's own rate (gait ~1 Hz) would blunt the correctives.
   */
  filterFeatures?: boolean;
}

/**
 * Smallest RMS of a pose feature (an entry of R − I) that enters the fit: 1e-6 is about ten times
 * the resolution of a unit quaternion stored as float32 (6e-8), so anything below is round-off.
 */
export const MIN_FEATURE_RMS = 1e-6;

/**
 * Defaults, as learning uses them: no low-pass (with the tissue directions projected out first,
 * a cut-off only cost accuracy; see LEARN_DEFAULTS) and a ridge strength per group of vertices.
 */
export const SEPARATE_DEFAULTS: Required<SeparateOptions> = {
  cutoffHz: Infinity,
  lowPassOrder: 4,
  heldOutFraction: 0.2,
  ridgeGrid: [1e-8, 1e-7, 1e-6, 1e-5, 1e-4, 1e-3, 1e-2, 1e-1, 1, 10],
  competing: null,
  perGroupRidge: true,
  filterFeatures: true,
};

/** The fitted pose-driven part. */
export interface Separation {
  correctives: PoseCorrectives;
  /** Pose-driven offsets for every frame (T × 3N, rest space). */
  poseDisplacement: Float32Array;
  /** Held-out squared error for each ridge strength tried. */
  ridgeErrors: number[];
}

/**
 * Fits the correctives to `residuals` (T × 3N; not modified) low-passed, with `features` from
 * poseFeatures (T × J × 9).
 */
export function separatePoseDriven(
  residuals: Float32Array,
  frames: number,
  character: Character,
  features: Float64Array,
  fps: number,
  options: SeparateOptions = {},
): Separation {
  const opts = { ...SEPARATE_DEFAULTS, ...options };
  const n = character.restPositions.length / 3;
  const d = 3 * n;
  const jc = character.skeleton.names.length;
  const fw = jc * FEATURES_PER_JOINT;
  // A cut-off at or above the Nyquist frequency means no filter: the fit sees the full band.
  const filter = opts.cutoffHz < fps / 2;
  // Filtering works in place on a copy; unfiltered, the residual is only read.
  const target = filter ? residuals.slice() : residuals;
  if (filter) lowPassZeroPhase(target, frames, d, opts.cutoffHz, fps, { order: opts.lowPassOrder });
  // Unit-RMS features so one ridge strength treats small (θ²) and large (θ) entries alike.
  const fitFeatures = Float64Array.from(features.subarray(0, frames * fw));
  if (filter && opts.filterFeatures)
    lowPassZeroPhase(fitFeatures, frames, fw, opts.cutoffHz, fps, { order: opts.lowPassOrder });
  const scale = new Float64Array(fw);
  for (let t = 0; t < frames; t++)
    for (let f = 0; f < fw; f++) scale[f] += fitFeatures[t * fw + f] ** 2;
  for (let f = 0; f < fw; f++) scale[f] = Math.sqrt(scale[f] / frames);
  // A feature that does not vary beyond round-off (an axis the joint never turns about) is left
  // out: scaled to unit RMS it turned 1e-12 of noise into a regressor with a 1e7 m coefficient,
  // which any shot that does turn that way multiplied into kilometres of offset. An infinite
  // scale makes its column and its coefficient 0.
  for (let f = 0; f < fw; f++) if (!(scale[f] >= MIN_FEATURE_RMS)) scale[f] = Infinity;
  const extra = opts.competing;
  const ew = extra ? jc * extra.perJoint : 0;
  const epj = extra ? extra.perJoint : 0;
  const escale = new Float64Array(ew);
  const extraValues = extra ? Float64Array.from(extra.values.subarray(0, frames * ew)) : null;
  if (extraValues && filter && opts.filterFeatures)
    lowPassZeroPhase(extraValues, frames, ew, opts.cutoffHz, fps, { order: opts.lowPassOrder });
  if (extra) {
    for (let t = 0; t < frames; t++)
      for (let f = 0; f < ew; f++) escale[f] += extraValues![t * ew + f] ** 2;
    for (let f = 0; f < ew; f++) escale[f] = Math.sqrt(escale[f] / frames) || 1;
  }
  const trainEnd = Math.max(
    1,
    Math.min(frames - 1, Math.round(frames * (1 - opts.heldOutFraction))),
  );
  const grid = opts.ridgeGrid.map((r) => r * trainEnd);
  const groups = groupVertices(character);
  const fpv = 4 * FEATURES_PER_JOINT;
  const errors = new Float64Array(grid.length);
  // Per group: scaled features, training and held-out normal matrices, per-vertex cross products.
  const prepared = groups.map((g) => {
    const pp = g.joints.length * FEATURES_PER_JOINT;
    const p = pp + (extra ? g.drivers.length * epj : 0);
    // x: regressors as fitted (filtered); xo: the raw pose features that give the output.
    const x = new Float64Array(frames * p);
    const xo = new Float64Array(frames * pp);
    for (let t = 0; t < frames; t++) {
      g.joints.forEach((j, s) => {
        for (let f = 0; f < FEATURES_PER_JOINT; f++) {
          const src = j * FEATURES_PER_JOINT + f;
          x[t * p + s * FEATURES_PER_JOINT + f] = fitFeatures[t * fw + src] / scale[src];
          xo[t * pp + s * FEATURES_PER_JOINT + f] = features[t * fw + src] / scale[src];
        }
      });
      g.drivers.forEach((j, s) => {
        for (let f = 0; f < epj; f++) {
          const src = j * epj + f;
          x[t * p + pp + s * epj + f] = extraValues![t * ew + src] / escale[src];
        }
      });
    }
    const gt = gramColumns(x, p, 0, trainEnd);
    const gv = gramColumns(x, p, trainEnd, frames);
    const lambda = new Float64Array(p);
    const q = new Float64Array(p * p);
    symmetricEigen(Float64Array.from(gt), p, lambda, q);
    // Held-out normal matrix in the training eigenbasis: Qᵀ Gv Q.
    const gvq = rotate(gv, q, p);
    const cross = new Float64Array(g.vertices.length * 2 * p * 3);
    const groupErrors = new Float64Array(grid.length);
    const y = new Float64Array(frames * 3);
    // Held-out error of every ridge strength, summed over the group's vertices and axes: with
    // z = Qᵀc it is Σ rvr − 2 Σ_a u_a/(λ_a+λ) + Σ_ab (QᵀGvQ)_ab S_ab/((λ_a+λ)(λ_b+λ)), where
    // S = Qᵀ(Σ ct ctᵀ)Q and u = diag Qᵀ(Σ ct cvᵀ)Q need only two p×p sums per group.
    const mtt = new Float64Array(p * p);
    const mtv = new Float64Array(p * p);
    let rv = 0;
    g.vertices.forEach((i, vi) => {
      for (let t = 0; t < frames; t++) {
        y[3 * t] = target[t * d + 3 * i];
        y[3 * t + 1] = target[t * d + 3 * i + 1];
        y[3 * t + 2] = target[t * d + 3 * i + 2];
      }
      for (let t = trainEnd; t < frames; t++) rv += y[3 * t] ** 2 + y[3 * t + 1] ** 2 + y[3 * t + 2] ** 2; // prettier-ignore
      const base = vi * 6 * p;
      crossRows(x, p, y, 0, trainEnd, cross, base);
      crossRows(x, p, y, trainEnd, frames, cross, base + 3 * p);
      for (let a = 0; a < p; a++) {
        const ta0 = cross[base + 3 * a], ta1 = cross[base + 3 * a + 1], ta2 = cross[base + 3 * a + 2]; // prettier-ignore
        for (let b = 0; b < p; b++) {
          const ob = base + 3 * b;
          mtt[a * p + b] += ta0 * cross[ob] + ta1 * cross[ob + 1] + ta2 * cross[ob + 2];
          mtv[a * p + b] += ta0 * cross[ob + 3 * p] + ta1 * cross[ob + 3 * p + 1] + ta2 * cross[ob + 3 * p + 2]; // prettier-ignore
        }
      }
    });
    const sq = rotate(mtt, q, p);
    const uq = rotate(mtv, q, p);
    const inv = new Float64Array(p);
    grid.forEach((lam, li) => {
      for (let a = 0; a < p; a++) inv[a] = 1 / (lambda[a] + lam);
      let err = rv;
      for (let a = 0; a < p; a++) {
        err -= 2 * uq[a * p + a] * inv[a];
        let s = 0;
        for (let b = 0; b < p; b++) s += gvq[a * p + b] * sq[a * p + b] * inv[b];
        err += s * inv[a];
      }
      errors[li] += err;
      groupErrors[li] = err;
    });
    return { g, p, pp, xo, gram: gt.map((v, k) => v + gv[k]), cross, groupErrors };
  });
  let best = 0;
  for (let li = 1; li < grid.length; li++) if (errors[li] < errors[best]) best = li;
  const lam = grid[best];
  const featureJoints = new Uint16Array(4 * n);
  const coefficients = new Float32Array(n * 3 * fpv);
  const poseDisplacement = new Float32Array(frames * d);
  for (const { g, p, pp, xo, gram, cross, groupErrors } of prepared) {
    let gl = best;
    if (opts.perGroupRidge)
      for (let li = 0; li < grid.length; li++) if (groupErrors[li] < groupErrors[gl]) gl = li;
    const a = Float64Array.from(gram);
    for (let k = 0; k < p; k++) a[k * p + k] += grid[gl];
    const ok = cholesky(a, p);
    g.vertices.forEach((i, vi) => {
      for (let s = 0; s < 4; s++)
        featureJoints[4 * i + s] = g.joints[Math.min(s, g.joints.length - 1)];
      if (!ok) return;
      const rhs = new Float64Array(p * 3);
      const base = vi * 6 * p;
      for (let k = 0; k < 3 * p; k++) rhs[k] = cross[base + k] + cross[base + 3 * p + k];
      choleskySolve(a, p, rhs, 3);
      poseRows(xo, pp, rhs, frames, poseDisplacement, d, 3 * i);
      g.joints.forEach((j, s) => {
        for (let f = 0; f < FEATURES_PER_JOINT; f++) {
          const k = s * FEATURES_PER_JOINT + f;
          const sc = scale[j * FEATURES_PER_JOINT + f];
          for (let ax = 0; ax < 3; ax++)
            coefficients[(3 * i + ax) * fpv + k] = rhs[3 * k + ax] / sc;
        }
      });
    });
  }
  return {
    correctives: {
      featuresPerVertex: fpv,
      featureJoints,
      coefficients,
      ridgeLambda: lam,
      ...featureRange(features, frames, fw),
    },
    poseDisplacement,
    ridgeErrors: Array.from(errors),
  };
}

/** Qᵀ A Q for symmetric p×p A and orthogonal Q (row-major). */
function rotate(a: Float64Array, q: Float64Array, p: number): Float64Array {
  const aq = new Float64Array(p * p);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) {
      let s = 0;
      for (let k = 0; k < p; k++) s += a[i * p + k] * q[k * p + j];
      aq[i * p + j] = s;
    }
  }
  const out = new Float64Array(p * p);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) {
      let s = 0;
      for (let k = 0; k < p; k++) s += q[k * p + i] * aq[k * p + j];
      out[i * p + j] = s;
    }
  }
  return out;
}
