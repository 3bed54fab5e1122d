// Inner loops of the per-vertex pose-driven fit (separate.ts), register-blocked: the cross
// products of a group's regressors with one vertex's offsets, and one vertex's pose-driven
// offsets for every frame. Each sum keeps the plain loop's order over frames or features.

/**
 * Cross products of the regressors x (frames × p) with one vertex's offsets y (frames × 3) over
 * frames [from, to), into out[o + 3a + axis]. Four regressors at a time: 12 sums in registers.
 */
export function crossRows(
  x: Float64Array,
  p: number,
  y: Float64Array,
  from: number,
  to: number,
  out: Float64Array,
  o: number,
): void {
  let a = 0;
  for (; a + 4 <= p; a += 4) {
    let s00 = 0, s01 = 0, s02 = 0, s10 = 0, s11 = 0, s12 = 0; // prettier-ignore
    let s20 = 0, s21 = 0, s22 = 0, s30 = 0, s31 = 0, s32 = 0; // prettier-ignore
    for (let t = from; t < to; t++) {
      const xo = t * p + a;
      const x0 = x[xo], x1 = x[xo + 1], x2 = x[xo + 2], x3 = x[xo + 3]; // prettier-ignore
      const y0 = y[3 * t], y1 = y[3 * t + 1], y2 = y[3 * t + 2]; // prettier-ignore
      s00 += x0 * y0;
      s01 += x0 * y1;
      s02 += x0 * y2;
      s10 += x1 * y0;
      s11 += x1 * y1;
      s12 += x1 * y2;
      s20 += x2 * y0;
      s21 += x2 * y1;
      s22 += x2 * y2;
      s30 += x3 * y0;
      s31 += x3 * y1;
      s32 += x3 * y2;
    }
    const b = o + 3 * a;
    out[b] = s00;
    out[b + 1] = s01;
    out[b + 2] = s02;
    out[b + 3] = s10;
    out[b + 4] = s11;
    out[b + 5] = s12;
    out[b + 6] = s20;
    out[b + 7] = s21;
    out[b + 8] = s22;
    out[b + 9] = s30;
    out[b + 10] = s31;
    out[b + 11] = s32;
  }
  for (; a < p; a++) {
    let s0 = 0, s1 = 0, s2 = 0; // prettier-ignore
    for (let t = from; t < to; t++) {
      const xa = x[t * p + a];
      s0 += xa * y[3 * t];
      s1 += xa * y[3 * t + 1];
      s2 += xa * y[3 * t + 2];
    }
    out[o + 3 * a] = s0;
    out[o + 3 * a + 1] = s1;
    out[o + 3 * a + 2] = s2;
  }
}

/**
 * One vertex's pose-driven offsets for every frame: out[t·d + o + axis] = xo[t, :] · rhs[:, axis]
 * for xo (frames × pp) and rhs (pp × 3). Four frames at a time: 12 sums in registers.
 */
export function poseRows(
  xo: Float64Array,
  pp: number,
  rhs: Float64Array,
  frames: number,
  out: Float32Array,
  d: number,
  o: number,
): void {
  let t = 0;
  for (; t + 4 <= frames; t += 4) {
    let a0 = 0, a1 = 0, a2 = 0, b0 = 0, b1 = 0, b2 = 0; // prettier-ignore
    let c0 = 0, c1 = 0, c2 = 0, e0 = 0, e1 = 0, e2 = 0; // prettier-ignore
    const r0 = t * pp, r1 = r0 + pp, r2 = r1 + pp, r3 = r2 + pp; // prettier-ignore
    for (let k = 0; k < pp; k++) {
      const w0 = rhs[3 * k], w1 = rhs[3 * k + 1], w2 = rhs[3 * k + 2]; // prettier-ignore
      const x0 = xo[r0 + k], x1 = xo[r1 + k], x2 = xo[r2 + k], x3 = xo[r3 + k]; // prettier-ignore
      a0 += x0 * w0;
      a1 += x0 * w1;
      a2 += x0 * w2;
      b0 += x1 * w0;
      b1 += x1 * w1;
      b2 += x1 * w2;
      c0 += x2 * w0;
      c1 += x2 * w1;
      c2 += x2 * w2;
      e0 += x3 * w0;
      e1 += x3 * w1;
      e2 += x3 * w2;
    }
    let q = t * d + o;
    out[q] = a0;
    out[q + 1] = a1;
    out[q + 2] = a2;
    q += d;
    out[q] = b0;
    out[q + 1] = b1;
    out[q + 2] = b2;
    q += d;
    out[q] = c0;
    out[q + 1] = c1;
    out[q + 2] = c2;
    q += d;
    out[q] = e0;
    out[q + 1] = e1;
    out[q + 2] = e2;
  }
  for (; t < frames; t++) {
    let px = 0, py = 0, pz = 0; // prettier-ignore
    for (let k = 0; k < pp; k++) {
      const xv = xo[t * pp + k];
      px += xv * rhs[3 * k];
      py += xv * rhs[3 * k + 1];
      pz += xv * rhs[3 * k + 2];
    }
    out[t * d + o] = px;
    out[t * d + o + 1] = py;
    out[t * d + o + 2] = pz;
  }
}
