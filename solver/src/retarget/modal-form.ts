// Modal form of ARX dynamics: eigen-decomposition of the companion matrix (once per bake; live
// tuning only edits the poles it yields), and the natural frequency and damping of each pole.
import { SolverInputError } from '../errors.js';
import type { LinearDynamics, ModalForm, Mode } from '../types.js';
import { companionEigen, poleToModal } from '../dynamics/poles.js';

/** Index of the first pole of each mode: a complex pair counts once, each real pole once. */
export function poleGroups(zIm: Float64Array): number[] {
  const groups: number[] = [];
  for (let i = 0; i < zIm.length; i++) {
    groups.push(i);
    if (zIm[i] > 0) i++;
  }
  return groups;
}

/**
 * Decomposes [[A1, A2], [I, 0]] at `fps`. Each pole is matched to the nearest of `modes` (by
 * log-frequency and damping ratio) so that mode indices of the profile address it.
 */
export function modalForm(dynamics: LinearDynamics, fps: number, modes: Mode[]): ModalForm {
  const { k, a1, a2 } = dynamics;
  const n = 2 * k;
  const eig = companionEigen(a1, a2, k);
  const re = eig.zRe;
  const im = eig.zIm;
  const v = { get: (r: number, c: number) => eig.vectors[r * n + c] };
  const zRe = new Float64Array(n);
  const zIm = new Float64Array(n);
  const vRe = new Float64Array(n * k);
  const vIm = new Float64Array(n * k);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(re[i]) || !Number.isFinite(im[i])) {
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        'the profile dynamics have a non-finite pole',
        {
          item: 'dynamics',
        },
      );
    }
    zRe[i] = re[i];
    zIm[i] = im[i];
    if (im[i] > 0) {
      for (let r = 0; r < k; r++) {
        vRe[i * k + r] = v.get(k + r, i);
        vIm[i * k + r] = v.get(k + r, i + 1);
        vRe[(i + 1) * k + r] = vRe[i * k + r];
        vIm[(i + 1) * k + r] = -vIm[i * k + r];
      }
      zRe[i + 1] = re[i + 1];
      zIm[i + 1] = im[i + 1];
      i++;
    } else {
      for (let r = 0; r < k; r++) vRe[i * k + r] = v.get(k + r, i);
    }
  }
  return { k, fps, zRe, zIm, vRe, vIm, modeOf: matchModes(zRe, zIm, fps, modes) };
}

/** Greedy nearest matching of pole groups to the profile's modes (−1 when left over). */
function matchModes(zRe: Float64Array, zIm: Float64Array, fps: number, modes: Mode[]): Int32Array {
  const modeOf = new Int32Array(zRe.length).fill(-1);
  const groups = poleGroups(zIm);
  const pairs: { g: number; m: number; d: number }[] = [];
  for (const g of groups) {
    const p = poleToModal(zRe[g], zIm[g], fps);
    modes.forEach((mode, m) => {
      const df = Math.abs(
        Math.log(Math.max(p.frequencyHz, 1e-9) / Math.max(mode.frequencyHz, 1e-9)),
      );
      pairs.push({ g, m, d: df + Math.abs(p.dampingRatio - mode.dampingRatio) });
    });
  }
  pairs.sort((x, y) => x.d - y.d);
  const usedMode = new Set<number>();
  const usedGroup = new Set<number>();
  for (const { g, m } of pairs) {
    if (usedMode.has(m) || usedGroup.has(g)) continue;
    usedMode.add(m);
    usedGroup.add(g);
    modeOf[g] = m;
    if (zIm[g] > 0) modeOf[g + 1] = m;
  }
  return modeOf;
}
