// 3×3 matrices, column-major (element (row r, column c) at 3c + r), stored at an offset.
import type { NumArray } from './types.js';

/** Determinant of the 3×3 at a[ao]. */
export function mat3Determinant(a: NumArray, ao: number): number {
  const a00 = a[ao], a10 = a[ao + 1], a20 = a[ao + 2]; // prettier-ignore
  const a01 = a[ao + 3], a11 = a[ao + 4], a21 = a[ao + 5]; // prettier-ignore
  const a02 = a[ao + 6], a12 = a[ao + 7], a22 = a[ao + 8]; // prettier-ignore
  return (
    a00 * (a11 * a22 - a12 * a21) - a01 * (a10 * a22 - a12 * a20) + a02 * (a10 * a21 - a11 * a20)
  );
}

/** out = a⁻¹. Returns false and leaves `out` untouched when |det| ≤ `eps`. */
export function mat3Invert(
  out: NumArray,
  o: number,
  a: NumArray,
  ao: number,
  eps = 1e-300,
): boolean {
  const a00 = a[ao], a10 = a[ao + 1], a20 = a[ao + 2]; // prettier-ignore
  const a01 = a[ao + 3], a11 = a[ao + 4], a21 = a[ao + 5]; // prettier-ignore
  const a02 = a[ao + 6], a12 = a[ao + 7], a22 = a[ao + 8]; // prettier-ignore
  const c00 = a11 * a22 - a12 * a21;
  const c01 = a12 * a20 - a10 * a22;
  const c02 = a10 * a21 - a11 * a20;
  const det = a00 * c00 + a01 * c01 + a02 * c02;
  if (!(Math.abs(det) > eps)) return false;
  const d = 1 / det;
  out[o] = c00 * d;
  out[o + 1] = c01 * d;
  out[o + 2] = c02 * d;
  out[o + 3] = (a02 * a21 - a01 * a22) * d;
  out[o + 4] = (a00 * a22 - a02 * a20) * d;
  out[o + 5] = (a01 * a20 - a00 * a21) * d;
  out[o + 6] = (a01 * a12 - a02 * a11) * d;
  out[o + 7] = (a02 * a10 - a00 * a12) * d;
  out[o + 8] = (a00 * a11 - a01 * a10) * d;
  return true;
}

/** out = upper-left 3×3 of the column-major 4×4 at m[mo]. */
export function mat3FromMat4(out: NumArray, o: number, m: NumArray, mo: number): NumArray {
  for (let c = 0; c < 3; c++) {
    out[o + 3 * c] = m[mo + 4 * c];
    out[o + 3 * c + 1] = m[mo + 4 * c + 1];
    out[o + 3 * c + 2] = m[mo + 4 * c + 2];
  }
  return out;
}
