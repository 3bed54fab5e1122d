// Eigen-decomposition of small symmetric matrices by cyclic Jacobi rotations. Used on 4×4
// problems inside per-joint, per-frame loops, where a general library would allocate per call.
// Approaches tried: ml-matrix EigenvalueDecomposition works but allocates several objects per
// call; Jacobi on a caller-owned scratch array allocates nothing and converges in ~5 sweeps.
// Above JACOBI_MAX_SIZE the O(n³)-per-sweep Jacobi loses to ml-matrix's Householder
// tridiagonalisation + QL (per call, CPU time: n = 26: 0.53 vs 0.32 ms; n = 42: 2.5 vs 0.93 ms;
// n = 54: 4.7 vs 1.6 ms; n = 16: 0.17 vs 0.15 ms), so larger matrices go there.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';

/** Largest size solved by Jacobi rotations. */
const JACOBI_MAX_SIZE = 24;

/**
 * Eigenvalues (descending) and eigenvectors of the symmetric n×n row-major matrix `a`.
 * `a` is overwritten. `vectors` receives eigenvector k in column k (row-major n×n).
 */
export function symmetricEigen(
  a: Float64Array,
  n: number,
  values: Float64Array,
  vectors: Float64Array,
  maxSweeps = 50,
): void {
  if (n > JACOBI_MAX_SIZE) {
    tridiagonalEigen(a, n, values, vectors);
    return;
  }
  for (let i = 0; i < n * n; i++) vectors[i] = i % (n + 1) === 0 ? 1 : 0;
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    let off = 0;
    let diag = 0;
    for (let p = 0; p < n; p++) {
      diag += a[p * n + p] * a[p * n + p];
      for (let q = p + 1; q < n; q++) off += a[p * n + q] * a[p * n + q];
    }
    if (off <= 1e-30 * diag || off === 0) break;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p * n + q];
        if (apq === 0) continue;
        const app = a[p * n + p];
        const aqq = a[q * n + q];
        const theta = (aqq - app) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = a[k * n + p];
          const akq = a[k * n + q];
          a[k * n + p] = c * akp - s * akq;
          a[k * n + q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = a[p * n + k];
          const aqk = a[q * n + k];
          a[p * n + k] = c * apk - s * aqk;
          a[q * n + k] = s * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = vectors[k * n + p];
          const vkq = vectors[k * n + q];
          vectors[k * n + p] = c * vkp - s * vkq;
          vectors[k * n + q] = s * vkp + c * vkq;
        }
      }
    }
  }
  for (let i = 0; i < n; i++) values[i] = a[i * n + i];
  // Selection sort by descending eigenvalue, swapping vector columns alongside.
  for (let i = 0; i < n - 1; i++) {
    let best = i;
    for (let k = i + 1; k < n; k++) if (values[k] > values[best]) best = k;
    if (best === i) continue;
    const tv = values[i];
    values[i] = values[best];
    values[best] = tv;
    for (let r = 0; r < n; r++) {
      const tmp = vectors[r * n + i];
      vectors[r * n + i] = vectors[r * n + best];
      vectors[r * n + best] = tmp;
    }
  }
}

/** As symmetricEigen (descending values, vectors in columns) by ml-matrix's tridiagonal QL. */
function tridiagonalEigen(
  a: Float64Array,
  n: number,
  values: Float64Array,
  vectors: Float64Array,
): void {
  const m = new Matrix(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) m.set(i, j, a[i * n + j]);
  const e = new EigenvalueDecomposition(m, { assumeSymmetric: true });
  const d = e.realEigenvalues;
  const v = e.eigenvectorMatrix;
  const order = d.map((_, i) => i).sort((x, y) => d[y] - d[x] || x - y);
  for (let k = 0; k < n; k++) {
    values[k] = d[order[k]];
    for (let i = 0; i < n; i++) vectors[i * n + k] = v.get(i, order[k]);
  }
}
