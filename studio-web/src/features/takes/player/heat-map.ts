// Displacement heat map: per vertex, the length of the dynamic offset Σ_k basis_k · w_k at a
// frame (metres), drawn as vertex colours on the ramp from 0 to a fixed scale.
import { clampIndex, largestDisplacement } from '@overshoot/solver';
import { BufferAttribute, MeshLambertMaterial, type BufferGeometry } from 'three';
import { rampLinearInto } from './colour-ramp';

/**
 * Offset lengths per vertex (N) at `frame`: basis is 3N × K column-major by mode, weights T × K.
 * `scratch` holds 3N floats.
 */
export function offsetMagnitudes(
  basis: Float32Array,
  k: number,
  weights: ArrayLike<number>,
  frame: number,
  scratch: Float32Array,
  out: Float32Array,
): Float32Array {
  const n3 = basis.length / k;
  scratch.fill(0, 0, n3);
  for (let c = 0; c < k; c++) {
    const w = weights[frame * k + c];
    if (w === 0) continue;
    const o = c * n3;
    for (let i = 0; i < n3; i++) scratch[i] += basis[o + i] * w;
  }
  for (let v = 0; v < n3 / 3; v++) {
    const x = scratch[3 * v], y = scratch[3 * v + 1], z = scratch[3 * v + 2]; // prettier-ignore
    out[v] = Math.sqrt(x * x + y * y + z * z);
  }
  return out;
}

/** Largest offset of any vertex in each frame, in metres (T). */
export function framePeaks(
  basis: Float32Array,
  k: number,
  weights: ArrayLike<number>,
): Float64Array {
  const { order, norms } = clampIndex(basis, k);
  const c = new Float64Array(k);
  const frames = Math.floor(weights.length / k);
  const peaks = new Float64Array(frames);
  for (let f = 0; f < frames; f++) {
    for (let r = 0; r < k; r++) c[r] = weights[f * k + r];
    peaks[f] = largestDisplacement(basis, k, order, norms, c);
  }
  return peaks;
}

/** Share of frames whose peak stays inside the heat map's scale; the rest saturate. */
export const HEAT_SCALE_SHARE = 0.95;

/**
 * The offset (metres) that `share` of the frames' peaks stay at or below. A few wild frames
 * would otherwise squeeze every other frame into the ramp's first colour.
 */
export function robustPeak(peaks: ArrayLike<number>, share = HEAT_SCALE_SHARE): number {
  if (peaks.length === 0) return 0;
  const sorted = Float64Array.from(peaks).sort();
  const index = Math.min(sorted.length - 1, Math.ceil(share * sorted.length) - 1);
  return sorted[Math.max(0, index)];
}

/** Paints one geometry's vertex colours from its offsets. */
export class HeatMapPainter {
  /** Material that shows the vertex colours with simple shading. */
  readonly material = new MeshLambertMaterial({ vertexColors: true });
  private readonly colours: BufferAttribute;
  private readonly scratch: Float32Array;
  private readonly magnitudes: Float32Array;

  constructor(private readonly geometry: BufferGeometry) {
    const count = geometry.attributes.position.count;
    this.colours = new BufferAttribute(new Float32Array(count * 3), 3);
    this.scratch = new Float32Array(count * 3);
    this.magnitudes = new Float32Array(count);
    geometry.setAttribute('color', this.colours);
  }

  /** Colours the vertices for `frame`; `scale` (metres) maps to the top of the ramp. */
  paint(basis: Float32Array, k: number, weights: ArrayLike<number>, frame: number, scale: number) {
    offsetMagnitudes(basis, k, weights, frame, this.scratch, this.magnitudes);
    const inv = scale > 0 ? 1 / scale : 0;
    const out = this.colours.array as Float32Array;
    for (let v = 0; v < this.magnitudes.length; v++) {
      rampLinearInto(this.magnitudes[v] * inv, out, 3 * v);
    }
    this.colours.needsUpdate = true;
  }

  /** Frees the material and removes the colours from the geometry. */
  dispose(): void {
    this.material.dispose();
    this.geometry.deleteAttribute('color');
  }
}
