// Evaluating glTF animation samplers (LINEAR, STEP, CUBICSPLINE) at arbitrary times.
import { quatNormalize, quatSlerp } from '../linalg/quat.js';

/** Interpolation modes defined by glTF 2.0. */
export type Interpolation = 'LINEAR' | 'STEP' | 'CUBICSPLINE';

/** A sampler's keys and values as flat arrays. */
export interface SamplerData {
  /** Key times in seconds, strictly increasing. */
  times: Float32Array;
  /** Values: components per key, or 3 × components per key for CUBICSPLINE (in, value, out). */
  values: Float32Array;
  /** Interpolation mode. */
  interpolation: Interpolation;
  /** Components per value (3 translation/scale, 4 rotation, M weights). */
  components: number;
  /** Rotation values are slerped and normalised. */
  rotation: boolean;
}

const qa = new Float64Array(4);
const qb = new Float64Array(4);

/**
 * Writes the sampler's value at time t into out[o..]. Times before the first key hold the
 * first value and after the last key the last value (glTF 2.0 clamps at both ends).
 */
export function evaluateSampler(
  s: SamplerData,
  t: number,
  out: Float32Array | Float64Array,
  o: number,
): void {
  const { times, values, components: c } = s;
  const cubic = s.interpolation === 'CUBICSPLINE';
  const stride = cubic ? 3 * c : c;
  const vo = cubic ? c : 0; // value sits after the in-tangent
  const last = times.length - 1;
  if (t <= times[0] || last === 0) {
    for (let i = 0; i < c; i++) out[o + i] = values[vo + i];
    return;
  }
  if (t >= times[last]) {
    for (let i = 0; i < c; i++) out[o + i] = values[last * stride + vo + i];
    return;
  }
  // Binary search for k with times[k] ≤ t < times[k+1].
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid] <= t) lo = mid;
    else hi = mid;
  }
  const k = lo;
  const dt = times[k + 1] - times[k];
  const u = (t - times[k]) / dt;
  if (s.interpolation === 'STEP') {
    for (let i = 0; i < c; i++) out[o + i] = values[k * stride + i];
    return;
  }
  if (!cubic) {
    if (s.rotation) {
      for (let i = 0; i < 4; i++) {
        qa[i] = values[k * c + i];
        qb[i] = values[(k + 1) * c + i];
      }
      quatSlerp(qa, 0, qa, 0, qb, 0, u);
      for (let i = 0; i < 4; i++) out[o + i] = qa[i];
      return;
    }
    for (let i = 0; i < c; i++) {
      out[o + i] = values[k * c + i] * (1 - u) + values[(k + 1) * c + i] * u;
    }
    return;
  }
  // Cubic Hermite spline, glTF 2.0 specification appendix C: tangents scaled by the key interval.
  const u2 = u * u;
  const u3 = u2 * u;
  const h00 = 2 * u3 - 3 * u2 + 1;
  const h10 = u3 - 2 * u2 + u;
  const h01 = -2 * u3 + 3 * u2;
  const h11 = u3 - u2;
  const a = k * stride;
  const b = (k + 1) * stride;
  for (let i = 0; i < c; i++) {
    const v0 = values[a + c + i];
    const out0 = values[a + 2 * c + i];
    const v1 = values[b + c + i];
    const in1 = values[b + i];
    qa[i % 4] = h00 * v0 + h10 * dt * out0 + h01 * v1 + h11 * dt * in1;
    out[o + i] = qa[i % 4];
  }
  if (s.rotation) {
    quatNormalize(qa, 0);
    for (let i = 0; i < 4; i++) out[o + i] = qa[i];
  }
}
