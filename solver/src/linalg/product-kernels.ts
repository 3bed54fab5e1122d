// The inner loops of the big snapshot products, each over one share of its output so that the
// same code runs whole on one thread or split across worker threads (kernel-threads.ts). Every
// output element is summed by exactly one share in the same order, so a split result is
// bit-identical to the whole one. These functions must stay self-contained (no imports, no
// closures, no helpers): the worker threads receive their source text.
// In scalar JavaScript a 4 × 4 register block (every loaded value feeds four sums; 16 sums and
// 8 loads per step) is as far as blocking pays; see gram-kernel.ts for the timings.

/**
 * Lower-triangle 4 × 4 blocks of XXᵀ for the row quads q with q mod `parts` = `part` (rows left
 * over when t is not a multiple of 4 belong to part 0), accumulated into `out` (T×T, zeroed by
 * the caller; upper triangle of diagonal blocks also written, the rest left for the caller to
 * mirror).
 */
export function gramShare(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  out: Float64Array,
  part: number,
  parts: number,
): void {
  // Columns per block: 600 rows × 512 floats stay in a typical L2 cache.
  const block = 512;
  const quads = t >> 2;
  for (let c0 = 0; c0 < d; c0 += block) {
    const c1 = Math.min(d, c0 + block);
    for (let qi = part; qi < quads; qi += parts) {
      const i = 4 * qi;
      const a0 = i * d, a1 = a0 + d, a2 = a1 + d, a3 = a2 + d; // prettier-ignore
      for (let j = 0; j <= i; j += 4) {
        const b0 = j * d, b1 = b0 + d, b2 = b1 + d, b3 = b2 + d; // prettier-ignore
        let s00 = 0, s01 = 0, s02 = 0, s03 = 0, s10 = 0, s11 = 0, s12 = 0, s13 = 0; // prettier-ignore
        let s20 = 0, s21 = 0, s22 = 0, s23 = 0, s30 = 0, s31 = 0, s32 = 0, s33 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const x0 = x[a0 + c], x1 = x[a1 + c], x2 = x[a2 + c], x3 = x[a3 + c]; // prettier-ignore
          const y0 = x[b0 + c], y1 = x[b1 + c], y2 = x[b2 + c], y3 = x[b3 + c]; // prettier-ignore
          s00 += x0 * y0;
          s01 += x0 * y1;
          s02 += x0 * y2;
          s03 += x0 * y3;
          s10 += x1 * y0;
          s11 += x1 * y1;
          s12 += x1 * y2;
          s13 += x1 * y3;
          s20 += x2 * y0;
          s21 += x2 * y1;
          s22 += x2 * y2;
          s23 += x2 * y3;
          s30 += x3 * y0;
          s31 += x3 * y1;
          s32 += x3 * y2;
          s33 += x3 * y3;
        }
        const o0 = i * t + j, o1 = o0 + t, o2 = o1 + t, o3 = o2 + t; // prettier-ignore
        out[o0] += s00;
        out[o0 + 1] += s01;
        out[o0 + 2] += s02;
        out[o0 + 3] += s03;
        out[o1] += s10;
        out[o1 + 1] += s11;
        out[o1 + 2] += s12;
        out[o1 + 3] += s13;
        out[o2] += s20;
        out[o2 + 1] += s21;
        out[o2 + 2] += s22;
        out[o2 + 3] += s23;
        out[o3] += s30;
        out[o3 + 1] += s31;
        out[o3 + 2] += s32;
        out[o3 + 3] += s33;
      }
    }
    if (part !== 0) continue;
    for (let i = 4 * quads; i < t; i++) {
      const oi = i * d;
      for (let j = 0; j <= i; j++) {
        const oj = j * d;
        let s = 0;
        for (let c = c0; c < c1; c++) s += x[oi + c] * x[oj + c];
        out[i * t + j] += s;
      }
    }
  }
}

