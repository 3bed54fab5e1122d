// Big products over frame-major snapshot matrices X (T rows of D = 3N floats): the T×T Gram XXᵀ,
// and the two thin products (XᵀV)ᵀ (K×D) and XWᵀ (T×K). These dominate learning.
//
// Approaches tried (Gram of 600 × 22,686 Float32 snapshots, Node 20 on this 2-core machine;
// bench/learn.bench.ts prints the current figures):
// - ml-matrix mmul: about 27 s (extrapolated from a 2,000-column slice).
// - plain loop, one dot product per (i, j) pair: 8.3 s.
// - column blocks of BLOCK floats (rows stay in cache), one row i against four rows j: 4.2 s.
// - kept: column blocks with 4 × 4 register blocks (each load feeds four sums): 2.4 s.
// - not tried yet: a WASM-SIMD compute library from the registry, and splitting the (i, j) blocks
//   over worker threads.

/** Floats per column block: 600 rows × 512 × 4 bytes stay within a typical L2 cache. */
const BLOCK = 512;

/** Gram matrix XXᵀ (T×T, Float64, row-major) of the row-major T×D matrix X. */
export function snapshotGram(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  out = new Float64Array(t * t),
): Float64Array {
  out.fill(0);
  for (let c0 = 0; c0 < d; c0 += BLOCK) {
    const c1 = Math.min(d, c0 + BLOCK);
    let i = 0;
    // 4 × 4 register blocks: every loaded value feeds four accumulators.
    for (; i + 4 <= t; i += 4) {
      const a0 = i * d, a1 = a0 + d, a2 = a1 + d, a3 = a2 + d; // prettier-ignore
      let j = 0;
      for (; j + 4 <= i + 4; j += 4) {
        const b0 = j * d, b1 = b0 + d, b2 = b1 + d, b3 = b2 + d; // prettier-ignore
        let s00 = 0, s01 = 0, s02 = 0, s03 = 0, s10 = 0, s11 = 0, s12 = 0, s13 = 0; // prettier-ignore
        let s20 = 0, s21 = 0, s22 = 0, s23 = 0, s30 = 0, s31 = 0, s32 = 0, s33 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const x0 = x[a0 + c], x1 = x[a1 + c], x2 = x[a2 + c], x3 = x[a3 + c]; // prettier-ignore
          const y0 = x[b0 + c], y1 = x[b1 + c], y2 = x[b2 + c], y3 = x[b3 + c]; // prettier-ignore
          s00 += x0 * y0;
          s01 += x0 * y1;
          s02 += x0 * y2;
          s03 += x0 * y3; // prettier-ignore
          s10 += x1 * y0;
          s11 += x1 * y1;
          s12 += x1 * y2;
          s13 += x1 * y3; // prettier-ignore
          s20 += x2 * y0;
          s21 += x2 * y1;
          s22 += x2 * y2;
          s23 += x2 * y3; // prettier-ignore
          s30 += x3 * y0;
          s31 += x3 * y1;
          s32 += x3 * y2;
          s33 += x3 * y3; // prettier-ignore
        }
        const o0 = i * t + j, o1 = o0 + t, o2 = o1 + t, o3 = o2 + t; // prettier-ignore
        out[o0] += s00;
        out[o0 + 1] += s01;
        out[o0 + 2] += s02;
        out[o0 + 3] += s03; // prettier-ignore
        out[o1] += s10;
        out[o1 + 1] += s11;
        out[o1 + 2] += s12;
        out[o1 + 3] += s13; // prettier-ignore
        out[o2] += s20;
        out[o2 + 1] += s21;
        out[o2 + 2] += s22;
        out[o2 + 3] += s23; // prettier-ignore
        out[o3] += s30;
        out[o3 + 1] += s31;
        out[o3 + 2] += s32;
        out[o3 + 3] += s33; // prettier-ignore
      }
    }
    // Leftover rows (t not a multiple of 4).
    for (; i < t; i++) {
      const oi = i * d;
      for (let j = 0; j <= i; j++) {
        const oj = j * d;
        let s = 0;
        for (let c = c0; c < c1; c++) s += x[oi + c] * x[oj + c];
        out[i * t + j] += s;
      }
    }
  }
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
  out.fill(0);
  for (let c0 = 0; c0 < d; c0 += BLOCK) {
    const c1 = Math.min(d, c0 + BLOCK);
    for (let r = 0; r < t; r++) {
      const ox = r * d;
      for (let q = 0; q < k; q++) {
        const w = v[r * k + q];
        if (w === 0) continue;
        const oo = q * d;
        for (let c = c0; c < c1; c++) out[oo + c] += w * x[ox + c];
      }
    }
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
  for (let c0 = 0; c0 < d; c0 += BLOCK) {
    const c1 = Math.min(d, c0 + BLOCK);
    for (let r = 0; r < t; r++) {
      const ox = r * d;
      let q = 0;
      for (; q + 4 <= k; q += 4) {
        const o0 = q * d, o1 = o0 + d, o2 = o1 + d, o3 = o2 + d; // prettier-ignore
        let s0 = 0, s1 = 0, s2 = 0, s3 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const xv = x[ox + c];
          s0 += xv * w[o0 + c];
          s1 += xv * w[o1 + c];
          s2 += xv * w[o2 + c];
          s3 += xv * w[o3 + c];
        }
        out[r * k + q] += s0;
        out[r * k + q + 1] += s1;
        out[r * k + q + 2] += s2;
        out[r * k + q + 3] += s3;
      }
      for (; q < k; q++) {
        const oq = q * d;
        let s = 0;
        for (let c = c0; c < c1; c++) s += x[ox + c] * w[oq + c];
        out[r * k + q] += s;
      }
    }
  }
  return out;
}
