// The dynamic basis: the dominant directions of the dynamic residual (method of snapshots, or
// randomized SVD when frames are many), K by the rank rule, then made orthogonal to the span of
// the pose-driven displacement so that scaling dynamics never undoes a corrective shape (the idea
// of complementary dynamics, Zhang et al. 2020).
import { basisFromGram } from '../linalg/gram-basis.js';
import { multiplyByRows, snapshotGram } from '../linalg/gram-kernel.js';
import { orthonormaliseRows } from '../linalg/orthonormalise.js';
import { randomizedSvd } from '../linalg/randomized-svd.js';
import { chooseRank, type RankChoice, type RankRuleOptions } from '../linalg/rank-rule.js';
import { fixSigns } from '../linalg/sign-fix.js';
import type { Subspace } from '../linalg/subspace.js';

/** How the dominant subspace is computed. */
export type SubspaceMethod = 'auto' | 'gram' | 'randomized';

/** Leading subspace of a T×D snapshot matrix, with up to `rank` directions. */
export function leadingSubspace(
  x: Float32Array,
  t: number,
  d: number,
  rank: number,
  method: SubspaceMethod,
  seed: number,
): Subspace {
  // The Gram path costs T²D and is exact; randomized costs ~6·T·D·(rank + 10).
  const useGram = method === 'gram' || (method === 'auto' && t <= 2000);
  return useGram
    ? basisFromGram(x, t, d, snapshotGram(x, t, d), rank, { seed })
    : randomizedSvd(x, t, d, rank, { seed });
}

/** The dynamic basis and its coefficients. */
export interface DynamicSubspace {
  k: number;
  /** K rows of D (orthonormal, orthogonal to the corrective span). */
  basis: Float64Array;
  /** Coefficients C = X Bᵀ (T×K). */
  coefficients: Float64Array;
  /** Norms of X along each basis row over all frames (the singular values after projection). */
  singularValues: Float64Array;
  /** The rank decision of a whole-body decomposition (null for directions found per region). */
  rank: RankChoice | null;
  /** Dimension of the corrective span projected out. */
  correctiveRank: number;
  /** Region index of each basis row (null for a whole-body decomposition). */
  region: Int32Array | null;
}

/**
 * Dynamic basis of `dynamic` (T×D) orthogonal to `correctiveSpan` (rows of D, orthonormal), with
 * K chosen by the rank rule on the projected residual's spectrum.
 */
export function dynamicSubspace(
  dynamic: Float32Array,
  t: number,
  d: number,
  correctiveSpan: Float64Array,
  spanRank: number,
  rankOptions: RankRuleOptions,
  method: SubspaceMethod,
  seed: number,
): DynamicSubspace {
  const maxRank = rankOptions.maxRank ?? 32;
  if (spanRank > 0) {
    // X ← X − (X Sᵀ) S, frame by frame.
    const proj = multiplyByRows(dynamic, t, d, correctiveSpan, spanRank);
    for (let r = 0; r < t; r++) {
      for (let q = 0; q < spanRank; q++) {
        const w = proj[r * spanRank + q];
        if (w === 0) continue;
        const o = q * d;
        for (let c = 0; c < d; c++) dynamic[r * d + c] -= w * correctiveSpan[o + c];
      }
    }
  }
  const sub = leadingSubspace(dynamic, t, d, maxRank, method, seed);
  const rank = chooseRank(sub.spectrum, sub.totalEnergy, t, d, rankOptions);
  const k = Math.min(rank.k, sub.k);
  const basis = sub.basis.slice(0, k * d);
  if (spanRank > 0) {
    // Round-off can leave a trace of the span; remove it and re-orthonormalise.
    for (let q = 0; q < k; q++) {
      for (let s = 0; s < spanRank; s++) {
        let dot = 0;
        for (let c = 0; c < d; c++) dot += basis[q * d + c] * correctiveSpan[s * d + c];
        for (let c = 0; c < d; c++) basis[q * d + c] -= dot * correctiveSpan[s * d + c];
      }
    }
    orthonormaliseRows(basis, d, k);
  }
  const coefficients = multiplyByRows(dynamic, t, d, basis, k);
  fixSigns(basis, d, k, coefficients, t);
  const singularValues = Float64Array.from({ length: k }, (_, q) => {
    let s = 0;
    for (let r = 0; r < t; r++) s += coefficients[r * k + q] ** 2;
    return Math.sqrt(s);
  });
  return { k, basis, coefficients, singularValues, rank, correctiveRank: spanRank, region: null };
}

/**
 * The dynamic basis from tissue directions `rows` (K rows of D, with their `region`): made
 * orthogonal to `correctiveSpan` and orthonormal (rows that vanish are dropped), sign-fixed,
 * ordered by the energy of `dynamic` (T×D) along them, with its coefficients.
 */
export function basisFromDirections(
  dynamic: Float32Array,
  t: number,
  d: number,
  rows: Float64Array,
  region: Int32Array,
  correctiveSpan: Float64Array,
  spanRank: number,
): DynamicSubspace {
  const k0 = region.length;
  const work = Float64Array.from(rows.subarray(0, k0 * d));
  for (let q = 0; q < k0; q++) {
    for (let pass = 0; pass < 2; pass++) {
      for (let s = 0; s < spanRank; s++) {
        let dot = 0;
        for (let c = 0; c < d; c++) dot += work[q * d + c] * correctiveSpan[s * d + c];
        for (let c = 0; c < d; c++) work[q * d + c] -= dot * correctiveSpan[s * d + c];
      }
    }
  }
  orthonormaliseRows(work, d, k0);
  const alive: number[] = [];
  for (let q = 0; q < k0; q++)
    if (work.subarray(q * d, (q + 1) * d).some((v) => v !== 0)) alive.push(q);
  let k = alive.length;
  let basis = new Float64Array(k * d);
  alive.forEach((q, i) => basis.set(work.subarray(q * d, (q + 1) * d), i * d));
  let coefficients = multiplyByRows(dynamic, t, d, basis, k);
  const energy = Float64Array.from({ length: k }, (_, q) => {
    let s = 0;
    for (let r = 0; r < t; r++) s += coefficients[r * k + q] ** 2;
    return s;
  });
  const order = [...energy.keys()].sort((a, b) => energy[b] - energy[a] || a - b);
  const sorted = new Float64Array(k * d);
  const sortedC = new Float64Array(t * k);
  order.forEach((q, i) => {
    sorted.set(basis.subarray(q * d, (q + 1) * d), i * d);
    for (let r = 0; r < t; r++) sortedC[r * k + i] = coefficients[r * k + q];
  });
  basis = sorted;
  coefficients = sortedC;
  k = order.length;
  fixSigns(basis, d, k, coefficients, t);
  const singularValues = Float64Array.from(order, (q) => Math.sqrt(energy[q]));
  return {
    k,
    basis,
    coefficients,
    singularValues,
    rank: null,
    correctiveRank: spanRank,
    region: Int32Array.from(order, (q) => region[alive[q]]),
  };
}
