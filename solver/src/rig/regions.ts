// Per-vertex regions: from a labelled attribute, or derived from each vertex's dominant joint.
import type { Regions } from '../types.js';
import { dominantJoints } from './skin-weights.js';

/** Regions named after the joints that dominate at least one vertex. */
export function deriveRegions(
  joints: Uint16Array,
  weights: Float32Array,
  jointNames: string[],
): Regions {
  const dominant = dominantJoints(joints, weights);
  const labelOfJoint = new Map<number, number>();
  const names: string[] = [];
  const labels = new Uint16Array(dominant.length);
  for (let i = 0; i < dominant.length; i++) {
    let label = labelOfJoint.get(dominant[i]);
    if (label === undefined) {
      label = names.length;
      labelOfJoint.set(dominant[i], label);
      names.push(jointNames[dominant[i]]);
    }
    labels[i] = label;
  }
  return { labels, names, source: 'dominant-joint' };
}

/**
 * Regions from raw per-vertex label values; names come from `names` where given, otherwise
 * `region_<k>`. Labels are rounded to integers.
 */
export function regionsFromLabels(values: ArrayLike<number>, names: unknown): Regions {
  const labels = new Uint16Array(values.length);
  let max = 0;
  for (let i = 0; i < values.length; i++) {
    const v = Math.max(0, Math.round(values[i]));
    labels[i] = v;
    if (v > max) max = v;
  }
  const given = Array.isArray(names) ? names.map(String) : [];
  const out: string[] = [];
  for (let k = 0; k <= max; k++) out.push(given[k] ?? `region_${k}`);
  return { labels, names: out, source: 'attribute' };
}