/**
 * Columns [c0, c1) of (XᵀV)ᵀ (K rows of D; row q = Σ_r V[r, q] X[r, :]) for row-major X (T×D)
 * and V (T×K), written into `out` (K×D). Each 16-column slab of X and each 4-column slice of V
 * are first packed contiguously so the 4 × 4 block reads both sequentially, and every sum runs
 * over all T rows in registers (no read-modify-write of `out`).
 */
export function transposedShare(
  x: Float32Array | Float64Array,
  t: number,
  d: number,
  v: Float32Array | Float64Array,
  k: number,
  out: Float64Array,
  c0: number,
  c1: number,
): void {
  const slab = 16;
  const kq = (k + 3) >> 2;
  const xp = new Float64Array(t * slab);
  const vp = new Float64Array(kq * t * 4);
  for (let qq = 0; qq < kq; qq++) {
    for (let r = 0; r < t; r++) {
      for (let a = 0; a < 4; a++) {
        const q = 4 * qq + a;
        vp[(qq * t + r) * 4 + a] = q < k ? v[r * k + q] : 0;
      }
    }
  }
  for (let s0 = c0; s0 < c1; s0 += slab) {
    const w = Math.min(slab, c1 - s0);
    for (let r = 0; r < t; r++) {
      const o = r * d + s0;
      const p = r * slab;
      for (let c = 0; c < w; c++) xp[p + c] = x[o + c];
      for (let c = w; c < slab; c++) xp[p + c] = 0;
    }
    for (let qq = 0; qq < kq; qq++) {
      const vo = qq * t * 4;
      const q = 4 * qq;
      for (let cc = 0; cc < w; cc += 4) {
        let s00 = 0, s01 = 0, s02 = 0, s03 = 0, s10 = 0, s11 = 0, s12 = 0, s13 = 0; // prettier-ignore
        let s20 = 0, s21 = 0, s22 = 0, s23 = 0, s30 = 0, s31 = 0, s32 = 0, s33 = 0; // prettier-ignore
        for (let r = 0; r < t; r++) {
          const p = r * slab + cc;
          const o = vo + 4 * r;
          const x0 = xp[p], x1 = xp[p + 1], x2 = xp[p + 2], x3 = xp[p + 3]; // prettier-ignore
          const v0 = vp[o], v1 = vp[o + 1], v2 = vp[o + 2], v3 = vp[o + 3]; // prettier-ignore
          s00 += v0 * x0;
          s01 += v0 * x1;
          s02 += v0 * x2;
          s03 += v0 * x3;
          s10 += v1 * x0;
          s11 += v1 * x1;
          s12 += v1 * x2;
          s13 += v1 * x3;
          s20 += v2 * x0;
          s21 += v2 * x1;
          s22 += v2 * x2;
          s23 += v2 * x3;
          s30 += v3 * x0;
          s31 += v3 * x1;
          s32 += v3 * x2;
          s33 += v3 * x3;
        }
        const o0 = q * d + s0 + cc, o1 = o0 + d, o2 = o1 + d, o3 = o2 + d; // prettier-ignore
        if (cc + 4 <= w && q + 4 <= k) {
          out[o0] = s00;
          out[o0 + 1] = s01;
          out[o0 + 2] = s02;
          out[o0 + 3] = s03;
          out[o1] = s10;
          out[o1 + 1] = s11;
          out[o1 + 2] = s12;
          out[o1 + 3] = s13;
          out[o2] = s20;
          out[o2 + 1] = s21;
          out[o2 + 2] = s22;
          out[o2 + 3] = s23;
          out[o3] = s30;
          out[o3 + 1] = s31;
          out[o3 + 2] = s32;
          out[o3 + 3] = s33;
          continue;
        }
        // Edge block: only the rows below K and the columns inside the slab exist.
        // prettier-ignore
        const sums = [s00, s01, s02, s03, s10, s11, s12, s13, s20, s21, s22, s23, s30, s31, s32, s33];
        for (let a = 0; a < 4 && q + a < k; a++) {
          for (let b = 0; b < 4 && cc + b < w; b++) out[o0 + a * d + b] = sums[4 * a + b];
        }
      }
    }
  }
}

