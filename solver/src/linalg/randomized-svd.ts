// Randomized truncated SVD (Halko, Martinsson & Tropp 2011, "Finding structure with randomness",
// Algorithm 4.4 with Q-R re-orthonormalised power iterations, then 5.1): a seeded Gaussian test
// block finds the range, a few power iterations sharpen it, and the small projected problem is
// solved exactly. Seeded, so re-solves give the same bytes.
import { multiplyByRows, multiplyTransposed } from './gram-kernel.js';
import { sharedInput } from './kernel-threads.js';
import { orthonormaliseColumns, orthonormaliseRows } from './orthonormalise.js';
import { seededNormal } from './seeded-random.js';
import { fixSigns } from './sign-fix.js';
import { frobeniusSquared, type Subspace } from './subspace.js';
import { symmetricEigen } from './sym-eigen.js';

/** Options for the randomized SVD. */
export interface RandomizedSvdOptions {
  /** Extra test vectors beyond the rank. */
  oversampling?: number;
  /** Power iterations (each costs two passes over X). */
  powerIterations?: number;
  /** Seed of the Gaussian test block. */
  seed?: number;
}

/** Defaults: 10 extra vectors and 2 power iterations (the paper's usual choices). */
export const RANDOMIZED_SVD_DEFAULTS: Required<RandomizedSvdOptions> = {
  oversampling: 10,
  powerIterations: 2,
  seed: 1,
};

/** The leading `rank` singular triplets of the row-major T×D matrix `x`, sign-fixed. */
export function randomizedSvd(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  rank: number,
  options: RandomizedSvdOptions = {},
): Subspace {
  const opts = { ...RANDOMIZED_SVD_DEFAULTS, ...options };
  // Six products read X: with worker threads, copy it to shared memory once, not six times.
  x = sharedInput(x);
  const l = Math.min(rank + opts.oversampling, t, d);
  const normal = seededNormal(opts.seed);
  // Ω as l rows of D; Y = X Ωᵀ (T×l).
  const omega = Float64Array.from({ length: l * d }, () => normal());
  let y = multiplyByRows(x, t, d, omega, l);
  orthonormaliseColumns(y, t, l);
  for (let it = 0; it < opts.powerIterations; it++) {
    const z = multiplyTransposed(x, t, d, y, l); // (Xᵀ Q)ᵀ, l rows of D
    orthonormaliseRows(z, d, l);
    y = multiplyByRows(x, t, d, z, l);
    orthonormaliseColumns(y, t, l);
  }
  // B = Qᵀ X (l rows of D); B Bᵀ = W Σ² Wᵀ; right vectors Σ⁻¹ Wᵀ B; left vectors Q W.
  const b = multiplyTransposed(x, t, d, y, l);
  const bbt = new Float64Array(l * l);
  for (let i = 0; i < l; i++) {
    for (let j = i; j < l; j++) {
      let s = 0;
      for (let c = 0; c < d; c++) s += b[i * d + c] * b[j * d + c];
      bbt[i * l + j] = s;
      bbt[j * l + i] = s;
    }
  }
  const values = new Float64Array(l);
  const w = new Float64Array(l * l);
  symmetricEigen(bbt, l, values, w);
  const spectrum = values.map((v) => Math.max(0, v));
  const scale = spectrum[0] || 0;
  let k = 0;
  while (k < Math.min(rank, l) && spectrum[k] > 1e-12 * scale) k++;
  const singularValues = Float64Array.from({ length: k }, (_, q) => Math.sqrt(spectrum[q]));
  const basis = new Float64Array(k * d);
  for (let q = 0; q < k; q++) {
    const inv = 1 / singularValues[q];
    for (let i = 0; i < l; i++) {
      const f = w[i * l + q] * inv;
      if (f === 0) continue;
      for (let c = 0; c < d; c++) basis[q * d + c] += f * b[i * d + c];
    }
  }
  const coefficients = new Float64Array(t * k);
  for (let r = 0; r < t; r++) {
    for (let q = 0; q < k; q++) {
      let s = 0;
      for (let i = 0; i < l; i++) s += y[r * l + i] * w[i * l + q];
      coefficients[r * k + q] = s * singularValues[q];
    }
  }
  fixSigns(basis, d, k, coefficients, t);
  return { k, basis, singularValues, coefficients, spectrum, totalEnergy: frobeniusSquared(x) };
}
