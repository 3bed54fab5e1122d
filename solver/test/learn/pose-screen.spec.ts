// Screening a region's components against its pose features: a corrective's time course lies in
// the span of the features, a damped ringing does not, and the ringing's spatial pattern comes out
// free of the corrective's shape even when the two share the region's leading components.
import { describe, expect, it } from 'vitest';
import { leadingSubspace, modalToPole, seededNormal } from '../../src/index.js';
import { screenComponents } from '../../src/learn/pose-screen.js';

const FRAMES = 300;

/** Smooth random features (T×P), a corrective a = Xw and a ringing q driven by other inputs. */
function signals(P = 9): { x: Float64Array; a: Float64Array; q: Float64Array } {
  const normal = seededNormal(5);
  const x = new Float64Array(FRAMES * P);
  const level = new Float64Array(P);
  for (let t = 0; t < FRAMES; t++) {
    for (let f = 0; f < P; f++) {
      if (t % 25 === 0) level[f] = normal();
      x[t * P + f] = (t > 0 ? 0.9 * x[(t - 1) * P + f] : 0) + 0.1 * level[f];
    }
  }
  const w = Float64Array.from({ length: P }, () => normal());
  const a = Float64Array.from({ length: FRAMES }, (_, t) => {
    let s = 0;
    for (let f = 0; f < P; f++) s += x[t * P + f] * w[f];
    return s;
  });
  const z = modalToPole(4, 0.1, 60);
  const q = new Float64Array(FRAMES);
  for (let t = 0; t < FRAMES; t++) {
    const kick = t % 60 === 0 ? normal() : 0;
    q[t] = (t > 0 ? 2 * z.re * q[t - 1] : 0) - (t > 1 ? (z.re ** 2 + z.im ** 2) * q[t - 2] : 0) + kick; // prettier-ignore
  }
  return { x, a, q };
}

describe('screenComponents', () => {
  it('tells a corrective (explained 1) from tissue ringing, with the ringing shape exact', () => {
    const P = 9;
    const { x, a, q } = signals(P);
    // Region of 4 vertices (12 coordinates); the two shapes overlap (not orthogonal).
    const corrective = Float64Array.of(1, 0, 0, 0.5, 0, 0, 0, 0, 0, 0.2, 0, 0);
    const tissue = Float64Array.of(0.3, 1, 0, 0, 0.8, 0, 0, 0.4, 0, 0, 0, 0.1);
    const dr = corrective.length;
    const motion = new Float32Array(FRAMES * dr);
    for (let t = 0; t < FRAMES; t++)
      for (let j = 0; j < dr; j++) motion[t * dr + j] = a[t] * corrective[j] + q[t] * tissue[j];
    const sub = leadingSubspace(motion, FRAMES, dr, 2, 'gram', 1);
    const screen = screenComponents(sub.coefficients, FRAMES, 2, x, P);
    // Least explained first.
    expect(screen.explained[0]).toBeLessThan(0.5);
    expect(screen.explained[1]).toBeGreaterThan(0.999);
    const pattern = new Float64Array(dr);
    for (let q2 = 0; q2 < 2; q2++)
      for (let j = 0; j < dr; j++) pattern[j] += screen.patterns[q2] * sub.basis[q2 * dr + j];
    const dot = pattern.reduce((s, v, j) => s + v * tissue[j], 0);
    const cos = dot / Math.hypot(...pattern) / Math.hypot(...tissue);
    expect(Math.abs(cos)).toBeGreaterThan(1 - 1e-9);
  });

  it('discounts the share 45 features explain of pure noise by chance', () => {
    const noise = seededNormal(9);
    const c = Float64Array.from({ length: FRAMES * 2 }, () => noise());
    // Make the two columns orthogonal, as PCA coefficients are.
    let dot = 0;
    let n0 = 0;
    for (let t = 0; t < FRAMES; t++) {
      dot += c[2 * t] * c[2 * t + 1];
      n0 += c[2 * t] ** 2;
    }
    for (let t = 0; t < FRAMES; t++) c[2 * t + 1] -= (dot / n0) * c[2 * t];
    // White features: unadjusted, 45 of them explain about 45/300 = 0.15 of anything (measured
    // 0.14 and 0.20 here; 0 and 0.05 adjusted).
    const x = Float64Array.from({ length: FRAMES * 45 }, () => noise());
    const screen = screenComponents(c, FRAMES, 2, x, 45);
    expect(Math.max(...screen.explained)).toBeLessThan(0.1);
  });
});