/**
 * Rows [r0, r1) of Y = X Wᵀ (T×K, Y[r, q] = X[r, :] · W[q, :]) for row-major X (T×D) and W in
 * the K×D basis layout, accumulated into `out` (zeroed by the caller).
 */
export function byRowsShare(
  x: Float32Array | Float64Array,
  d: number,
  w: Float32Array | Float64Array,
  k: number,
  out: Float64Array,
  r0: number,
  r1: number,
): void {
  const block = 512;
  for (let c0 = 0; c0 < d; c0 += block) {
    const c1 = Math.min(d, c0 + block);
    let r = r0;
    for (; r + 4 <= r1; r += 4) {
      const a0 = r * d, a1 = a0 + d, a2 = a1 + d, a3 = a2 + d; // prettier-ignore
      let q = 0;
      for (; q + 4 <= k; q += 4) {
        const b0 = q * d, b1 = b0 + d, b2 = b1 + d, b3 = b2 + d; // prettier-ignore
        let s00 = 0, s01 = 0, s02 = 0, s03 = 0, s10 = 0, s11 = 0, s12 = 0, s13 = 0; // prettier-ignore
        let s20 = 0, s21 = 0, s22 = 0, s23 = 0, s30 = 0, s31 = 0, s32 = 0, s33 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const x0 = x[a0 + c], x1 = x[a1 + c], x2 = x[a2 + c], x3 = x[a3 + c]; // prettier-ignore
          const y0 = w[b0 + c], y1 = w[b1 + c], y2 = w[b2 + c], y3 = w[b3 + c]; // prettier-ignore
          s00 += x0 * y0;
          s01 += x0 * y1;
          s02 += x0 * y2;
          s03 += x0 * y3;
          s10 += x1 * y0;
          s11 += x1 * y1;
          s12 += x1 * y2;
          s13 += x1 * y3;
          s20 += x2 * y0;
          s21 += x2 * y1;
          s22 += x2 * y2;
          s23 += x2 * y3;
          s30 += x3 * y0;
          s31 += x3 * y1;
          s32 += x3 * y2;
          s33 += x3 * y3;
        }
        const o0 = r * k + q, o1 = o0 + k, o2 = o1 + k, o3 = o2 + k; // prettier-ignore
        out[o0] += s00;
        out[o0 + 1] += s01;
        out[o0 + 2] += s02;
        out[o0 + 3] += s03;
        out[o1] += s10;
        out[o1 + 1] += s11;
        out[o1 + 2] += s12;
        out[o1 + 3] += s13;
        out[o2] += s20;
        out[o2 + 1] += s21;
        out[o2 + 2] += s22;
        out[o2 + 3] += s23;
        out[o3] += s30;
        out[o3 + 1] += s31;
        out[o3 + 2] += s32;
        out[o3 + 3] += s33;
      }
      // Remaining rows of W (K not a multiple of 4): four rows of X against one, 4 sums.
      for (; q < k; q++) {
        const b = q * d;
        let s0 = 0, s1 = 0, s2 = 0, s3 = 0; // prettier-ignore
        for (let c = c0; c < c1; c++) {
          const y = w[b + c];
          s0 += x[a0 + c] * y;
          s1 += x[a1 + c] * y;
          s2 += x[a2 + c] * y;
          s3 += x[a3 + c] * y;
        }
        out[r * k + q] += s0;
        out[(r + 1) * k + q] += s1;
        out[(r + 2) * k + q] += s2;
        out[(r + 3) * k + q] += s3;
      }
    }
    for (; r < r1; r++) {
      const a = r * d;
      for (let q = 0; q < k; q++) {
        const b = q * d;
        let s = 0;
        for (let c = c0; c < c1; c++) s += x[a + c] * w[b + c];
        out[r * k + q] += s;
      }
    }
  }
}
