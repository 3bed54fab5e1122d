// Dominant subspace by the method of snapshots (Sirovich 1987): eigen-decompose the small T×T
// Gram matrix XXᵀ = V Λ Vᵀ instead of anything D×D; then the basis is B = Xᵀ V Λ^(−1/2) and the
// coefficients are V Λ^(1/2). Exact, and fastest when T ≪ D. Never forms a D×D matrix.
import { multiplyTransposed, snapshotGram } from './gram-kernel.js';
import { fixSigns } from './sign-fix.js';
import type { Subspace } from './subspace.js';
import { topEigen, type TopEigenOptions } from './top-eigen.js';

/** The leading `rank` singular triplets of the row-major T×D matrix `x`, sign-fixed. */
export function gramBasis(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  rank: number,
  options: TopEigenOptions = {},
): Subspace {
  return basisFromGram(x, t, d, snapshotGram(x, t, d), rank, options);
}

/** As gramBasis, with the Gram matrix XXᵀ already computed. */
export function basisFromGram(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  gram: Float64Array,
  rank: number,
  options: TopEigenOptions = {},
): Subspace {
  const eig = topEigen(gram, t, Math.min(rank, t), options);
  const spectrum = eig.values.map((v) => Math.max(0, v));
  let totalEnergy = 0;
  for (let r = 0; r < t; r++) totalEnergy += gram[r * t + r];
  const scale = spectrum[0] || 0;
  let k = 0;
  // Directions at round-off level (relative 1e-12 of the largest) carry no signal.
  while (k < Math.min(rank, eig.l) && spectrum[k] > 1e-12 * scale) k++;
  const v = new Float64Array(t * k);
  for (let r = 0; r < t; r++) for (let q = 0; q < k; q++) v[r * k + q] = eig.vectors[r * eig.l + q];
  const singularValues = Float64Array.from({ length: k }, (_, q) => Math.sqrt(spectrum[q]));
  const basis = multiplyTransposed(x, t, d, v, k);
  for (let q = 0; q < k; q++) {
    const inv = 1 / singularValues[q];
    for (let c = q * d; c < (q + 1) * d; c++) basis[c] *= inv;
  }
  const coefficients = new Float64Array(t * k);
  for (let r = 0; r < t; r++) {
    for (let q = 0; q < k; q++) coefficients[r * k + q] = v[r * k + q] * singularValues[q];
  }
  fixSigns(basis, d, k, coefficients, t);
  return { k, basis, singularValues, coefficients, spectrum, totalEnergy };
}
