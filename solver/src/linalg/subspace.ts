// The result shared by the two ways of finding a dominant subspace of snapshots.

/** Leading singular triplets of a T×D snapshot matrix X = C Bᵀ + rest. */
export interface Subspace {
  /** Rank kept, K. */
  k: number;
  /** Orthonormal right singular vectors, K rows of D floats (the basis layout). */
  basis: Float64Array;
  /** Singular values, descending (K). */
  singularValues: Float64Array;
  /** Coefficients C = X B (T×K, row-major): left singular vectors × singular values. */
  coefficients: Float64Array;
  /** Squared singular values known to the method, descending (all T for the Gram path). */
  spectrum: Float64Array;
  /** ‖X‖²_F, the total energy. */
  totalEnergy: number;
}

/** ‖X‖²_F of a typed array. */
export function frobeniusSquared(x: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < x.length; i++) s += x[i] * x[i];
  return s;
}
