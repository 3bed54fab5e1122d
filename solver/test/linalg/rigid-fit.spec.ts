// Rigid alignment: worked examples and agreement with an independent method.
import { Matrix, SingularValueDecomposition, EigenvalueDecomposition } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import {
  createRigidFit,
  fitRigidTransform,
  quatRotateVec3,
  symmetricEigen,
} from '../../src/index.js';
import { randomQuat, seededRandom } from '../helpers/random.js';

describe('fitRigidTransform', () => {
  it('recovers a 90° turn about z plus a shift (worked example)', () => {
    // Worked by hand: R_z(90°) maps (x, y, z) → (−y, x, z); then add t = (1, 2, 3).
    const src = [1, 0, 0, 0, 1, 0, 0, 0, 1, 1, 1, 1];
    const dst = [1, 3, 3, 0, 2, 3, 1, 2, 4, 0, 3, 4];
    const fit = fitRigidTransform(src, dst, [0, 1, 2, 3], [1, 1, 1, 1], 4, createRigidFit());
    const s = Math.SQRT1_2; // q = (0, 0, sin 45°, cos 45°)
    expect(Array.from(fit.rotation)).toEqual([0, 0, s, s].map((v) => expect.closeTo(v, 12)));
    expect(Array.from(fit.translation)).toEqual([1, 2, 3].map((v) => expect.closeTo(v, 12)));
    expect(fit.rms).toBeLessThan(1e-6);
  });

  it('matches the SVD form (Kabsch 1976) on noisy weighted points', () => {
    const rand = seededRandom(3);
    const count = 40;
    const q = randomQuat(rand, 2.5);
    const src: number[] = [];
    const dst: number[] = [];
    const w: number[] = [];
    for (let i = 0; i < count; i++) {
      const p = [rand() - 0.5, rand() - 0.5, rand() - 0.5];
      const r = quatRotateVec3([0, 0, 0], 0, q, 0, p, 0);
      src.push(...p);
      dst.push(
        r[0] + 0.2 + 0.01 * (rand() - 0.5),
        r[1] - 0.1 + 0.01 * (rand() - 0.5),
        r[2] + 0.01 * (rand() - 0.5),
      );
      w.push(0.2 + rand());
    }
    const fit = fitRigidTransform(src, dst, [...Array(count).keys()], w, count, createRigidFit());
    expectSameAsKabsch(src, dst, w, fit.rotation);
  });

  it('returns a proper rotation where the plain SVD solution would reflect', () => {
    // dst is src mirrored in x: the best proper rotation has det +1 and a nonzero residual.
    const src = [1, 0, 0, 0, 1, 0, 0, 0, 1, 0.5, 0.5, 0.2];
    const dst = [-1, 0, 0, 0, 1, 0, 0, 0, 1, -0.5, 0.5, 0.2];
    const fit = fitRigidTransform(src, dst, [0, 1, 2, 3], [1, 1, 1, 1], 4, createRigidFit());
    expect(Math.hypot(...fit.rotation)).toBeCloseTo(1, 12);
    expectSameAsKabsch(src, dst, [1, 1, 1, 1], fit.rotation);
    // The reported residual is the one the transform really leaves, and it is not zero.
    let ss = 0;
    for (let i = 0; i < 4; i++) {
      const r = quatRotateVec3([0, 0, 0], 0, fit.rotation, 0, src, 3 * i);
      for (let c = 0; c < 3; c++) ss += (r[c] + fit.translation[c] - dst[3 * i + c]) ** 2;
    }
    expect(fit.rms).toBeCloseTo(Math.sqrt(ss / 4), 9);
    expect(fit.rms).toBeGreaterThan(0.05);
  });

  it('flags collinear points as ill-determined (eigen gap near 0)', () => {
    const src = [0, 0, 0, 1, 0, 0, 2, 0, 0];
    const fit = fitRigidTransform(src, src, [0, 1, 2], [1, 1, 1], 3, createRigidFit());
    expect(fit.eigenGap).toBeLessThan(1e-9);
  });

  it('gives the identity with gap 0 when all weights are 0', () => {
    const fit = fitRigidTransform([1, 2, 3], [4, 5, 6], [0], [0], 1, createRigidFit());
    expect(Array.from(fit.rotation)).toEqual([0, 0, 0, 1]);
    expect(fit.eigenGap).toBe(0);
  });
});

