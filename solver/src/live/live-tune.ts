// Live tuning: re-simulates a take's dynamics from its stored drive when the artist moves gain,
// stiffness, damping or mutes a mode. Browser-safe (no Node or ml-matrix imports) and
// allocation-free per call: every buffer is made once in `createLiveTuner`. A full retarget runs
// this same code, so a tuned take equals a re-baked one.
//
// Per call: edit the poles and rebuild A1′, A2′ (one 2K×2K LU), start at the equilibrium of the
// held first pose ((I − A1′ − A2′) c = e_0), run c_t = A1′ c_{t−1} + A2′ c_{t−2} + e_t at the
// profile's rate (2K² multiply-adds a frame), project out muted modes, then sample the shot's
// frames with Catmull–Rom weights and apply gain and the displacement clamp.
import { luFactor, luSolve } from '../linalg/lu-solve.js';
import { clampFactor, poleMask } from '../retarget/controls.js';
import {
  createPoleEditor,
  editPoles,
  modeProjection,
  rebuildDynamics,
  type PoleEditor,
} from '../retarget/pole-edit.js';
import type { Controls, LiveTuneData } from '../types.js';

/** The controls live tuning can change without a re-bake. */
export type LiveControls = Pick<
  Controls,
  'gain' | 'stiffness' | 'damping' | 'mutedModes' | 'soloModes' | 'maxDisplacement'
>;

/** A live tuner bound to one take's data; results are overwritten by every `tune` call. */
export interface LiveTuner {
  readonly data: LiveTuneData;
  /** Coefficients per shot frame before gain (T × K). */
  readonly coefficients: Float32Array;
  /** Morph weights per shot frame (T × K): gain × coefficients, clamp applied. */
  readonly weights: Float32Array;
  /** A1′, A2′ of the last call (K × K, row-major). */
  readonly a1: Float64Array;
  readonly a2: Float64Array;
  /** Edited poles of the last call (2K). */
  readonly poles: { re: Float64Array; im: Float64Array };
  /** Poles whose frequency was capped below Nyquist at the last call. */
  capped: number;
  /** Re-simulates with `controls`; returns `weights`. */
  tune(controls: LiveControls): Float32Array;
}

/**
 * A tuner for `data`. `basis` (3N × K, column-major by mode, region gains baked) is needed only
 * for the displacement clamp.
 */
export function createLiveTuner(data: LiveTuneData, basis: Float32Array | null = null): LiveTuner {
  const { k, simFrames, frameCount } = data;
  const n = 2 * k;
  const ed: PoleEditor = createPoleEditor(data.modal);
  const a1 = new Float64Array(k * k);
  const a2 = new Float64Array(k * k);
  const p1 = new Float64Array(k * k);
  const p2 = new Float64Array(k * k);
  const scratch = new Float64Array(k * n);
  const mask = new Uint8Array(n);
  const eq = new Float64Array(k * k);
  const eqPivots = new Int32Array(k);
  const state = new Float64Array(k);
  const a21 = new Float64Array(k * n);
  const sim = new Float64Array((simFrames + 2) * k);
  const projected = new Float64Array((simFrames + 2) * k);
  const frame = new Float64Array(k);
  const coefficients = new Float32Array(frameCount * k);
  const weights = new Float32Array(frameCount * k);
  let clamp: ClampIndex | null = null; // built on the first clamped call: a sort of N rows

  const tuner: LiveTuner = {
    data,
    coefficients,
    weights,
    a1,
    a2,
    poles: { re: ed.zRe, im: ed.zIm },
    capped: 0,
    tune(controls: LiveControls): Float32Array {
      editPoles(ed, controls.stiffness, controls.damping);
      tuner.capped = ed.capped;
      if (!rebuildDynamics(ed, a1, a2, scratch))
        throw new Error('live tuning: singular modal basis');
      const keep = poleMask(data.modal.modeOf, controls.mutedModes, controls.soloModes, mask);
      if (keep && !modeProjection(ed, keep, p1, p2, scratch)) {
        throw new Error('live tuning: singular modal basis');
      }
      equilibrium(data.drive, a1, a2, k, eq, eqPivots, state);
      for (let r = 0; r < k; r++) {
        for (let c = 0; c < k; c++) {
          a21[r * n + c] = a2[r * k + c];
          a21[r * n + k + c] = a1[r * k + c];
        }
      }
      simulate(data.drive, a21, k, simFrames, state, sim);
      const out = keep ? project(sim, p1, p2, k, simFrames, projected) : sim;
      sample(out, 2 * k, data.sampleIndex, data.sampleWeight, k, frameCount, coefficients);
      if (controls.maxDisplacement !== null && basis && !clamp) clamp = clampIndex(basis, k);
      applyGain(
        coefficients,
        controls.gain,
        controls.maxDisplacement,
        basis,
        clamp,
        k,
        frame,
        weights,
      );
      return weights;
    },
  };
  return tuner;
}

/** state = (I − A1 − A2)⁻¹ e_0: the coefficients at rest under the held first pose. */
function equilibrium(
  drive: Float32Array,
  a1: Float64Array,
  a2: Float64Array,
  k: number,
  m: Float64Array,
  pivots: Int32Array,
  state: Float64Array,
): void {
  for (let i = 0; i < k * k; i++) m[i] = -a1[i] - a2[i];
  for (let i = 0; i < k; i++) {
    m[i * k + i] += 1;
    state[i] = drive[i];
  }
  if (!luFactor(m, k, pivots)) {
    state.fill(0); // a pole at exactly z = 1 has no equilibrium: start from zero instead
    return;
  }
  luSolve(m, k, pivots, state);
}

