// The take's pose correctives as a few morph targets with a weight per shot frame, so that any
// glTF viewer shows skinning + correctives + gain × dynamics. Over the shot the corrective offsets
// form X = F C (T × 3N): F holds the frames' pose features (R − I per joint, clamped into the range
// the correctives were learned on), C each feature's per-vertex offsets (sparse: a vertex has at
// most four joints' features). X is never formed: its leading right singular vectors come from
// small products with F, the P×P matrix G = C Cᵀ and a sparse pass over C (randomized range
// finder, Halko, Martinsson & Tropp 2011, Algorithms 4.4 and 5.1; exact when the active features
// fit in the block). The weights are the frames' projections onto those orthonormal targets, so
// each frame's error norm follows from G exactly; targets are added until the largest of them
// (a bound on any vertex's offset error in any frame) falls below the tolerance.
// Before the clamp and the projections (weights were Q U Σ, not projections), a profile learned
// on a capture whose spine and root barely turned gave, on a shot that turns round, weights of
// 1e7 on targets of norm 1e-8 and a Frobenius-norm bound of 4 m.
import { clampFeatures, poseFeatures } from '../learn/pose-features.js';
import { orthonormaliseColumns } from '../linalg/orthonormalise.js';
import { crossColumns } from '../linalg/ridge.js';
import { seededNormal } from '../linalg/seeded-random.js';
import { fixSigns } from '../linalg/sign-fix.js';
import { symmetricEigen } from '../linalg/sym-eigen.js';
import type { Clip, PoseCorrectives, Skeleton } from '../types.js';

/** Options of the corrective morph targets. */
export interface CorrectiveMorphOptions {
  /** Most corrective morph targets written. */
  maxTargets?: number;
  /** Largest offset error (metres) any vertex may show in any frame, when maxTargets allows. */
  tolerance?: number;
  /** Extra block columns of the randomized range finder. */
  oversampling?: number;
  /** Power iterations of the range finder. */
  powerIterations?: number;
  /** Seed of the Gaussian start block. */
  seed?: number;
}

/** Defaults: 0.1 mm is well below what shows on screen (common practice); 32 targets at most. */
export const CORRECTIVE_MORPH_DEFAULTS: Required<CorrectiveMorphOptions> = {
  maxTargets: 32,
  tolerance: 1e-4,
  oversampling: 10,
  powerIterations: 3,
  seed: 1,
};

/** Corrective offsets of a shot as R morph targets and their weights. */
export interface CorrectiveMorphs {
  /** Targets R (0 when the correctives never move a vertex in this shot). */
  count: number;
  /** Targets in rest space, target r at [r·3N, (r+1)·3N). */
  basis: Float32Array;
  /** Weight of each target per shot frame (T × R). */
  weights: Float32Array;
  /** Bound on any vertex's offset error in any frame (metres); 0 when the targets are exact. */
  errorBound: number;
}

