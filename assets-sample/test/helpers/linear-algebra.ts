// Test helper: small dense least squares by normal equations and Gaussian elimination with
// partial pivoting (systems of a few dozen unknowns at most).

/** Solves A x = b for square A (row-major n×n); A and b are copied. */
export function solveSquare(a: ArrayLike<number>, b: ArrayLike<number>, n: number): Float64Array {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r * n + c]) > Math.abs(m[p * n + c])) p = r;
    if (m[p * n + c] === 0) throw new Error('singular system');
    if (p !== c) {
      for (let k = 0; k < n; k++) [m[c * n + k], m[p * n + k]] = [m[p * n + k], m[c * n + k]];
      [x[c], x[p]] = [x[p], x[c]];
    }
    for (let r = c + 1; r < n; r++) {
      const f = m[r * n + c] / m[c * n + c];
      if (f === 0) continue;
      for (let k = c; k < n; k++) m[r * n + k] -= f * m[c * n + k];
      x[r] -= f * x[c];
    }
  }
  for (let c = n - 1; c >= 0; c--) {
    let s = x[c];
    for (let k = c + 1; k < n; k++) s -= m[c * n + k] * x[k];
    x[c] = s / m[c * n + c];
  }
  return x;
}

/**
 * Least-squares coefficients of y ≈ Σ_k coef_k · columns[k] (normal equations; fine for the
 * small, well-conditioned problems of the tests).
 */
export function leastSquares(columns: ArrayLike<number>[], y: ArrayLike<number>): Float64Array {
  const n = columns.length;
  const gram = new Float64Array(n * n);
  const rhs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      let s = 0;
      for (let t = 0; t < y.length; t++) s += columns[i][t] * columns[j][t];
      gram[i * n + j] = s;
      gram[j * n + i] = s;
    }
    let s = 0;
    for (let t = 0; t < y.length; t++) s += columns[i][t] * y[t];
    rhs[i] = s;
  }
  return solveSquare(gram, rhs, n);
}
