// Unit quaternions [x, y, z, w] stored at an offset in flat arrays; every op writes into `out`.
// Inputs are read into locals first, so `out` may alias an input.
import type { NumArray } from './types.js';

/** out = a ⊗ b (apply b first, then a). */
export function quatMultiply(
  out: NumArray,
  o: number,
  a: NumArray,
  ao: number,
  b: NumArray,
  bo: number,
): NumArray {
  const ax = a[ao], ay = a[ao + 1], az = a[ao + 2], aw = a[ao + 3]; // prettier-ignore
  const bx = b[bo], by = b[bo + 1], bz = b[bo + 2], bw = b[bo + 3]; // prettier-ignore
  out[o] = ax * bw + aw * bx + ay * bz - az * by;
  out[o + 1] = ay * bw + aw * by + az * bx - ax * bz;
  out[o + 2] = az * bw + aw * bz + ax * by - ay * bx;
  out[o + 3] = aw * bw - ax * bx - ay * by - az * bz;
  return out;
}

/** out = conjugate of a (the inverse for a unit quaternion). */
export function quatConjugate(out: NumArray, o: number, a: NumArray, ao: number): NumArray {
  out[o] = -a[ao];
  out[o + 1] = -a[ao + 1];
  out[o + 2] = -a[ao + 2];
  out[o + 3] = a[ao + 3];
  return out;
}

/** Dot product of two quaternions. */
export function quatDot(a: NumArray, ao: number, b: NumArray, bo: number): number {
  return a[ao] * b[bo] + a[ao + 1] * b[bo + 1] + a[ao + 2] * b[bo + 2] + a[ao + 3] * b[bo + 3];
}

/** Normalises in place; a zero quaternion becomes the identity. */
export function quatNormalize(out: NumArray, o: number): NumArray {
  const x = out[o], y = out[o + 1], z = out[o + 2], w = out[o + 3]; // prettier-ignore
  const len = Math.sqrt(x * x + y * y + z * z + w * w);
  if (len === 0 || !Number.isFinite(len)) {
    out[o] = 0;
    out[o + 1] = 0;
    out[o + 2] = 0;
    out[o + 3] = 1;
    return out;
  }
  const inv = 1 / len;
  out[o] = x * inv;
  out[o + 1] = y * inv;
  out[o + 2] = z * inv;
  out[o + 3] = w * inv;
  return out;
}

/** out = rotation of `angle` radians about the unit axis (x, y, z). */
export function quatFromAxisAngle(
  out: NumArray,
  o: number,
  x: number,
  y: number,
  z: number,
  angle: number,
): NumArray {
  const s = Math.sin(angle / 2);
  out[o] = x * s;
  out[o + 1] = y * s;
  out[o + 2] = z * s;
  out[o + 3] = Math.cos(angle / 2);
  return out;
}

/**
 * Spherical linear interpolation along the shorter arc, t in [0, 1]. Nearly parallel inputs
 * fall back to a normalised linear blend (the arc is too short for sin() to be accurate).
 */
export function quatSlerp(
  out: NumArray,
  o: number,
  a: NumArray,
  ao: number,
  b: NumArray,
  bo: number,
  t: number,
): NumArray {
  const ax = a[ao], ay = a[ao + 1], az = a[ao + 2], aw = a[ao + 3]; // prettier-ignore
  let bx = b[bo], by = b[bo + 1], bz = b[bo + 2], bw = b[bo + 3]; // prettier-ignore
  let cos = ax * bx + ay * by + az * bz + aw * bw;
  if (cos < 0) {
    cos = -cos;
    bx = -bx;
    by = -by;
    bz = -bz;
    bw = -bw;
  }
  let wa: number;
  let wb: number;
  if (cos > 1 - 1e-9) {
    wa = 1 - t;
    wb = t;
  } else {
    const theta = Math.acos(cos);
    const sin = Math.sin(theta);
    wa = Math.sin((1 - t) * theta) / sin;
    wb = Math.sin(t * theta) / sin;
  }
  out[o] = wa * ax + wb * bx;
  out[o + 1] = wa * ay + wb * by;
  out[o + 2] = wa * az + wb * bz;
  out[o + 3] = wa * aw + wb * bw;
  return quatNormalize(out, o);
}

