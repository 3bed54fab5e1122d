// 4×4 matrices, column-major (element (row r, column c) at 4c + r), stored at an offset.
// Every op writes into `out` after reading its inputs into locals, so aliasing is safe.
import type { NumArray } from './types.js';

/** out = identity. */
export function mat4Identity(out: NumArray, o: number): NumArray {
  for (let i = 0; i < 16; i++) out[o + i] = i % 5 === 0 ? 1 : 0;
  return out;
}

/** out = T(t) · R(q) · S(s). */
export function mat4Compose(
  out: NumArray,
  o: number,
  t: NumArray,
  to: number,
  q: NumArray,
  qo: number,
  s: NumArray,
  so: number,
): NumArray {
  const x = q[qo], y = q[qo + 1], z = q[qo + 2], w = q[qo + 3]; // prettier-ignore
  const sx = s[so], sy = s[so + 1], sz = s[so + 2]; // prettier-ignore
  const x2 = x + x, y2 = y + y, z2 = z + z; // prettier-ignore
  const xx = x * x2, xy = x * y2, xz = x * z2; // prettier-ignore
  const yy = y * y2, yz = y * z2, zz = z * z2; // prettier-ignore
  const wx = w * x2, wy = w * y2, wz = w * z2; // prettier-ignore
  const tx = t[to], ty = t[to + 1], tz = t[to + 2]; // prettier-ignore
  out[o] = (1 - (yy + zz)) * sx;
  out[o + 1] = (xy + wz) * sx;
  out[o + 2] = (xz - wy) * sx;
  out[o + 3] = 0;
  out[o + 4] = (xy - wz) * sy;
  out[o + 5] = (1 - (xx + zz)) * sy;
  out[o + 6] = (yz + wx) * sy;
  out[o + 7] = 0;
  out[o + 8] = (xz + wy) * sz;
  out[o + 9] = (yz - wx) * sz;
  out[o + 10] = (1 - (xx + yy)) * sz;
  out[o + 11] = 0;
  out[o + 12] = tx;
  out[o + 13] = ty;
  out[o + 14] = tz;
  out[o + 15] = 1;
  return out;
}

/** out = a · b. */
export function mat4Multiply(
  out: NumArray,
  o: number,
  a: NumArray,
  ao: number,
  b: NumArray,
  bo: number,
): NumArray {
  const a00 = a[ao], a10 = a[ao + 1], a20 = a[ao + 2], a30 = a[ao + 3]; // prettier-ignore
  const a01 = a[ao + 4], a11 = a[ao + 5], a21 = a[ao + 6], a31 = a[ao + 7]; // prettier-ignore
  const a02 = a[ao + 8], a12 = a[ao + 9], a22 = a[ao + 10], a32 = a[ao + 11]; // prettier-ignore
  const a03 = a[ao + 12], a13 = a[ao + 13], a23 = a[ao + 14], a33 = a[ao + 15]; // prettier-ignore
  for (let c = 0; c < 4; c++) {
    const b0 = b[bo + 4 * c], b1 = b[bo + 4 * c + 1], b2 = b[bo + 4 * c + 2], b3 = b[bo + 4 * c + 3]; // prettier-ignore
    out[o + 4 * c] = a00 * b0 + a01 * b1 + a02 * b2 + a03 * b3;
    out[o + 4 * c + 1] = a10 * b0 + a11 * b1 + a12 * b2 + a13 * b3;
    out[o + 4 * c + 2] = a20 * b0 + a21 * b1 + a22 * b2 + a23 * b3;
    out[o + 4 * c + 3] = a30 * b0 + a31 * b1 + a32 * b2 + a33 * b3;
  }
  return out;
}

/**
 * out = a⁻¹ by cofactors. Returns false and writes zeros when a is singular (|det| ≤ 1e-300).
 */
