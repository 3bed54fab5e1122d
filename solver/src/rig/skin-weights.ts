// Skin weight clean-up: keep the four largest influences, renormalise sums that are close to
// one, reject what cannot be normalised.
import { SolverInputError } from '../errors.js';

/** Options for skin weight normalisation. */
export interface SkinWeightOptions {
  /** Largest |Σw − 1| that is silently renormalised; beyond it the vertex is rejected. */
  tolerance?: number;
}

/** Default skin weight options (0.05 is a common-practice allowance for 8-bit exporters). */
export const SKIN_WEIGHT_DEFAULTS: Required<SkinWeightOptions> = { tolerance: 0.05 };

/** Clean four-influence skin. */
export interface SkinInfluences {
  /** Joint index per influence (4N). */
  joints: Uint16Array;
  /** Weights summing to 1 per vertex (4N). */
  weights: Float32Array;
  /** Vertices whose sum was off by more than 1e-6 and renormalised. */
  renormalised: number;
  /** Vertices that had more than four nonzero influences. */
  truncated: number;
}

/**
 * Merges influence sets (JOINTS_n/WEIGHTS_n, 4 per vertex each) into the four largest per
 * vertex, checks joint indices against `jointCount` (MISSING_JOINT) and weights
 * (NON_FINITE_VALUE, WEIGHTS_NOT_NORMALISED), and renormalises within tolerance.
 */
export function normaliseSkinWeights(
  jointSets: ArrayLike<number>[],
  weightSets: ArrayLike<number>[],
  vertexCount: number,
  jointCount: number,
  options: SkinWeightOptions = {},
): SkinInfluences {
  const { tolerance } = { ...SKIN_WEIGHT_DEFAULTS, ...options };
  const joints = new Uint16Array(4 * vertexCount);
  const weights = new Float32Array(4 * vertexCount);
  const bestJ = new Int32Array(4);
  const bestW = new Float64Array(4);
  let renormalised = 0;
  let truncated = 0;
  for (let i = 0; i < vertexCount; i++) {
    bestJ.fill(0);
    bestW.fill(0);
    let nonzero = 0;
    let total = 0;
    for (let s = 0; s < jointSets.length; s++) {
      for (let k = 0; k < 4; k++) {
        const w = weightSets[s][4 * i + k];
        const j = jointSets[s][4 * i + k];
        if (!Number.isFinite(w)) {
          throw new SolverInputError(
            'NON_FINITE_VALUE',
            `skin weight of vertex ${i} is not finite`,
            {
              vertex: i,
            },
          );
        }
        if (w < 0) {
          throw new SolverInputError(
            'WEIGHTS_NOT_NORMALISED',
            `vertex ${i} has a negative skin weight (${w})`,
            { vertex: i },
          );
        }
        if (w === 0) continue;
        if (j >= jointCount) {
          throw new SolverInputError(
            'MISSING_JOINT',
            `vertex ${i} refers to joint ${j} but the skin has ${jointCount} joints`,
            { vertex: i, joint: j },
          );
        }
        nonzero++;
        total += w;
        // Insert into the descending top-4 list.
        let slot = -1;
        for (let m = 0; m < 4; m++) {
          if (w > bestW[m]) {
            slot = m;
            break;
          }
        }
        if (slot < 0) continue;
        for (let m = 3; m > slot; m--) {
          bestW[m] = bestW[m - 1];
          bestJ[m] = bestJ[m - 1];
        }
        bestW[slot] = w;
        bestJ[slot] = j;
      }
    }
    if (nonzero > 4) truncated++;
    if (Math.abs(total - 1) > tolerance || total <= 0) {
      throw new SolverInputError(
        'WEIGHTS_NOT_NORMALISED',
        `skin weights of vertex ${i} sum to ${total.toFixed(4)}, not 1 (tolerance ${tolerance})`,
        { vertex: i },
      );
    }
    const kept = bestW[0] + bestW[1] + bestW[2] + bestW[3];
    if (Math.abs(kept - 1) > 1e-6) renormalised++;
    for (let m = 0; m < 4; m++) {
      joints[4 * i + m] = bestJ[m];
      weights[4 * i + m] = bestW[m] / kept;
    }
  }
  return { joints, weights, renormalised, truncated };
}

/** Index of the joint with the largest weight for each vertex (N). */
export function dominantJoints(joints: Uint16Array, weights: Float32Array): Uint16Array {
  const n = joints.length / 4;
  const out = new Uint16Array(n);
  for (let i = 0; i < n; i++) {
    let best = 0;
    for (let k = 1; k < 4; k++) if (weights[4 * i + k] > weights[4 * i + best]) best = k;
    out[i] = joints[4 * i + best];
  }
  return out;
}