/** out = v rotated by unit quaternion q. */
export function quatRotateVec3(
  out: NumArray,
  o: number,
  q: NumArray,
  qo: number,
  v: NumArray,
  vo: number,
): NumArray {
  const qx = q[qo], qy = q[qo + 1], qz = q[qo + 2], qw = q[qo + 3]; // prettier-ignore
  const vx = v[vo], vy = v[vo + 1], vz = v[vo + 2]; // prettier-ignore
  // t = 2 q×v; v' = v + w t + q×t
  const tx = 2 * (qy * vz - qz * vy);
  const ty = 2 * (qz * vx - qx * vz);
  const tz = 2 * (qx * vy - qy * vx);
  out[o] = vx + qw * tx + qy * tz - qz * ty;
  out[o + 1] = vy + qw * ty + qz * tx - qx * tz;
  out[o + 2] = vz + qw * tz + qx * ty - qy * tx;
  return out;
}

/**
 * out = quaternion of the rotation in the upper 3×3 of column-major matrix m. Columns are
 * normalised first so a scaled matrix still yields its rotation.
 */
export function quatFromMat4(out: NumArray, o: number, m: NumArray, mo: number): NumArray {
  const sx = 1 / (Math.hypot(m[mo], m[mo + 1], m[mo + 2]) || 1);
  const sy = 1 / (Math.hypot(m[mo + 4], m[mo + 5], m[mo + 6]) || 1);
  const sz = 1 / (Math.hypot(m[mo + 8], m[mo + 9], m[mo + 10]) || 1);
  const m00 = m[mo] * sx, m10 = m[mo + 1] * sx, m20 = m[mo + 2] * sx; // prettier-ignore
  const m01 = m[mo + 4] * sy, m11 = m[mo + 5] * sy, m21 = m[mo + 6] * sy; // prettier-ignore
  const m02 = m[mo + 8] * sz, m12 = m[mo + 9] * sz, m22 = m[mo + 10] * sz; // prettier-ignore
  // Shepperd's method: branch on the largest diagonal term for numerical stability.
  const trace = m00 + m11 + m22;
  if (trace > 0) {
    const s = 0.5 / Math.sqrt(trace + 1);
    out[o + 3] = 0.25 / s;
    out[o] = (m21 - m12) * s;
    out[o + 1] = (m02 - m20) * s;
    out[o + 2] = (m10 - m01) * s;
  } else if (m00 > m11 && m00 > m22) {
    const s = 2 * Math.sqrt(1 + m00 - m11 - m22);
    out[o + 3] = (m21 - m12) / s;
    out[o] = 0.25 * s;
    out[o + 1] = (m01 + m10) / s;
    out[o + 2] = (m02 + m20) / s;
  } else if (m11 > m22) {
    const s = 2 * Math.sqrt(1 + m11 - m00 - m22);
    out[o + 3] = (m02 - m20) / s;
    out[o] = (m01 + m10) / s;
    out[o + 1] = 0.25 * s;
    out[o + 2] = (m12 + m21) / s;
  } else {
    const s = 2 * Math.sqrt(1 + m22 - m00 - m11);
    out[o + 3] = (m10 - m01) / s;
    out[o] = (m02 + m20) / s;
    out[o + 1] = (m12 + m21) / s;
    out[o + 2] = 0.25 * s;
  }
  return quatNormalize(out, o);
}

/** Flips signs along a frame-major sequence (stride floats per frame) so neighbours agree. */
export function quatMakeContinuous(
  q: NumArray,
  frameCount: number,
  stride: number,
  offset: number,
): void {
  for (let t = 1; t < frameCount; t++) {
    const a = (t - 1) * stride + offset;
    const b = t * stride + offset;
    if (quatDot(q, a, q, b) < 0) {
      q[b] = -q[b];
      q[b + 1] = -q[b + 1];
      q[b + 2] = -q[b + 2];
      q[b + 3] = -q[b + 3];
    }
  }
}
