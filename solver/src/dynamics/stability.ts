// Stability of identified dynamics: every pole inside |z| ≤ maxRadius. Offending poles are
// pulled radially onto the bound (frequency kept, damping raised), A1 and A2 rebuilt with the same
// mode vectors, and the input part refitted so the gains match the new poles.
import type { ArxModel } from './arx-fit.js';
import { fitArx } from './arx-fit.js';
import { companionEigen, rebuildFromPoles, spectralRadius } from './poles.js';

/** Default stability bound on pole magnitudes. */
export const MAX_POLE_RADIUS = 0.995;

/** Result of enforcing stability. */
export interface StabilityResult {
  model: ArxModel;
  /** Poles that were moved. */
  moved: number;
  /** Largest pole magnitude before and after. */
  radiusBefore: number;
  radiusAfter: number;
}

/**
 * Returns `model` unchanged when all poles satisfy |z| ≤ maxRadius; otherwise rebuilds A1, A2
 * with the offending poles scaled onto the bound and refits B0, B1, d over frames [from, to).
 */
export function enforceStability(
  model: ArxModel,
  c: Float64Array,
  u: Float64Array,
  from: number,
  to: number,
  lambda: number,
  maxRadius = MAX_POLE_RADIUS,
): StabilityResult {
  const eig = companionEigen(model.a1, model.a2, model.k);
  const radiusBefore = spectralRadius(eig.zRe, eig.zIm);
  if (radiusBefore <= maxRadius)
    return { model, moved: 0, radiusBefore, radiusAfter: radiusBefore };
  const zRe = Float64Array.from(eig.zRe);
  const zIm = Float64Array.from(eig.zIm);
  let moved = 0;
  for (let i = 0; i < zRe.length; i++) {
    const r = Math.hypot(zRe[i], zIm[i]);
    if (r > maxRadius) {
      zRe[i] *= maxRadius / r;
      zIm[i] *= maxRadius / r;
      moved++;
    }
  }
  const { a1, a2 } = rebuildFromPoles(eig, zRe, zIm);
  const fixed = { ...model, a1, a2 };
  const refit = fitArx(c, u, model.k, model.m, from, to, lambda, 'inputs', fixed);
  const after = companionEigen(refit.a1, refit.a2, refit.k);
  return { model: refit, moved, radiusBefore, radiusAfter: spectralRadius(after.zRe, after.zIm) };
}
