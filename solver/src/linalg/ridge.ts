// Small dense least squares with per-column ridge penalties, by the normal equations and a
// Cholesky factorisation. Callers standardise their columns first, which keeps the normal matrix
// well conditioned enough for double precision at the sizes used here (up to a few hundred).

/** Gram matrix XᵀX (p×p, row-major) of the row-major n×p matrix X, over rows [from, to). */
export function gramColumns(
  x: Float64Array,
  p: number,
  from: number,
  to: number,
  out = new Float64Array(p * p),
): Float64Array {
  out.fill(0);
  for (let r = from; r < to; r++) {
    const o = r * p;
    for (let i = 0; i < p; i++) {
      const xi = x[o + i];
      if (xi === 0) continue;
      const oi = i * p;
      for (let j = i; j < p; j++) out[oi + j] += xi * x[o + j];
    }
  }
  for (let i = 0; i < p; i++) for (let j = 0; j < i; j++) out[i * p + j] = out[j * p + i];
  return out;
}

/** Cross product XᵀY (p×q) of row-major X (n×p) and Y (n×q) over rows [from, to). */
export function crossColumns(
  x: Float64Array,
  p: number,
  y: Float64Array,
  q: number,
  from: number,
  to: number,
  out = new Float64Array(p * q),
): Float64Array {
  out.fill(0);
  for (let r = from; r < to; r++) {
    const ox = r * p;
    const oy = r * q;
    for (let i = 0; i < p; i++) {
      const xi = x[ox + i];
      if (xi === 0) continue;
      for (let j = 0; j < q; j++) out[i * q + j] += xi * y[oy + j];
    }
  }
  return out;
}

/**
 * In-place Cholesky factor (lower triangle, row-major) of the symmetric positive definite p×p
 * matrix `a`. Returns false when a pivot is not positive (the matrix is singular).
 */
export function cholesky(a: Float64Array, p: number): boolean {
  for (let j = 0; j < p; j++) {
    let d = a[j * p + j];
    for (let k = 0; k < j; k++) d -= a[j * p + k] * a[j * p + k];
    if (!(d > 0)) return false;
    const l = Math.sqrt(d);
    a[j * p + j] = l;
    for (let i = j + 1; i < p; i++) {
      let s = a[i * p + j];
      for (let k = 0; k < j; k++) s -= a[i * p + k] * a[j * p + k];
      a[i * p + j] = s / l;
    }
  }
  return true;
}

/** Solves L Lᵀ X = B in place (B p×q row-major) with the factor from `cholesky`. */
export function choleskySolve(
  l: Float64Array,
  p: number,
  b: Float64Array,
  q: number,
): Float64Array {
  for (let c = 0; c < q; c++) {
    for (let i = 0; i < p; i++) {
      let s = b[i * q + c];
      for (let k = 0; k < i; k++) s -= l[i * p + k] * b[k * q + c];
      b[i * q + c] = s / l[i * p + i];
    }
    for (let i = p - 1; i >= 0; i--) {
      let s = b[i * q + c];
      for (let k = i + 1; k < p; k++) s -= l[k * p + i] * b[k * q + c];
      b[i * q + c] = s / l[i * p + i];
    }
  }
  return b;
}

/**
 * Ridge solution W (p×q) of min ‖XW − Y‖² + Σᵢ penaltyᵢ‖Wᵢ‖² given G = XᵀX and C = XᵀY.
 * Adds a tiny relative jitter when G + diag(penalty) is singular (collinear columns), so a
 * degenerate problem returns the minimum-norm-like answer instead of throwing.
 */
export function ridgeSolve(
  gram: Float64Array,
  cross: Float64Array,
  p: number,
  q: number,
  penalty: ArrayLike<number>,
): Float64Array {
  let scale = 0;
  for (let i = 0; i < p; i++) scale = Math.max(scale, gram[i * p + i]);
  for (let jitter = 0; ; jitter = jitter === 0 ? 1e-12 : jitter * 100) {
    const a = Float64Array.from(gram);
    for (let i = 0; i < p; i++) a[i * p + i] += penalty[i] + jitter * (scale || 1);
    if (cholesky(a, p)) return choleskySolve(a, p, Float64Array.from(cross), q);
    if (jitter > 1) return new Float64Array(p * q);
  }
}