/** The correctives of `clip` (shot frames) on `skeleton` as at most `maxTargets` morph targets. */
export function correctiveMorphs(
  correctives: PoseCorrectives,
  skeleton: Skeleton,
  clip: Clip,
  options: CorrectiveMorphOptions = {},
): CorrectiveMorphs {
  const opts = { ...CORRECTIVE_MORPH_DEFAULTS, ...options };
  const { featureJoints, coefficients, featuresPerVertex: fpv } = correctives;
  const n = featureJoints.length / 4;
  const t = clip.frameCount;
  const none = (): CorrectiveMorphs => ({ count: 0, basis: new Float32Array(0), weights: new Float32Array(0), errorBound: 0 }); // prettier-ignore
  if (coefficients.length === 0 || t === 0) return none();
  const slots = Math.min(4, fpv / 9);
  const pw = skeleton.names.length * 9;
  // Clamped into the training range: beyond it the linear map would extrapolate without bound.
  const features = clampFeatures(correctives, poseFeatures(skeleton, clip), t);
  // Active features: used by some vertex with a non-zero coefficient and non-zero in some frame.
  const used = new Uint8Array(pw);
  for (let i = 0; i < n; i++) {
    for (let s = 0; s < slots; s++) {
      const j = featureJoints[4 * i + s];
      for (let f = 0; f < 9; f++) {
        const o = i * 3 * fpv + s * 9 + f;
        if (coefficients[o] !== 0 || coefficients[o + fpv] !== 0 || coefficients[o + 2 * fpv] !== 0) used[j * 9 + f] = 1; // prettier-ignore
      }
    }
  }
  const moving = new Uint8Array(pw);
  for (let i = 0; i < t * pw; i++) if (features[i] !== 0) moving[i % pw] = 1;
  const index = new Int32Array(pw).fill(-1);
  let p = 0;
  for (let c = 0; c < pw; c++) if (used[c] && moving[c]) index[c] = p++;
  if (p === 0) return none();
  const fa = new Float64Array(t * p);
  for (let r = 0; r < t; r++) for (let c = 0; c < pw; c++) if (index[c] >= 0) fa[r * p + index[c]] = features[r * pw + c]; // prettier-ignore
  const gc = featureGram(correctives, index, p, slots);
  // Range of X: the active features themselves when they fit in the block (exact), else a
  // randomized range finder on X Xᵀ = F (C Cᵀ) Fᵀ.
  const l = Math.min(p, t, opts.maxTargets + opts.oversampling);
  let q: Float64Array;
  if (l === p) {
    q = fa.slice();
  } else {
    const normal = seededNormal(opts.seed);
    q = Float64Array.from({ length: t * l }, () => normal());
    for (let it = 0; it <= opts.powerIterations; it++) {
      q = applyGram(fa, t, p, gc, q, l);
      orthonormaliseColumns(q, t, l);
    }
  }
  orthonormaliseColumns(q, t, l);
  // W = Qᵀ F (l × p); B Bᵀ = W (C Cᵀ) Wᵀ = U Σ² Uᵀ.
  const w = crossColumns(q, l, fa, p, 0, t);
  const wg = multiply(w, gc, l, p, p);
  const h = new Float64Array(l * l);
  for (let a = 0; a < l; a++) {
    for (let b = a; b < l; b++) {
      let s = 0;
      for (let c = 0; c < p; c++) s += wg[a * p + c] * w[b * p + c];
      h[a * l + b] = h[b * l + a] = s;
    }
  }
  const values = new Float64Array(l);
  const u = new Float64Array(l * l);
  symmetricEigen(h, l, values, u);
  const sigma = Array.from(values, (v) => Math.sqrt(Math.max(0, v)));
  // Right singular vectors v_r = σ_r⁻¹ u_rᵀ W C: orthonormal rows, kept as M = Σ⁻¹ Uᵀ W (l × p)
  // in feature space. Directions below 1e-6 σ₁ are left out: their σ² is at round-off in H.
  let usable = 0;
  while (usable < l && sigma[usable] > 1e-6 * sigma[0]) usable++;
  const m = new Float64Array(usable * p);
  for (let r = 0; r < usable; r++) {
    for (let a = 0; a < l; a++) {
      const f = u[a * l + r] / sigma[r];
      if (f !== 0) for (let c = 0; c < p; c++) m[r * p + c] += f * w[a * p + c];
    }
  }
  // Weights are projections, x_t · v_r = f_t C Cᵀ m_r = (F G Mᵀ)_tr, so that each frame's error
  // is orthogonal to the targets and its squared norm is ‖x_t‖² − Σ_r w_tr², with
  // ‖x_t‖² = f_t G f_tᵀ. The largest over frames bounds every vertex's error in every frame.
  const gm = multiply(m, gc, usable, p, p); // (G Mᵀ)ᵀ = M G, G symmetric
  const proj = new Float64Array(t * usable);
  const left = new Float64Array(t);
  for (let r = 0; r < t; r++) {
    const fr = fa.subarray(r * p, (r + 1) * p);
    for (let c = 0; c < usable; c++) {
      let s = 0;
      for (let b = 0; b < p; b++) s += fr[b] * gm[c * p + b];
      proj[r * usable + c] = s;
    }
    left[r] = quadraticForm(fr, gc, p);
  }
  const bound = (): number => {
    let worst = 0;
    for (let r = 0; r < t; r++) worst = Math.max(worst, left[r]);
    return Math.sqrt(worst);
  };
  let count = 0;
  let errorBound = bound();
  while (count < Math.min(opts.maxTargets, usable) && errorBound > opts.tolerance) {
    for (let r = 0; r < t; r++) left[r] -= proj[r * usable + count] ** 2;
    count++;
    errorBound = bound();
  }
  if (count === 0) return { ...none(), errorBound };
  // Basis rows V_r = M_r C (sparse pass over C).
  const basis = new Float64Array(count * 3 * n);
  for (let i = 0; i < n; i++) {
    for (let s = 0; s < slots; s++) {
      const j = featureJoints[4 * i + s];
      for (let f = 0; f < 9; f++) {
        const c = index[j * 9 + f];
        if (c < 0) continue;
        for (let ax = 0; ax < 3; ax++) {
          const coef = coefficients[(i * 3 + ax) * fpv + s * 9 + f];
          if (coef === 0) continue;
          for (let r = 0; r < count; r++) basis[r * 3 * n + 3 * i + ax] += m[r * p + c] * coef;
        }
      }
    }
  }
  const coeff = new Float64Array(t * count);
  for (let r = 0; r < t; r++)
    for (let c = 0; c < count; c++) coeff[r * count + c] = proj[r * usable + c];
  fixSigns(basis, 3 * n, count, coeff, t);
  return { count, basis: Float32Array.from(basis), weights: Float32Array.from(coeff), errorBound };
}

