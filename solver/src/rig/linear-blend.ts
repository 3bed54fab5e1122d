// Linear blend skinning: v' = Σ wⱼ Sⱼ v with four influences per vertex, into caller buffers.
// Blending the four 3×4 matrices first and applying once is cheaper than skinning the point
// four times (12·4 + 9 multiply-adds against 4·12 + 4·3) and is reused for normals.
// The blend is written out in each kernel (here and in unpose.ts) on purpose: a shared helper
// writing into a scratch array measured 2.1× slower for skinning and 2.8× for unposing.

/**
 * Skins positions: out[3i..] = Σ wᵢⱼ · Sⱼ · rest[3i..] for vertices [start, end).
 * `skin` holds one column-major 4×4 per joint.
 */
export function skinPositions(
  rest: ArrayLike<number>,
  joints: ArrayLike<number>,
  weights: ArrayLike<number>,
  skin: Float64Array,
  out: Float32Array | Float64Array,
  start = 0,
  end = rest.length / 3,
): Float32Array | Float64Array {
  for (let i = start; i < end; i++) {
    let m0 = 0, m1 = 0, m2 = 0, m4 = 0, m5 = 0, m6 = 0; // prettier-ignore
    let m8 = 0, m9 = 0, m10 = 0, m12 = 0, m13 = 0, m14 = 0; // prettier-ignore
    for (let k = 0; k < 4; k++) {
      const w = weights[4 * i + k];
      if (w === 0) continue;
      const o = 16 * joints[4 * i + k];
      m0 += w * skin[o];
      m1 += w * skin[o + 1];
      m2 += w * skin[o + 2];
      m4 += w * skin[o + 4];
      m5 += w * skin[o + 5];
      m6 += w * skin[o + 6];
      m8 += w * skin[o + 8];
      m9 += w * skin[o + 9];
      m10 += w * skin[o + 10];
      m12 += w * skin[o + 12];
      m13 += w * skin[o + 13];
      m14 += w * skin[o + 14];
    }
    const x = rest[3 * i], y = rest[3 * i + 1], z = rest[3 * i + 2]; // prettier-ignore
    out[3 * i] = m0 * x + m4 * y + m8 * z + m12;
    out[3 * i + 1] = m1 * x + m5 * y + m9 * z + m13;
    out[3 * i + 2] = m2 * x + m6 * y + m10 * z + m14;
  }
  return out;
}

/**
 * Skins normals with the blended 3×3 and renormalises (exact for rigid joint transforms;
 * for scaled joints this matches common real-time practice rather than the inverse transpose).
 */
export function skinNormals(
  rest: ArrayLike<number>,
  joints: ArrayLike<number>,
  weights: ArrayLike<number>,
  skin: Float64Array,
  out: Float32Array | Float64Array,
  start = 0,
  end = rest.length / 3,
): Float32Array | Float64Array {
  for (let i = start; i < end; i++) {
    let m0 = 0, m1 = 0, m2 = 0, m4 = 0, m5 = 0, m6 = 0, m8 = 0, m9 = 0, m10 = 0; // prettier-ignore
    for (let k = 0; k < 4; k++) {
      const w = weights[4 * i + k];
      if (w === 0) continue;
      const o = 16 * joints[4 * i + k];
      m0 += w * skin[o];
      m1 += w * skin[o + 1];
      m2 += w * skin[o + 2];
      m4 += w * skin[o + 4];
      m5 += w * skin[o + 5];
      m6 += w * skin[o + 6];
      m8 += w * skin[o + 8];
      m9 += w * skin[o + 9];
      m10 += w * skin[o + 10];
    }
    const x = rest[3 * i], y = rest[3 * i + 1], z = rest[3 * i + 2]; // prettier-ignore
    const nx = m0 * x + m4 * y + m8 * z;
    const ny = m1 * x + m5 * y + m9 * z;
    const nz = m2 * x + m6 * y + m10 * z;
    const len = Math.sqrt(nx * nx + ny * ny + nz * nz);
    const inv = len > 0 ? 1 / len : 0;
    out[3 * i] = nx * inv;
    out[3 * i + 1] = ny * inv;
    out[3 * i + 2] = nz * inv;
  }
  return out;
}
