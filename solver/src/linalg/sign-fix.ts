// Sign convention for singular vectors, so that a re-solve gives the same bytes whatever sign an
// eigen-solver happened to return.

/**
 * Flips row q of `rows` (K rows of length `len`) and column q of `partner` (row-major with `k`
 * columns) together so that each row's entry of largest magnitude (first on ties) is positive.
 */
export function fixSigns(
  rows: Float32Array | Float64Array,
  len: number,
  k: number,
  partner: Float64Array | null,
  partnerRows: number,
): void {
  for (let q = 0; q < k; q++) {
    const o = q * len;
    let best = 0;
    let mag = -1;
    for (let c = 0; c < len; c++) {
      const a = Math.abs(rows[o + c]);
      if (a > mag) {
        mag = a;
        best = c;
      }
    }
    if (rows[o + best] >= 0) continue;
    for (let c = 0; c < len; c++) rows[o + c] = -rows[o + c];
    if (partner) for (let r = 0; r < partnerRows; r++) partner[r * k + q] = -partner[r * k + q];
  }
}