/** C Cᵀ over the active features (p × p): each vertex and axis adds its ≤ 36 coefficients' outer product. */
function featureGram(
  correctives: PoseCorrectives,
  index: Int32Array,
  p: number,
  slots: number,
): Float64Array {
  const { featureJoints, coefficients, featuresPerVertex: fpv } = correctives;
  const n = featureJoints.length / 4;
  const g = new Float64Array(p * p);
  // One vertex's coefficients per active feature (slots may repeat a joint: sum them).
  const cols = new Int32Array(36);
  const vals = new Float64Array(36);
  for (let i = 0; i < n; i++) {
    for (let ax = 0; ax < 3; ax++) {
      let m = 0;
      for (let s = 0; s < slots; s++) {
        const j = featureJoints[4 * i + s];
        for (let f = 0; f < 9; f++) {
          const c = index[j * 9 + f];
          const v = coefficients[(i * 3 + ax) * fpv + s * 9 + f];
          if (c < 0 || v === 0) continue;
          let e = 0;
          while (e < m && cols[e] !== c) e++;
          if (e === m) {
            cols[m] = c;
            vals[m++] = 0;
          }
          vals[e] += v;
        }
      }
      for (let a = 0; a < m; a++) {
        const o = cols[a] * p;
        for (let b = 0; b < m; b++) g[o + cols[b]] += vals[a] * vals[b];
      }
    }
  }
  return g;
}

/** f G fᵀ for a row f (p) and a symmetric G (p × p); never below 0. */
function quadraticForm(f: Float64Array, g: Float64Array, p: number): number {
  let s = 0;
  for (let a = 0; a < p; a++) {
    const v = f[a];
    if (v === 0) continue;
    let row = 0;
    for (let b = 0; b < p; b++) row += g[a * p + b] * f[b];
    s += v * row;
  }
  return Math.max(0, s);
}

/** F G Fᵀ Q for F (t × p), G (p × p) and Q (t × l), all row-major. */
function applyGram(
  f: Float64Array,
  t: number,
  p: number,
  g: Float64Array,
  q: Float64Array,
  l: number,
): Float64Array {
  return multiply(f, multiply(g, crossColumns(f, p, q, l, 0, t), p, p, l), t, p, l);
}

/** A (rows × inner) times B (inner × cols), row-major. */
function multiply(
  a: Float64Array,
  b: Float64Array,
  rows: number,
  inner: number,
  cols: number,
): Float64Array {
  const out = new Float64Array(rows * cols);
  for (let r = 0; r < rows; r++) {
    for (let k = 0; k < inner; k++) {
      const v = a[r * inner + k];
      if (v !== 0) for (let c = 0; c < cols; c++) out[r * cols + c] += v * b[k * cols + c];
    }
  }
  return out;
}
