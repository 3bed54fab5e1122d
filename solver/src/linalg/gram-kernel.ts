// Big products over frame-major snapshot matrices X (T rows of D = 3N floats): the T×T Gram XXᵀ,
// and the two thin products (XᵀV)ᵀ (K×D) and XWᵀ (T×K). These dominate the subspace stage of
// learning. The loops live in product-kernels.ts; with startKernelThreads (Node) each product is
// split over worker threads, else it runs on the calling thread.
//
// Approaches tried (Gram of 600 × 22,686 Float32 snapshots = 4.1·10⁹ multiply-adds; Node 20 on
// this 2-core machine, shared with other jobs at load average 3–22 while measuring, so wall
// times moved by up to 5×; "cpu" is the busiest thread's CPU time, which is what the wall time
// would be with a free core per thread; bench/product-kernels.bench.ts prints both):
// - ml-matrix mmul: about 27 s (extrapolated from a 2,000-column slice).
// - plain loop, one dot product per (i, j) pair: 8.3 s.
// - column blocks of 512 floats, one row i against four rows j: 4.2 s.
// - ml-matrix mmul, same run as the rows below: 21 s cpu (from a 2,000-column slice); plain loop
//   5.9 s cpu (×3.5 ml-matrix).
// - column blocks with 4 × 4 register blocks (each load feeds four sums): 2.0 s cpu (×10.4
//   ml-matrix) — kept.
// - the same over 64–256-column tiles packed into contiguous Float64 first, or 2 × 4 blocks:
//   2.0 s cpu, no better (scalar JavaScript is compute-bound here, and Float32 arithmetic is no
//   faster than Float64 in it, so Float32 buys nothing in this kernel).
// - tfjs-core 4.22 + tfjs-backend-wasm SIMD matMul (Float32 sums, relative error 1e-6–1e-5):
//   with transposeB 6.0 s cpu (its transposed path is not the fast one); on a pre-transposed
//   copy 0.73 s cpu, 2.8× the kernel (×29 ml-matrix). Not kept: it would be a runtime dependency
//   (it is a devDependency, for this comparison) and its sums are Float32.
// - the kernel split over worker threads (kernel-threads.ts), 1 worker + the calling thread:
//   busiest thread 0.98 s cpu (2.1× one thread, ×21 ml-matrix; bit-identical result); 2 workers:
//   0.63 s cpu each, but 3 threads on 2 cores gain nothing in wall time. Kept, as an option
//   (Node only): with one worker the wall time fell from 5.8 to 3.2 s even at load average 11.
// (XᵀV)ᵀ was an axpy per (row, column) pair, reading and writing the output: 1.27 s cpu for
// K = 42; a 4 × 4 register block over packed 16-column slabs sums each output in registers:
// 0.33 s cpu (3.8×; 0.18 s with one worker). XWᵀ with 4 × 4 blocks instead of 1 × 4: 0.31 against
// 0.43 s cpu (0.16 s with one worker).
import { splitProduct } from './kernel-threads.js';
import { byRowsShare, gramShare, transposedShare } from './product-kernels.js';

/** Gram matrix XXᵀ (T×T, Float64, row-major) of the row-major T×D matrix X. */
export function snapshotGram(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  out = new Float64Array(t * t),
): Float64Array {
  out.fill(0);
  if (!splitProduct({ kind: 'gram', x, t, d, out })) gramShare(x, t, d, out, 0, 1);
  // The 4 × 4 diagonal blocks filled both triangles; mirror the lower triangle everywhere.
  for (let i = 0; i < t; i++) for (let j = i + 1; j < t; j++) out[i * t + j] = out[j * t + i];
  return out;
}

/**
 * Bᵀ = (Xᵀ V)ᵀ: K rows of D floats (row q = Σ_r V[r, q] · X[r, :]) for row-major X (T×D) and
 * V (T×K). The K×D layout is the profile's basis layout (one column of length D per row).
 */
export function multiplyTransposed(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  v: Float64Array,
  k: number,
  out = new Float64Array(k * d),
): Float64Array {
  if (!splitProduct({ kind: 'transposed', x, t, d, y: v, k, out })) {
    transposedShare(x, t, d, v, k, out, 0, d);
  }
  return out;
}

/**
 * Y = X Wᵀ (T×K, row-major Float64): Y[r, q] = X[r, :] · W[q, :] for row-major X (T×D) and W in
 * the K×D basis layout.
 */
export function multiplyByRows(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  w: Float32Array | Float64Array,
  k: number,
  out = new Float64Array(t * k),
): Float64Array {
  out.fill(0);
  if (!splitProduct({ kind: 'byRows', x, t, d, y: w, k, out })) byRowsShare(x, d, w, k, out, 0, t);
  return out;
}
