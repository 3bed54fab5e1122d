// Poles of second-order dynamics: eigenvalues z of the companion matrix [[A1, A2], [I, 0]], their
// continuous-time meaning (s = ln z / Δt, f_n = |s|/2π, ζ = −Re s/|s|; Franklin, Powell &
// Workman, Digital Control of Dynamic Systems), and the rebuild of A1, A2 from edited poles with
// the same mode vectors.
import { EigenvalueDecomposition, Matrix, inverse } from 'ml-matrix';

/** Eigen-structure of a companion matrix in real form. */
export interface CompanionEigen {
  k: number;
  /** Poles (2K): real and imaginary parts; a complex pair is stored with +Im first. */
  zRe: Float64Array;
  zIm: Float64Array;
  /** Real-form eigenvectors (2K×2K row-major): a pair's columns are Re v and Im v. */
  vectors: Float64Array;
}

/** Eigen-decomposition of [[A1, A2], [I, 0]] for row-major K×K A1, A2. */
export function companionEigen(a1: Float64Array, a2: Float64Array, k: number): CompanionEigen {
  const n = 2 * k;
  const f = Matrix.zeros(n, n);
  for (let r = 0; r < k; r++) {
    for (let c = 0; c < k; c++) {
      f.set(r, c, a1[r * k + c]);
      f.set(r, k + c, a2[r * k + c]);
    }
    f.set(k + r, r, 1);
  }
  const eig = new EigenvalueDecomposition(f, { assumeSymmetric: false });
  const v = eig.eigenvectorMatrix;
  const vectors = new Float64Array(n * n);
  for (let r = 0; r < n; r++) for (let c = 0; c < n; c++) vectors[r * n + c] = v.get(r, c);
  return {
    k,
    zRe: Float64Array.from(eig.realEigenvalues),
    zIm: Float64Array.from(eig.imaginaryEigenvalues),
    vectors,
  };
}

/** Natural frequency (Hz) and damping ratio of discrete pole z at `fps` (s = ln z · fps). */
export function poleToModal(
  re: number,
  im: number,
  fps: number,
): { frequencyHz: number; dampingRatio: number } {
  const sRe = Math.log(Math.hypot(re, im)) * fps;
  const sIm = Math.atan2(Math.abs(im), re) * fps;
  const mag = Math.hypot(sRe, sIm);
  if (mag === 0) return { frequencyHz: 0, dampingRatio: 0 };
  return { frequencyHz: mag / (2 * Math.PI), dampingRatio: -sRe / mag };
}

/** Discrete pole z = e^{sT} of a mode with natural frequency f_n (Hz) and damping ratio ζ < 1. */
export function modalToPole(
  frequencyHz: number,
  dampingRatio: number,
  fps: number,
): { re: number; im: number } {
  const wn = 2 * Math.PI * frequencyHz;
  const sRe = -dampingRatio * wn;
  const sIm = wn * Math.sqrt(Math.max(0, 1 - dampingRatio * dampingRatio));
  const r = Math.exp(sRe / fps);
  return { re: r * Math.cos(sIm / fps), im: r * Math.sin(sIm / fps) };
}

/**
 * A1, A2 (row-major K×K) whose companion matrix has the poles (zRe, zIm) and the mode vectors of
 * `eig` (bottom half of its real-form eigenvectors): [A1 A2] = W Λ² [W Λ; W]⁻¹ in real form.
 */
export function rebuildFromPoles(
  eig: CompanionEigen,
  zRe: Float64Array,
  zIm: Float64Array,
): { a1: Float64Array; a2: Float64Array } {
  const { k } = eig;
  const n = 2 * k;
  // Real-form block-diagonal Λ: [[a, b], [−b, a]] for the pair a ± bi (columns Re v, Im v).
  const lam = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    if (zIm[i] !== 0 && i + 1 < n && zIm[i + 1] === -zIm[i]) {
      lam.set(i, i, zRe[i]);
      lam.set(i, i + 1, zIm[i]);
      lam.set(i + 1, i, -zIm[i]);
      lam.set(i + 1, i + 1, zRe[i]);
      i++;
    } else {
      lam.set(i, i, zRe[i]);
    }
  }
  const w = Matrix.zeros(k, n);
  for (let r = 0; r < k; r++) for (let c = 0; c < n; c++) w.set(r, c, eig.vectors[(k + r) * n + c]);
  const wl = w.mmul(lam);
  const stacked = Matrix.zeros(n, n);
  stacked.setSubMatrix(wl, 0, 0);
  stacked.setSubMatrix(w, k, 0);
  const a = wl.mmul(lam).mmul(inverse(stacked));
  const a1 = new Float64Array(k * k);
  const a2 = new Float64Array(k * k);
  for (let r = 0; r < k; r++) {
    for (let c = 0; c < k; c++) {
      a1[r * k + c] = a.get(r, c);
      a2[r * k + c] = a.get(r, k + c);
    }
  }
  return { a1, a2 };
}

/** Largest pole magnitude. */
export function spectralRadius(zRe: Float64Array, zIm: Float64Array): number {
  let r = 0;
  for (let i = 0; i < zRe.length; i++) r = Math.max(r, Math.hypot(zRe[i], zIm[i]));
  return r;
}
