// Symmetric eigen-decomposition on both paths (Jacobi rotations up to 24 × 24, tridiagonal QL
// above): checked by its defining properties, A v = λ v with orthonormal v, values descending.
import { describe, expect, it } from 'vitest';
import { symmetricEigen } from '../../src/index.js';
import { seededRandom } from '../helpers/random.js';

/** A random symmetric positive semi-definite n × n matrix B Bᵀ. */
function randomSpd(n: number, seed: number): Float64Array {
  const rand = seededRandom(seed);
  const b = Float64Array.from({ length: n * n }, () => rand() - 0.5);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) a[i * n + j] += b[i * n + k] * b[j * n + k];
    }
  }
  return a;
}

describe('symmetricEigen', () => {
  for (const n of [20, 24, 25, 54]) {
    it(`solves a ${n} × ${n} matrix: A v = λ v, orthonormal vectors, values descending`, () => {
      const a = randomSpd(n, n);
      const values = new Float64Array(n);
      const v = new Float64Array(n * n);
      symmetricEigen(a.slice(), n, values, v);
      const tol = 1e-10 * values[0];
      for (let k = 1; k < n; k++) expect(values[k]).toBeLessThanOrEqual(values[k - 1]);
      for (let k = 0; k < n; k++) {
        for (let i = 0; i < n; i++) {
          let av = 0;
          for (let j = 0; j < n; j++) av += a[i * n + j] * v[j * n + k];
          expect(Math.abs(av - values[k] * v[i * n + k])).toBeLessThan(tol);
        }
        for (let m = 0; m <= k; m++) {
          let dot = 0;
          for (let i = 0; i < n; i++) dot += v[i * n + k] * v[i * n + m];
          expect(Math.abs(dot - (m === k ? 1 : 0))).toBeLessThan(1e-10);
        }
      }
    });
  }
});
