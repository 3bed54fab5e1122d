// Pose correctives on the target: the profile's per-vertex maps from pose features (R − I of
// the slot joints) to rest-space offsets. Same topology: the maps as they are, slot joints
// renamed through the joint map. Other topologies: each target vertex takes the map of its
// nearest source corner (from the basis transfer), turned into the target's frame and scaled by
// the size ratio. Slots whose joint has no target lose their features (their coefficients are 0).
// Each joint's training range of features goes with it, so the target clamps where the source did.
import type { JointMapping } from '../rig/joint-map.js';
import type { Character, PoseCorrectives } from '../types.js';
import type { TransferResult } from './transfer.js';

/** The profile's correctives carried onto `target`. */
export function transferCorrectives(
  correctives: PoseCorrectives,
  target: Character,
  mapping: JointMapping,
  transfer: TransferResult,
  sizeRatio: number,
): PoseCorrectives {
  const fpv = correctives.featuresPerVertex;
  const slots = Math.min(4, fpv / 9);
  const n = target.restPositions.length / 3;
  const featureJoints = new Uint16Array(4 * n);
  const coefficients = new Float32Array(n * 3 * fpv);
  const range = targetRange(correctives, mapping, target.skeleton.names.length);
  const src = correctives.coefficients;
  if (src.length === 0) return { ...correctives, ...range, featureJoints, coefficients: new Float32Array(0) }; // prettier-ignore
  for (let i = 0; i < n; i++) {
    const from = transfer.nearestSource ? transfer.nearestSource[i] : i;
    if (from < 0) continue;
    const r = transfer.rotations ? transfer.rotations.subarray(9 * i, 9 * i + 9) : null;
    for (let s = 0; s < slots; s++) {
      const t = mapping.targetOf[correctives.featureJoints[4 * from + s]] ?? -1;
      if (t < 0) continue;
      featureJoints[4 * i + s] = t;
      for (let f = s * 9; f < s * 9 + 9; f++) {
        const x = src[from * 3 * fpv + f];
        const y = src[(from * 3 + 1) * fpv + f];
        const z = src[(from * 3 + 2) * fpv + f];
        // Offsets turn back into the target's frame (Rᵀ) and grow with the body.
        const o = i * 3 * fpv + f;
        coefficients[o] = sizeRatio * (r ? r[0] * x + r[1] * y + r[2] * z : x);
        coefficients[o + fpv] = sizeRatio * (r ? r[3] * x + r[4] * y + r[5] * z : y);
        coefficients[o + 2 * fpv] = sizeRatio * (r ? r[6] * x + r[7] * y + r[8] * z : z);
      }
    }
  }
  return { ...correctives, ...range, featureJoints, coefficients };
}

/** The training range of each source joint's features moved to its target joint (unmapped: 0). */
function targetRange(
  correctives: PoseCorrectives,
  mapping: JointMapping,
  targetJoints: number,
): Pick<PoseCorrectives, 'featureMin' | 'featureMax'> {
  const { featureMin: lo, featureMax: hi } = correctives;
  if (!lo || !hi) return {};
  const featureMin = new Float64Array(targetJoints * 9);
  const featureMax = new Float64Array(targetJoints * 9);
  mapping.targetOf.forEach((t, j) => {
    if (t < 0 || t >= targetJoints) return;
    featureMin.set(lo.subarray(9 * j, 9 * j + 9), 9 * t);
    featureMax.set(hi.subarray(9 * j, 9 * j + 9), 9 * t);
  });
  return { featureMin, featureMax };
}