/**
 * c_t = A1 c_{t−1} + A2 c_{t−2} + e_t into `out` ((frames + 2) × K; the first two frames hold
 * c_{−2} = c_{−1} = `state`). With a21 = [A2 | A1] (K × 2K) each row is one dot product over the
 * contiguous [c_{t−2}, c_{t−1}].
 */
function simulate(
  drive: Float32Array,
  a21: Float64Array,
  k: number,
  frames: number,
  state: Float64Array,
  out: Float64Array,
): void {
  out.set(state, 0);
  out.set(state, k);
  const n = 2 * k;
  for (let t = 0; t < frames; t++) {
    const base = t * k; // c_{t−2} starts here, c_t at base + 2k
    const o = base + n;
    for (let r = 0; r < k; r++) {
      const ro = r * n;
      let s0 = drive[t * k + r];
      let s1 = 0;
      let c = 0;
      for (; c + 1 < n; c += 2) {
        s0 += a21[ro + c] * out[base + c];
        s1 += a21[ro + c + 1] * out[base + c + 1];
      }
      if (c < n) s0 += a21[ro + c] * out[base + c];
      out[o + r] = s0 + s1;
    }
  }
}

/** out_t = P1 c_t + P2 c_{t−1}, from the padded simulation (c_{−1} in its second frame). */
function project(
  sim: Float64Array,
  p1: Float64Array,
  p2: Float64Array,
  k: number,
  frames: number,
  out: Float64Array,
): Float64Array {
  for (let t = 0; t < frames; t++) {
    const o = (t + 2) * k;
    const po = o - k;
    for (let r = 0; r < k; r++) {
      let s = 0;
      const ro = r * k;
      for (let c = 0; c < k; c++) s += p1[ro + c] * sim[o + c] + p2[ro + c] * sim[po + c];
      out[o + r] = s;
    }
  }
  return out;
}

function sample(
  sim: Float64Array,
  offset: number,
  index: Int32Array,
  weight: Float64Array,
  k: number,
  frames: number,
  out: Float32Array,
): void {
  for (let f = 0; f < frames; f++) {
    const i0 = offset + index[4 * f] * k, i1 = offset + index[4 * f + 1] * k; // prettier-ignore
    const i2 = offset + index[4 * f + 2] * k, i3 = offset + index[4 * f + 3] * k; // prettier-ignore
    const w0 = weight[4 * f], w1 = weight[4 * f + 1], w2 = weight[4 * f + 2], w3 = weight[4 * f + 3]; // prettier-ignore
    for (let r = 0; r < k; r++) {
      out[f * k + r] = w0 * sim[i0 + r] + w1 * sim[i1 + r] + w2 * sim[i2 + r] + w3 * sim[i3 + r];
    }
  }
}

/** Vertices by descending basis row norm, for an early-out search of the largest displacement. */
export interface ClampIndex {
  order: Uint32Array;
  norms: Float64Array;
}

/** Row norms of a basis (3N × K, column-major by mode) and vertices sorted by them. */
export function clampIndex(basis: Float32Array, k: number): ClampIndex {
  const n3 = basis.length / k;
  const count = n3 / 3;
  const norms = new Float64Array(count);
  for (let c = 0; c < k; c++) {
    const o = c * n3;
    for (let i = 0; i < n3; i++) norms[(i / 3) | 0] += basis[o + i] * basis[o + i];
  }
  for (let i = 0; i < count; i++) norms[i] = Math.sqrt(norms[i]);
  const order = Uint32Array.from({ length: count }, (_, i) => i).sort(
    (a, b) => norms[b] - norms[a],
  );
  return { order, norms };
}

/** Largest |D_i c| over vertices i, visiting rows by norm and stopping once no row can beat it. */
export function largestDisplacement(
  basis: Float32Array,
  k: number,
  order: Uint32Array,
  norms: Float64Array,
  c: Float64Array,
): number {
  let cn = 0;
  for (let r = 0; r < k; r++) cn += c[r] * c[r];
  cn = Math.sqrt(cn);
  const n3 = basis.length / k;
  let best = 0;
  for (let j = 0; j < order.length; j++) {
    const i = order[j];
    if (norms[i] * cn <= best) break;
    let x = 0, y = 0, z = 0; // prettier-ignore
    for (let r = 0; r < k; r++) {
      const o = r * n3 + 3 * i;
      x += basis[o] * c[r];
      y += basis[o + 1] * c[r];
      z += basis[o + 2] * c[r];
    }
    const m = Math.sqrt(x * x + y * y + z * z);
    if (m > best) best = m;
  }
  return best;
}

function applyGain(
  coefficients: Float32Array,
  gain: number,
  max: number | null,
  basis: Float32Array | null,
  clamp: ClampIndex | null,
  k: number,
  frame: Float64Array,
  out: Float32Array,
): void {
  const frames = coefficients.length / k;
  for (let f = 0; f < frames; f++) {
    for (let r = 0; r < k; r++) frame[r] = gain * coefficients[f * k + r];
    let scale = 1;
    if (max !== null && basis && clamp) {
      scale = clampFactor(largestDisplacement(basis, k, clamp.order, clamp.norms, frame), max);
    }
    for (let r = 0; r < k; r++) out[f * k + r] = frame[r] * scale;
  }
}
