// Editing the poles of second-order dynamics while keeping their mode vectors. Browser-safe and
// allocation-free after `createPoleEditor`, because live tuning calls it on every slider move.
//
// With mode vectors v_i and new poles z_i, the dynamics that have them solve
// [A1′ A2′] · W = Y, with W's column i = [z_i v_i; v_i] and Y's column i = z_i² v_i (from
// (z²I − zA1′ − A2′) v = 0). W is the eigenvector matrix of the new companion matrix, so the
// companion structure [[A1′, A2′], [I, 0]] is kept exactly. Complex pairs are handled in real
// form: the columns of a pair are the real and imaginary parts of the complex column.
import { luFactor, luSolve } from '../linalg/lu-solve.js';
import type { ModalForm } from '../types.js';

/** Stability bound on every pole magnitude after editing. */
export const MAX_POLE_MAGNITUDE = 0.995;
/** Highest damped frequency kept, as a fraction of the Nyquist frequency (aliasing beyond). */
export const MAX_NYQUIST_FRACTION = 0.98;

/** Preallocated buffers for editing the poles of one modal form. */
export interface PoleEditor {
  modal: ModalForm;
  /** Edited poles (2K). */
  zRe: Float64Array;
  zIm: Float64Array;
  /** Poles whose damped frequency was capped below Nyquist at the last edit. */
  capped: number;
  w: Float64Array;
  y: Float64Array;
  pivots: Int32Array;
}

/** Buffers for editing `modal`'s poles. */
export function createPoleEditor(modal: ModalForm): PoleEditor {
  const n = 2 * modal.k;
  return {
    modal,
    zRe: new Float64Array(n),
    zIm: new Float64Array(n),
    capped: 0,
    w: new Float64Array(n * n),
    y: new Float64Array(n * modal.k),
    pivots: new Int32Array(n),
  };
}

/**
 * Scales every mode's natural frequency by `frequencyFactor` and damping ratio by
 * `dampingFactor` (s = ln z · fps; f_n = |s|/2π; ζ = −Re s/|s|), into editor.zRe/zIm, capping
 * |z| at MAX_POLE_MAGNITUDE. A pair whose ζ reaches 1 becomes two real poles. Single real poles
 * (overdamped) scale their rate by `frequencyFactor`; real negative poles (at Nyquist) are kept.
 */
export function editPoles(ed: PoleEditor, frequencyFactor: number, dampingFactor: number): void {
  const { zRe, zIm, modal } = ed;
  const n = 2 * modal.k;
  const logMax = Math.log(MAX_POLE_MAGNITUDE);
  const maxArg = MAX_NYQUIST_FRACTION * Math.PI;
  ed.capped = 0;
  for (let i = 0; i < n; i++) {
    const re = modal.zRe[i];
    const im = modal.zIm[i];
    if (im === 0) {
      const mag = Math.abs(re);
      if (re <= 0) {
        zRe[i] = re === 0 ? 0 : Math.sign(re) * Math.min(mag, MAX_POLE_MAGNITUDE);
      } else {
        const sigma = Math.log(mag) * frequencyFactor; // per frame
        zRe[i] = Math.exp(Math.min(sigma, logMax));
      }
      zIm[i] = 0;
      continue;
    }
    // A pair: i holds +imag, i + 1 its conjugate.
    const sRe = Math.log(Math.hypot(re, im)); // per frame (× fps for per second)
    const sIm = Math.atan2(im, re);
    const wn = Math.hypot(sRe, sIm) * frequencyFactor;
    const zeta = (-sRe / Math.hypot(sRe, sIm)) * dampingFactor;
    if (zeta < 1) {
      let a = -zeta * wn;
      let b = wn * Math.sqrt(1 - zeta * zeta);
      if (a > logMax) a = logMax;
      if (b > maxArg) {
        b = maxArg;
        ed.capped++;
      }
      const r = Math.exp(a);
      zRe[i] = r * Math.cos(b);
      zIm[i] = r * Math.sin(b);
      zRe[i + 1] = zRe[i];
      zIm[i + 1] = -zIm[i];
    } else {
      const root = Math.sqrt(zeta * zeta - 1);
      zRe[i] = Math.exp(Math.min(-wn * (zeta - root), logMax));
      zRe[i + 1] = Math.exp(Math.min(-wn * (zeta + root), logMax));
      zIm[i] = 0;
      zIm[i + 1] = 0;
    }
    i++;
  }
}

