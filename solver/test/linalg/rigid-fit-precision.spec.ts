// Precision of the rigid fit: exact recovery on noise-free points and the error rate under noise.
import { describe, expect, it } from 'vitest';
import { createRigidFit, fitRigidTransform } from '../../src/index.js';
import { randomQuat, seededRandom } from '../helpers/random.js';

/** Rotates v by the unit quaternion q = [x, y, z, w] (written out here, independent of src). */
function rotate(q: ArrayLike<number>, v: number[]): number[] {
  const [x, y, z, w] = [q[0], q[1], q[2], q[3]];
  // v' = v + 2w (u × v) + 2 u × (u × v), u = (x, y, z).
  const cx = y * v[2] - z * v[1];
  const cy = z * v[0] - x * v[2];
  const cz = x * v[1] - y * v[0];
  return [
    v[0] + 2 * (w * cx + y * cz - z * cy),
    v[1] + 2 * (w * cy + z * cx - x * cz),
    v[2] + 2 * (w * cz + x * cy - y * cx),
  ];
}

/**
 * Angle in radians of R_a·R_bᵀ, from the relative quaternion r = a·b⁻¹ as 2·atan2(|r_xyz|, |r_w|):
 * stable for tiny angles, where 2·acos(|r_w|) loses half the digits.
 */
function angleBetween(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const [ax, ay, az, aw] = [a[0], a[1], a[2], a[3]];
  const [bx, by, bz, bw] = [-b[0], -b[1], -b[2], b[3]];
  const rx = aw * bx + ax * bw + ay * bz - az * by;
  const ry = aw * by - ax * bz + ay * bw + az * bx;
  const rz = aw * bz + ax * by - ay * bx + az * bw;
  const rw = aw * bw - ax * bx - ay * by - az * bz;
  return 2 * Math.atan2(Math.hypot(rx, ry, rz), Math.abs(rw));
}

/** Standard normal samples (Box–Muller) from a uniform generator. */
function gaussian(rand: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

interface Trial {
  src: Float64Array;
  dst: Float64Array;
  weights: Float64Array;
  indices: Int32Array;
}

/** `count` points uniform in the unit cube moved by (q, t), plus Gaussian noise σ on the targets. */
function makeTrial(
  rand: () => number,
  count: number,
  q: number[],
  t: number[],
  sigma: number,
  randomWeights: boolean,
): Trial {
  const normal = gaussian(rand);
  const src = new Float64Array(3 * count);
  const dst = new Float64Array(3 * count);
  for (let i = 0; i < count; i++) {
    const p = [rand() - 0.5, rand() - 0.5, rand() - 0.5];
    const r = rotate(q, p);
    for (let c = 0; c < 3; c++) {
      src[3 * i + c] = p[c];
      dst[3 * i + c] = r[c] + t[c] + sigma * normal();
    }
  }
  const weights = Float64Array.from({ length: count }, () => (randomWeights ? 0.1 + rand() : 1));
  return { src, dst, weights, indices: Int32Array.from({ length: count }, (_, i) => i) };
}

const fit = createRigidFit();
const fitTrial = (trial: Trial) =>
  fitRigidTransform(trial.src, trial.dst, trial.indices, trial.weights, trial.weights.length, fit);

describe('rigid fit precision', () => {
  // Kabsch 1976 and Horn 1987: on noise-free points the least-squares rotation is the true one,
  // so the recovered rotation differs from it only by round-off.
  it('recovers known rotations within 1e-9 rad on noise-free points', () => {
    const rand = seededRandom(2024);
    const s = Math.SQRT1_2;
    // Fixed edge cases first (identity, half turns where w = 0), then seeded random ones.
    const rotations = [
      [0, 0, 0, 1],
      [1, 0, 0, 0],
      [0, s, s, 0],
      [0, 0, Math.sin(1e-7), Math.cos(1e-7)],
    ];
    for (let k = 0; k < 300; k++) rotations.push(randomQuat(rand, Math.PI));
    let worst = 0;
    rotations.forEach((q, k) => {
      const count = 4 + Math.floor(rand() * 200);
      const t = [(rand() - 0.5) * 10, (rand() - 0.5) * 10, (rand() - 0.5) * 10];
      const trial = makeTrial(rand, count, q, t, 0, k % 2 === 1);
      const result = fitTrial(trial);
      worst = Math.max(worst, angleBetween(result.rotation, q));
      for (let c = 0; c < 3; c++) expect(result.translation[c]).toBeCloseTo(t[c], 9);
    });
    expect(worst).toBeLessThan(1e-9);
  });

  // With Gaussian noise the rotation error of a least-squares estimator falls as 1/√n, the usual
  // rate for n independent observations (first-order error propagation of least squares). For
  // points uniform in the unit cube, Σ(|p|²I − ppᵀ) ≈ n/6·I, so each error component has variance
  // 6σ²/n and the mean angle is E[χ₃]·σ·√(6/n) with E[χ₃] = 2√(2/π) (derived here, not quoted).
  it('has a rotation error that shrinks as 1/√n under noise (log-log slope ≈ −0.5)', () => {
    const rand = seededRandom(77);
    const sigma = 0.01;
    const sizes = [100, 400, 1600, 6400];
    const trials = 300;
    const means = sizes.map((n) => {
      let total = 0;
      for (let k = 0; k < trials; k++) {
        const q = randomQuat(rand, Math.PI);
        const trial = makeTrial(rand, n, q, [rand(), rand(), rand()], sigma, false);
        total += angleBetween(fitTrial(trial).rotation, q);
      }
      return total / trials;
    });
    // Least-squares slope of log(mean error) against log(n).
    const xs = sizes.map(Math.log);
    const ys = means.map(Math.log);
    const mx = xs.reduce((a, b) => a + b) / xs.length;
    const my = ys.reduce((a, b) => a + b) / ys.length;
    let sxy = 0;
    let sxx = 0;
    xs.forEach((x, i) => {
      sxy += (x - mx) * (ys[i] - my);
      sxx += (x - mx) ** 2;
    });
    const slope = sxy / sxx;
    expect(slope).toBeGreaterThan(-0.6);
    expect(slope).toBeLessThan(-0.4);
    // The level, not only the rate: within 10 % of the first-order prediction at every n.
    sizes.forEach((n, i) => {
      const predicted = 2 * Math.sqrt(2 / Math.PI) * sigma * Math.sqrt(6 / n);
      expect(Math.abs(means[i] / predicted - 1)).toBeLessThan(0.1);
    });
  });
});
