// The span of the corrective (pose-driven) displacement that the dynamic basis is kept orthogonal to.
import { multiplyByRows } from '../linalg/gram-kernel.js';
import { randomizedSvd } from '../linalg/randomized-svd.js';
import { chooseRank } from '../linalg/rank-rule.js';
import type { LearnOptions } from './learn-options.js';

/** Orthonormal rows spanning the pose-driven displacement where it dominates the dynamic one. */
export function correctiveSpan(
  pose: Float32Array,
  dynamic: Float32Array,
  t: number,
  d: number,
  opts: Required<LearnOptions>,
): { basis: Float64Array; k: number } {
  // Randomized (one power iteration): the span needs its strong directions only, at a third of a Gram's cost.
  const s = randomizedSvd(pose, t, d, 16, { seed: opts.seed, powerIterations: 1 });
  const r = chooseRank(s.spectrum, s.totalEnergy, t, d, {
    varianceTarget: 0.999,
    maxRank: 16,
    noiseFactor: opts.noiseFactor,
    minEnergyShare: 1e-3,
  });
  const k0 = Math.min(r.k, s.k);
  const along = multiplyByRows(dynamic, t, d, s.basis, k0);
  const keep: number[] = [];
  for (let q = 0; q < k0; q++) {
    let e = 0;
    for (let r2 = 0; r2 < t; r2++) e += along[r2 * k0 + q] ** 2;
    if (s.singularValues[q] ** 2 >= e) keep.push(q);
  }
  const basis = new Float64Array(keep.length * d);
  keep.forEach((q, i) => basis.set(s.basis.subarray(q * d, (q + 1) * d), i * d));
  return { basis, k: keep.length };
}