export function mat4Invert(out: NumArray, o: number, a: NumArray, ao: number): boolean {
  const n11 = a[ao], n21 = a[ao + 1], n31 = a[ao + 2], n41 = a[ao + 3]; // prettier-ignore
  const n12 = a[ao + 4], n22 = a[ao + 5], n32 = a[ao + 6], n42 = a[ao + 7]; // prettier-ignore
  const n13 = a[ao + 8], n23 = a[ao + 9], n33 = a[ao + 10], n43 = a[ao + 11]; // prettier-ignore
  const n14 = a[ao + 12], n24 = a[ao + 13], n34 = a[ao + 14], n44 = a[ao + 15]; // prettier-ignore
  const t11 = n23 * n34 * n42 - n24 * n33 * n42 + n24 * n32 * n43 - n22 * n34 * n43 - n23 * n32 * n44 + n22 * n33 * n44; // prettier-ignore
  const t12 = n14 * n33 * n42 - n13 * n34 * n42 - n14 * n32 * n43 + n12 * n34 * n43 + n13 * n32 * n44 - n12 * n33 * n44; // prettier-ignore
  const t13 = n13 * n24 * n42 - n14 * n23 * n42 + n14 * n22 * n43 - n12 * n24 * n43 - n13 * n22 * n44 + n12 * n23 * n44; // prettier-ignore
  const t14 = n14 * n23 * n32 - n13 * n24 * n32 - n14 * n22 * n33 + n12 * n24 * n33 + n13 * n22 * n34 - n12 * n23 * n34; // prettier-ignore
  const det = n11 * t11 + n21 * t12 + n31 * t13 + n41 * t14;
  if (!(Math.abs(det) > 1e-300)) {
    for (let i = 0; i < 16; i++) out[o + i] = 0;
    return false;
  }
  const d = 1 / det;
  out[o] = t11 * d;
  out[o + 1] = (n24 * n33 * n41 - n23 * n34 * n41 - n24 * n31 * n43 + n21 * n34 * n43 + n23 * n31 * n44 - n21 * n33 * n44) * d; // prettier-ignore
  out[o + 2] = (n22 * n34 * n41 - n24 * n32 * n41 + n24 * n31 * n42 - n21 * n34 * n42 - n22 * n31 * n44 + n21 * n32 * n44) * d; // prettier-ignore
  out[o + 3] = (n23 * n32 * n41 - n22 * n33 * n41 - n23 * n31 * n42 + n21 * n33 * n42 + n22 * n31 * n43 - n21 * n32 * n43) * d; // prettier-ignore
  out[o + 4] = t12 * d;
  out[o + 5] = (n13 * n34 * n41 - n14 * n33 * n41 + n14 * n31 * n43 - n11 * n34 * n43 - n13 * n31 * n44 + n11 * n33 * n44) * d; // prettier-ignore
  out[o + 6] = (n14 * n32 * n41 - n12 * n34 * n41 - n14 * n31 * n42 + n11 * n34 * n42 + n12 * n31 * n44 - n11 * n32 * n44) * d; // prettier-ignore
  out[o + 7] = (n12 * n33 * n41 - n13 * n32 * n41 + n13 * n31 * n42 - n11 * n33 * n42 - n12 * n31 * n43 + n11 * n32 * n43) * d; // prettier-ignore
  out[o + 8] = t13 * d;
  out[o + 9] = (n14 * n23 * n41 - n13 * n24 * n41 - n14 * n21 * n43 + n11 * n24 * n43 + n13 * n21 * n44 - n11 * n23 * n44) * d; // prettier-ignore
  out[o + 10] = (n12 * n24 * n41 - n14 * n22 * n41 + n14 * n21 * n42 - n11 * n24 * n42 - n12 * n21 * n44 + n11 * n22 * n44) * d; // prettier-ignore
  out[o + 11] = (n13 * n22 * n41 - n12 * n23 * n41 - n13 * n21 * n42 + n11 * n23 * n42 + n12 * n21 * n43 - n11 * n22 * n43) * d; // prettier-ignore
  out[o + 12] = t14 * d;
  out[o + 13] = (n13 * n24 * n31 - n14 * n23 * n31 + n14 * n21 * n33 - n11 * n24 * n33 - n13 * n21 * n34 + n11 * n23 * n34) * d; // prettier-ignore
  out[o + 14] = (n14 * n22 * n31 - n12 * n24 * n31 - n14 * n21 * n32 + n11 * n24 * n32 + n12 * n21 * n34 - n11 * n22 * n34) * d; // prettier-ignore
  out[o + 15] = (n12 * n23 * n31 - n13 * n22 * n31 + n13 * n21 * n32 - n11 * n23 * n32 - n12 * n21 * n33 + n11 * n22 * n33) * d; // prettier-ignore
  return true;
}

/** out = m · (v, 1), the transformed point (affine matrices only; w is ignored). */
export function mat4TransformPoint(
  out: NumArray,
  o: number,
  m: NumArray,
  mo: number,
  v: NumArray,
  vo: number,
): NumArray {
  const x = v[vo], y = v[vo + 1], z = v[vo + 2]; // prettier-ignore
  out[o] = m[mo] * x + m[mo + 4] * y + m[mo + 8] * z + m[mo + 12];
  out[o + 1] = m[mo + 1] * x + m[mo + 5] * y + m[mo + 9] * z + m[mo + 13];
  out[o + 2] = m[mo + 2] * x + m[mo + 6] * y + m[mo + 10] * z + m[mo + 14];
  return out;
}

/** Copies 16 values from a[ao] to out[o]. */
export function mat4Copy(out: NumArray, o: number, a: NumArray, ao: number): NumArray {
  for (let i = 0; i < 16; i++) out[o + i] = a[ao + i];
  return out;
}
