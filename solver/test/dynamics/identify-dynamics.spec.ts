// Identification of multi-input dynamics, stability enforcement and pole edits.
import { describe, expect, it } from 'vitest';
import {
  companionEigen,
  enforceStability,
  identifyDynamics,
  modalToPole,
  poleToModal,
  rebuildFromPoles,
  seededNormal,
  spectralRadius,
} from '../../src/index.js';

/** Two known modes (coordinates mixed by a rotation) driven by three smooth inputs. */
function twoModeData(fps: number, frames: number) {
  const modes = [
    { f: 2.2, z: 0.12 },
    { f: 4.6, z: 0.22 },
  ];
  const normal = seededNormal(4);
  const m = 3;
  const raw = new Float64Array(frames * m);
  // Smooth random inputs: random steps through a one-pole smoother.
  const state = [0, 0, 0];
  for (let t = 0; t < frames; t++) {
    for (let j = 0; j < m; j++) {
      if (t % 15 === 0) state[j] = normal();
      raw[t * m + j] =
        (t > 0 ? 0.8 * raw[(t - 1) * m + j] : 0) + 0.2 * state[j] + (j === 1 ? 9.81 : 0);
    }
  }
  const rest = Float64Array.of(0, 9.81, 0);
  const q = new Float64Array(frames * 2);
  const gains = [
    [0.5, -0.2, 0.1],
    [-0.1, 0.3, 0.4],
  ];
  modes.forEach(({ f, z }, k) => {
    const p = modalToPole(f, z, fps);
    const a1 = 2 * p.re;
    const a2 = -(p.re * p.re + p.im * p.im);
    for (let t = 0; t < frames; t++) {
      let drive = 0;
      for (let j = 0; j < m; j++) drive += gains[k][j] * (raw[t * m + j] - rest[j]);
      q[t * 2 + k] =
        (t > 0 ? a1 * q[(t - 1) * 2 + k] : 0) +
        (t > 1 ? a2 * q[(t - 2) * 2 + k] : 0) +
        0.01 * drive;
    }
  });
  const c = new Float64Array(frames * 2);
  const [cs, sn] = [Math.cos(0.6), Math.sin(0.6)];
  for (let t = 0; t < frames; t++) {
    c[t * 2] = cs * q[t * 2] - sn * q[t * 2 + 1];
    c[t * 2 + 1] = sn * q[t * 2] + cs * q[t * 2 + 1];
  }
  return { modes, raw, rest, c, m };
}

describe('identifyDynamics', () => {
  it('gives back noise-free modes within 0.5 % (frequency and damping)', () => {
    const fps = 60;
    const frames = 480;
    const { modes, raw, rest, c, m } = twoModeData(fps, frames);
    const id = identifyDynamics(c, raw, rest, frames, 2, m, 384);
    const eig = companionEigen(id.dynamics.a1, id.dynamics.a2, 2);
    const found = [...eig.zRe.keys()]
      .filter((i) => eig.zIm[i] > 0)
      .map((i) => poleToModal(eig.zRe[i], eig.zIm[i], fps))
      .sort((a, b) => a.frequencyHz - b.frequencyHz);
    expect(found).toHaveLength(2);
    found.forEach((f, i) => {
      expect(Math.abs(f.frequencyHz / modes[i].f - 1)).toBeLessThan(0.005);
      expect(Math.abs(f.dampingRatio / modes[i].z - 1)).toBeLessThan(0.005);
    });
    // Inputs at their learned mean leave the dynamics at rest: the intercept went into inputMean.
    expect(Math.abs(id.dynamics.inputMean[1] - 9.81)).toBeLessThan(1e-3);
  });
});

describe('stability', () => {
  it('rebuilds A1, A2 with edited poles and the same mode vectors', () => {
    const a1 = Float64Array.of(1.6, 0.1, -0.05, 1.4);
    const a2 = Float64Array.of(-0.8, 0.02, 0.01, -0.7);
    const eig = companionEigen(a1, a2, 2);
    const zRe = eig.zRe.map((v) => v * 0.9);
    const zIm = eig.zIm.map((v) => v * 0.9);
    const rebuilt = rebuildFromPoles(eig, zRe, zIm);
    const after = companionEigen(rebuilt.a1, rebuilt.a2, 2);
    const sorted = (re: Float64Array, im: Float64Array) =>
      [...re.keys()].map((i) => [re[i], im[i]]).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
    const want = sorted(zRe, zIm);
    sorted(after.zRe, after.zIm).forEach((p, i) => {
      expect(p[0]).toBeCloseTo(want[i][0], 9);
      expect(p[1]).toBeCloseTo(want[i][1], 9);
    });
  });

  it('pulls unstable poles inside |z| ≤ 0.995 and refits the inputs', () => {
    const frames = 200;
    const normal = seededNormal(8);
    const u = Float64Array.from({ length: frames }, () => normal());
    const c = new Float64Array(frames);
    for (let t = 2; t < frames; t++) c[t] = 1.9 * c[t - 1] - 0.99 * c[t - 2] + 0.1 * u[t];
    const unstable = {
      k: 1,
      m: 1,
      a1: Float64Array.of(2.0),
      a2: Float64Array.of(-1.02),
      b0: Float64Array.of(0.1),
      b1: Float64Array.of(0),
      d: Float64Array.of(0),
    };
    const r = enforceStability(unstable, c, u, 2, frames, 0);
    expect(r.radiusBefore).toBeGreaterThan(1);
    expect(r.moved).toBe(2);
    const eig = companionEigen(r.model.a1, r.model.a2, 1);
    expect(spectralRadius(eig.zRe, eig.zIm)).toBeLessThanOrEqual(0.995 + 1e-12);
  });
});
