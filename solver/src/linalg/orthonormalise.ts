// Orthonormalisation of a few long vectors by modified Gram–Schmidt, run twice ("twice is
// enough", Giraud et al. 2005) so the result is orthonormal to round-off.

/**
 * Orthonormalises the K columns of the row-major n×K matrix `a` in place. A column that
 * becomes numerically zero is replaced by zeros; returns how many columns are non-zero.
 */
export function orthonormaliseColumns(a: Float64Array, n: number, k: number): number {
  let rank = 0;
  for (let q = 0; q < k; q++) {
    let norm0 = 0;
    for (let r = 0; r < n; r++) norm0 += a[r * k + q] ** 2;
    for (let pass = 0; pass < 2; pass++) {
      for (let p = 0; p < q; p++) {
        let dot = 0;
        for (let r = 0; r < n; r++) dot += a[r * k + p] * a[r * k + q];
        if (dot === 0) continue;
        for (let r = 0; r < n; r++) a[r * k + q] -= dot * a[r * k + p];
      }
    }
    let norm = 0;
    for (let r = 0; r < n; r++) norm += a[r * k + q] ** 2;
    if (!(norm > 1e-24 * norm0) || norm === 0) {
      for (let r = 0; r < n; r++) a[r * k + q] = 0;
      continue;
    }
    const inv = 1 / Math.sqrt(norm);
    for (let r = 0; r < n; r++) a[r * k + q] *= inv;
    rank++;
  }
  return rank;
}

/** Orthonormalises the K rows (each of length d) of `a` in place; returns the non-zero count. */
export function orthonormaliseRows(a: Float32Array | Float64Array, d: number, k: number): number {
  let rank = 0;
  for (let q = 0; q < k; q++) {
    const oq = q * d;
    let norm0 = 0;
    for (let c = 0; c < d; c++) norm0 += a[oq + c] ** 2;
    for (let pass = 0; pass < 2; pass++) {
      for (let p = 0; p < q; p++) {
        const op = p * d;
        let dot = 0;
        for (let c = 0; c < d; c++) dot += a[op + c] * a[oq + c];
        if (dot === 0) continue;
        for (let c = 0; c < d; c++) a[oq + c] -= dot * a[op + c];
      }
    }
    let norm = 0;
    for (let c = 0; c < d; c++) norm += a[oq + c] ** 2;
    if (!(norm > 1e-24 * norm0) || norm === 0) {
      a.fill(0, oq, oq + d);
      continue;
    }
    const inv = 1 / Math.sqrt(norm);
    for (let c = 0; c < d; c++) a[oq + c] *= inv;
    rank++;
  }
  return rank;
}