describe('symmetricEigen', () => {
  it('agrees with ml-matrix EigenvalueDecomposition on random symmetric 4×4', () => {
    const rand = seededRandom(11);
    for (let trial = 0; trial < 20; trial++) {
      const a = new Float64Array(16);
      for (let i = 0; i < 4; i++)
        for (let j = i; j < 4; j++) a[4 * i + j] = a[4 * j + i] = rand() * 2 - 1;
      const ref = new EigenvalueDecomposition(Matrix.from1DArray(4, 4, Array.from(a)), {
        assumeSymmetric: true,
      });
      const refValues = [...ref.realEigenvalues].sort((x, y) => y - x);
      const values = new Float64Array(4);
      const vectors = new Float64Array(16);
      const copy = a.slice();
      symmetricEigen(copy, 4, values, vectors);
      refValues.forEach((v, i) => expect(values[i]).toBeCloseTo(v, 10));
      // A v = λ v for every returned pair.
      for (let k = 0; k < 4; k++) {
        for (let r = 0; r < 4; r++) {
          let av = 0;
          for (let c = 0; c < 4; c++) av += a[4 * r + c] * vectors[4 * c + k];
          expect(av).toBeCloseTo(values[k] * vectors[4 * r + k], 10);
        }
      }
    }
  });
});

/** Kabsch 1976: H = Σ w (p − p̄)(q − q̄)ᵀ = U S Vᵀ, R = V diag(1, 1, det(V Uᵀ)) Uᵀ, via ml-matrix. */
function expectSameAsKabsch(
  src: number[],
  dst: number[],
  w: number[],
  rotation: Float64Array,
): void {
  const count = w.length;
  const ws = w.reduce((a, b) => a + b);
  const pm = [0, 1, 2].map((c) => w.reduce((s, wi, i) => s + wi * src[3 * i + c], 0) / ws);
  const qm = [0, 1, 2].map((c) => w.reduce((s, wi, i) => s + wi * dst[3 * i + c], 0) / ws);
  const h = Matrix.zeros(3, 3);
  for (let i = 0; i < count; i++) {
    for (let a = 0; a < 3; a++) {
      for (let b = 0; b < 3; b++) {
        h.set(a, b, h.get(a, b) + w[i] * (src[3 * i + a] - pm[a]) * (dst[3 * i + b] - qm[b]));
      }
    }
  }
  const svd = new SingularValueDecomposition(h);
  const u = svd.leftSingularVectors;
  const v = svd.rightSingularVectors;
  const d = det3(v.mmul(u.transpose())) < 0 ? -1 : 1;
  const rKabsch = v.mmul(Matrix.diag([1, 1, d])).mmul(u.transpose());
  for (let c = 0; c < 3; c++) {
    const e = [0, 0, 0];
    e[c] = 1;
    const ours = quatRotateVec3([0, 0, 0], 0, rotation, 0, e, 0);
    for (let r = 0; r < 3; r++) expect(ours[r]).toBeCloseTo(rKabsch.get(r, c), 9);
  }
}

function det3(m: Matrix): number {
  const g = (r: number, c: number) => m.get(r, c);
  return (
    g(0, 0) * (g(1, 1) * g(2, 2) - g(1, 2) * g(2, 1)) -
    g(0, 1) * (g(1, 0) * g(2, 2) - g(1, 2) * g(2, 0)) +
    g(0, 2) * (g(1, 0) * g(2, 1) - g(1, 1) * g(2, 0))
  );
}
