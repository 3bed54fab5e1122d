// Which part of a region's motion the pose explains. A region's leading components mix its
// correctives (a function of the joint rotations) with its tissue motion (a damped response to
// the bones' accelerations and their angle to gravity). The rotation of the components that is
// best and least explained by the region's pose features — canonical correlation analysis
// (Hotelling 1936) between the component coefficients and the features — pulls them apart:
// a corrective's time course lies wholly in the span of the pose features (explained share 1),
// while tissue ringing does not. With the temporal combinations orthonormal, the spatial pattern
// of each is exact: a corrective in the span never leaks into the pattern of a dynamic one.
import { cholesky, choleskySolve, crossColumns, gramColumns } from '../linalg/ridge.js';
import { symmetricEigen } from '../linalg/sym-eigen.js';

/** Canonical directions of a region's components against its pose features. */
export interface PoseScreen {
  /** Share of each direction's motion the pose features explain, adjusted for their count. */
  explained: Float64Array;
  /** Each direction's spatial pattern in the components' coordinates (L per direction). */
  patterns: Float64Array;
  /** Energy of each direction's motion. */
  energy: Float64Array;
}

/**
 * Screens L components with coefficients `c` (T×L, orthogonal columns, as from a PCA) against
 * `features` (T×p). Returns L directions, least explained first.
 */
export function screenComponents(
  c: Float64Array,
  frames: number,
  l: number,
  features: Float64Array,
  p: number,
): PoseScreen {
  // Whitened coefficients: unit-norm, mutually orthogonal columns.
  const sigma = new Float64Array(l);
  for (let t = 0; t < frames; t++) for (let q = 0; q < l; q++) sigma[q] += c[t * l + q] ** 2;
  for (let q = 0; q < l; q++) sigma[q] = Math.sqrt(sigma[q]);
  const cw = new Float64Array(frames * l);
  for (let t = 0; t < frames; t++)
    for (let q = 0; q < l; q++) cw[t * l + q] = sigma[q] > 0 ? c[t * l + q] / sigma[q] : 0;
  // Least-squares projection onto the features (unit-RMS columns, a round-off-level ridge).
  const scale = new Float64Array(p);
  for (let t = 0; t < frames; t++) for (let f = 0; f < p; f++) scale[f] += features[t * p + f] ** 2;
  for (let f = 0; f < p; f++) scale[f] = Math.sqrt(scale[f] / frames) || 1;
  const x = new Float64Array(frames * p);
  for (let t = 0; t < frames; t++) for (let f = 0; f < p; f++) x[t * p + f] = features[t * p + f] / scale[f]; // prettier-ignore
  const gram = gramColumns(x, p, 0, frames);
  const cross = crossColumns(x, p, cw, l, 0, frames);
  let trace = 0;
  for (let a = 0; a < p; a++) trace += gram[a * p + a];
  for (let a = 0; a < p; a++) gram[a * p + a] += 1e-9 * (trace / p || 1);
  // S = Cwᵀ X (XᵀX)⁻¹ Xᵀ Cw = crossᵀ (XᵀX)⁻¹ cross.
  const s = new Float64Array(l * l);
  if (p > 0 && cholesky(gram, p)) {
    const solved = Float64Array.from(cross);
    choleskySolve(gram, p, solved, l);
    for (let i = 0; i < l; i++)
      for (let j = 0; j < l; j++) {
        let v = 0;
        for (let a = 0; a < p; a++) v += cross[a * l + i] * solved[a * l + j];
        s[i * l + j] = v;
      }
  }
  // Exactly symmetric (the two halves differ by round-off).
  for (let i = 0; i < l; i++) {
    for (let j = 0; j < i; j++) {
      const mean = 0.5 * (s[i * l + j] + s[j * l + i]);
      s[i * l + j] = mean;
      s[j * l + i] = mean;
    }
  }
  const rho = new Float64Array(l);
  const v = new Float64Array(l * l);
  symmetricEigen(s, l, rho, v);
  // Adjusted share (as an adjusted R²): p features explain p/T of pure noise by chance.
  const adjust = frames > p + 1 ? (frames - 1) / (frames - p - 1) : Infinity;
  const explained = new Float64Array(l);
  const patterns = new Float64Array(l * l);
  const energy = new Float64Array(l);
  // Eigenvalues come descending; report least explained first.
  for (let i = 0; i < l; i++) {
    const src = l - 1 - i;
    const r = Math.min(1, Math.max(0, rho[src]));
    explained[i] = Number.isFinite(adjust) ? Math.max(0, 1 - (1 - r) * adjust) : 1;
    // Direction z = Cw v; its pattern is Cᵀ z = diag(σ) v in component coordinates.
    for (let q = 0; q < l; q++) {
      const w = sigma[q] * v[q * l + src];
      patterns[i * l + q] = w;
      energy[i] += w * w;
    }
  }
  return { explained, patterns, energy };
}
