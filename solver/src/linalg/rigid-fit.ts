// Weighted rigid alignment of two point sets: the rotation and translation that minimise
// Σ wᵢ |R pᵢ + t − qᵢ|². Closed form with unit quaternions (Horn 1987): the rotation is the
// eigenvector of the largest eigenvalue of a symmetric 4×4 built from the cross-covariance.
// It always yields a proper rotation, so the reflection case of the SVD form needs no fix-up.
import { symmetricEigen } from './sym-eigen.js';
import type { NumArray } from './types.js';

/** Result of a rigid fit, preallocated by `createRigidFit` and reused across calls. */
export interface RigidFit {
  /** Rotation [x, y, z, w]. */
  rotation: Float64Array;
  /** Translation. */
  translation: Float64Array;
  /** Weighted root-mean-square residual after alignment (metres). */
  rms: number;
  /** (λ1 − λ2) / λ1 of the 4×4: near 0 when the rotation is ill-determined (e.g. collinear points). */
  eigenGap: number;
  /**
   * Lever arm √((λ1 − λ2) / 2W) in metres: the radius of the points about the worst-determined
   * rotation axis (exactly r for points on a ring of radius r). Rotation uncertainty ≈ noise / leverArm.
   */
  leverArm: number;
  /** Sum of the weights used. */
  weightSum: number;
}

/** A fresh result holder (identity transform). */
export function createRigidFit(): RigidFit {
  return {
    rotation: new Float64Array([0, 0, 0, 1]),
    translation: new Float64Array(3),
    rms: 0,
    eigenGap: 0,
    leverArm: 0,
    weightSum: 0,
  };
}

const nMat = new Float64Array(16);
const eigValues = new Float64Array(4);
const eigVectors = new Float64Array(16);

/**
 * Fits dst ≈ R·src + t over the listed points. `src`/`dst` are flat xyz arrays indexed by
 * `indices[k]`; `weights[k]` weights point k. With `fixedOrigin` the translation is held at 0
 * (rotation about the origin, sums taken uncentred). Writes into `out`. With total weight 0 the
 * result is the identity with eigenGap 0.
 */
export function fitRigidTransform(
  src: NumArray,
  dst: NumArray,
  indices: ArrayLike<number>,
  weights: ArrayLike<number>,
  count: number,
  out: RigidFit,
  fixedOrigin = false,
): RigidFit {
  let ws = 0;
  let spx = 0, spy = 0, spz = 0, sqx = 0, sqy = 0, sqz = 0; // prettier-ignore
  for (let k = 0; k < count; k++) {
    const w = weights[k];
    const i = 3 * indices[k];
    ws += w;
    spx += w * src[i];
    spy += w * src[i + 1];
    spz += w * src[i + 2];
    sqx += w * dst[i];
    sqy += w * dst[i + 1];
    sqz += w * dst[i + 2];
  }
  out.weightSum = ws;
  if (!(ws > 0)) {
    out.rotation.set([0, 0, 0, 1]);
    out.translation.fill(0);
    out.rms = 0;
    out.eigenGap = 0;
    out.leverArm = 0;
    return out;
  }
  const c = fixedOrigin ? 0 : 1 / ws;
  const px = spx * c, py = spy * c, pz = spz * c; // prettier-ignore
  const qx = sqx * c, qy = sqy * c, qz = sqz * c; // prettier-ignore
  // Cross-covariance S_ab = Σ w (p_a − p̄_a)(q_b − q̄_b).
  let sxx = 0, sxy = 0, sxz = 0, syx = 0, syy = 0, syz = 0, szx = 0, szy = 0, szz = 0; // prettier-ignore
  let ssp = 0;
  let ssq = 0;
  for (let k = 0; k < count; k++) {
    const w = weights[k];
    const i = 3 * indices[k];
    const ax = src[i] - px, ay = src[i + 1] - py, az = src[i + 2] - pz; // prettier-ignore
    const bx = dst[i] - qx, by = dst[i + 1] - qy, bz = dst[i + 2] - qz; // prettier-ignore
    sxx += w * ax * bx;
    sxy += w * ax * by;
    sxz += w * ax * bz;
    syx += w * ay * bx;
    syy += w * ay * by;
    syz += w * ay * bz;
    szx += w * az * bx;
    szy += w * az * by;
    szz += w * az * bz;
    ssp += w * (ax * ax + ay * ay + az * az);
    ssq += w * (bx * bx + by * by + bz * bz);
  }
  // Horn 1987, eq. for N (quaternion order w, x, y, z).
  const n = nMat;
  n[0] = sxx + syy + szz;
  n[1] = n[4] = syz - szy;
  n[2] = n[8] = szx - sxz;
  n[3] = n[12] = sxy - syx;
  n[5] = sxx - syy - szz;
  n[6] = n[9] = sxy + syx;
  n[7] = n[13] = szx + sxz;
  n[10] = -sxx + syy - szz;
  n[11] = n[14] = syz + szy;
  n[15] = -sxx - syy + szz;
  symmetricEigen(n, 4, eigValues, eigVectors);
  const l1 = eigValues[0];
  out.eigenGap = l1 > 0 ? (l1 - eigValues[1]) / l1 : 0;
  out.leverArm = Math.sqrt(Math.max(0, l1 - eigValues[1]) / (2 * ws));
  let w = eigVectors[0], x = eigVectors[4], y = eigVectors[8], z = eigVectors[12]; // prettier-ignore
  if (w < 0) {
    w = -w;
    x = -x;
    y = -y;
    z = -z;
  }
  const len = Math.hypot(w, x, y, z) || 1;
  const r = out.rotation;
  r[0] = x / len;
  r[1] = y / len;
  r[2] = z / len;
  r[3] = w / len;
  // Residual: Σ w|q − Rp|² = Σ w|p|² + Σ w|q|² − 2 λ_max (Horn 1987, centred sets).
  out.rms = Math.sqrt(Math.max(0, ssp + ssq - 2 * l1) / ws);
  // t = q̄ − R p̄
  const rx = r[0], ry = r[1], rz = r[2], rw = r[3]; // prettier-ignore
  const tx = 2 * (ry * pz - rz * py);
  const ty = 2 * (rz * px - rx * pz);
  const tz = 2 * (rx * py - ry * px);
  out.translation[0] = qx - (px + rw * tx + ry * tz - rz * ty);
  out.translation[1] = qy - (py + rw * ty + rz * tx - rx * tz);
  out.translation[2] = qz - (pz + rw * tz + rx * ty - ry * tx);
  return out;
}