/**
 * Solves X · W = Y for X (K × 2K, row-major) where W has the edited poles and Y's column i is
 * z_i^power · v_i, masked by `keep` (null: all kept). Returns false when W is singular.
 */
function solveForRows(
  ed: PoleEditor,
  power: 1 | 2,
  keep: Uint8Array | null,
  out: Float64Array,
): boolean {
  const { modal, zRe, zIm, w, y, pivots } = ed;
  const k = modal.k;
  const n = 2 * k;
  // Build Wᵀ (row i = column i of W) and Yᵀ (row i = column i of Y).
  for (let i = 0; i < n; i++) {
    const pair = modal.zIm[i] !== 0;
    const second = pair && modal.zIm[i] < 0;
    const first = second ? i - 1 : i;
    const realNow = zIm[i] === 0;
    for (let r = 0; r < k; r++) {
      const p = modal.vRe[first * k + r];
      const q = modal.vIm[first * k + r];
      // The real vector this column uses: p or q for a pair, v for a single real pole.
      const own = !pair ? p : second ? q : p;
      let top: number;
      let yv: number;
      if (!pair || realNow) {
        const z = zRe[i];
        top = z * own;
        yv = power === 2 ? z * z * own : top;
      } else {
        const a = zRe[first];
        const b = zIm[first];
        const lr = a * p - b * q; // Re(z v)
        const li = a * q + b * p; // Im(z v)
        top = second ? li : lr;
        if (power === 2) {
          const a2 = a * a - b * b;
          const b2 = 2 * a * b;
          yv = second ? a2 * q + b2 * p : a2 * p - b2 * q;
        } else yv = top;
      }
      w[i * n + r] = top;
      w[i * n + k + r] = own;
      y[i * k + r] = keep && !keep[i] ? 0 : yv;
    }
  }
  if (!luFactor(w, n, pivots)) return false;
  // Row r of X solves Wᵀ x = (row r of Y).
  for (let r = 0; r < k; r++) {
    for (let i = 0; i < n; i++) out[r * n + i] = y[i * k + r];
    luSolve(w, n, pivots, out, r * n);
  }
  return true;
}

/**
 * Rebuilds A1′, A2′ (K×K row-major) from the edited poles and the original mode vectors.
 * Returns false when the eigenvector matrix is singular (repeated poles); a1/a2 are then unset.
 */
export function rebuildDynamics(
  ed: PoleEditor,
  a1: Float64Array,
  a2: Float64Array,
  scratch: Float64Array,
): boolean {
  const k = ed.modal.k;
  if (!solveForRows(ed, 2, null, scratch)) return false;
  splitRows(scratch, k, a1, a2);
  return true;
}

/**
 * Output projection that keeps only the poles with keep[i] = 1: c_out = P1 c_t + P2 c_{t−1}
 * (the top rows of W·mask·W⁻¹). Returns false when W is singular.
 */
export function modeProjection(
  ed: PoleEditor,
  keep: Uint8Array,
  p1: Float64Array,
  p2: Float64Array,
  scratch: Float64Array,
): boolean {
  const k = ed.modal.k;
  if (!solveForRows(ed, 1, keep, scratch)) return false;
  splitRows(scratch, k, p1, p2);
  return true;
}

function splitRows(x: Float64Array, k: number, left: Float64Array, right: Float64Array): void {
  const n = 2 * k;
  for (let r = 0; r < k; r++) {
    for (let c = 0; c < k; c++) {
      left[r * k + c] = x[r * n + c];
      right[r * k + c] = x[r * n + k + c];
    }
  }
}
