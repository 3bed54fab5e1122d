// Dense LU factorisation with partial pivoting, in place, for small systems solved repeatedly
// (live tuning rebuilds its dynamics on every control change and must not allocate).

/**
 * Factors the n×n row-major matrix `a` in place (L below the diagonal, unit diagonal implied; U
 * on and above), recording row swaps in `pivots`. Returns false when a pivot is zero (singular).
 */
export function luFactor(a: Float64Array, n: number, pivots: Int32Array): boolean {
  for (let c = 0; c < n; c++) {
    let p = c;
    let best = Math.abs(a[c * n + c]);
    for (let r = c + 1; r < n; r++) {
      const v = Math.abs(a[r * n + c]);
      if (v > best) {
        best = v;
        p = r;
      }
    }
    pivots[c] = p;
    if (best === 0 || !Number.isFinite(best)) return false;
    if (p !== c) {
      for (let k = 0; k < n; k++) {
        const t = a[c * n + k];
        a[c * n + k] = a[p * n + k];
        a[p * n + k] = t;
      }
    }
    const inv = 1 / a[c * n + c];
    for (let r = c + 1; r < n; r++) {
      const f = a[r * n + c] * inv;
      if (f === 0) continue;
      a[r * n + c] = f;
      for (let k = c + 1; k < n; k++) a[r * n + k] -= f * a[c * n + k];
    }
  }
  return true;
}

/** Solves A x = b in place in `b` (offset `bo`) from the factors of `luFactor`. */
export function luSolve(
  lu: Float64Array,
  n: number,
  pivots: Int32Array,
  b: Float64Array,
  bo = 0,
): Float64Array {
  for (let c = 0; c < n; c++) {
    const p = pivots[c];
    if (p !== c) {
      const t = b[bo + c];
      b[bo + c] = b[bo + p];
      b[bo + p] = t;
    }
  }
  for (let r = 1; r < n; r++) {
    let s = b[bo + r];
    for (let k = 0; k < r; k++) s -= lu[r * n + k] * b[bo + k];
    b[bo + r] = s;
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = b[bo + r];
    for (let k = r + 1; k < n; k++) s -= lu[r * n + k] * b[bo + k];
    b[bo + r] = s / lu[r * n + r];
  }
  return b;
}
