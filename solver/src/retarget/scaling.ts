// Physical size scaling. Under dynamic similarity with gravity dominant (equal Froude number,
// Alexander & Jayes 1983), a body λ times longer has natural frequencies scaled by λ^−1/2 and
// displacements by λ; same-material elastic scaling gives frequencies λ^−1. The exponent is a
// control; with physical scaling off the frequencies are kept (stylised).
import { mat4Invert } from '../linalg/mat4.js';
import type { Character, Controls, Skeleton } from '../types.js';
import type { JointMapping } from '../rig/joint-map.js';

/** World bind position of every joint (3J), from the inverse bind matrices. */
export function jointBindPositions(skeleton: Skeleton): Float64Array {
  const count = skeleton.names.length;
  const out = new Float64Array(3 * count);
  const m = new Float64Array(16);
  for (let j = 0; j < count; j++) {
    if (!mat4Invert(m, 0, skeleton.inverseBindMatrices, 16 * j)) continue;
    out[3 * j] = m[12];
    out[3 * j + 1] = m[13];
    out[3 * j + 2] = m[14];
  }
  return out;
}

/**
 * Length ratio λ = L_target / L_source: summed lengths of the bones whose both ends are mapped,
 * or, when fewer than two bones are, the ratio of the rest meshes' bounding-box diagonals.
 */
export function lengthRatio(source: Character, target: Character, mapping: JointMapping): number {
  const ps = jointBindPositions(source.skeleton);
  const pt = jointBindPositions(target.skeleton);
  let ls = 0;
  let lt = 0;
  let bones = 0;
  source.skeleton.parents.forEach((parent, s) => {
    const t = mapping.targetOf[s];
    const tp = parent >= 0 ? mapping.targetOf[parent] : -1;
    if (parent < 0 || t < 0 || tp < 0) return;
    ls += distance(ps, s, parent);
    lt += distance(pt, t, tp);
    bones++;
  });
  if (bones >= 2 && ls > 0 && lt > 0) return lt / ls;
  return boxDiagonal(target.restPositions) / boxDiagonal(source.restPositions);
}

/** Factor on every natural frequency: λ^sizeExponent with physical scaling on, else 1. */
export function sizeFrequencyFactor(
  lambda: number,
  controls: Pick<Controls, 'physicalScaling' | 'sizeExponent'>,
): number {
  return controls.physicalScaling ? lambda ** controls.sizeExponent : 1;
}

function distance(p: Float64Array, a: number, b: number): number {
  return Math.hypot(p[3 * a] - p[3 * b], p[3 * a + 1] - p[3 * b + 1], p[3 * a + 2] - p[3 * b + 2]);
}

function boxDiagonal(positions: Float32Array): number {
  const lo = [Infinity, Infinity, Infinity];
  const hi = [-Infinity, -Infinity, -Infinity];
  for (let i = 0; i < positions.length; i++) {
    const a = i % 3;
    lo[a] = Math.min(lo[a], positions[i]);
    hi[a] = Math.max(hi[a], positions[i]);
  }
  return Math.hypot(hi[0] - lo[0], hi[1] - lo[1], hi[2] - lo[2]) || 1;
}
