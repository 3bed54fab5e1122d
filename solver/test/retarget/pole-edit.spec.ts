// Pole editing: stiffness and damping act on every mode's frequency and damping ratio, keep the
// mode vectors, and stay stable. Eigenvalues are checked with ml-matrix, independently of the
// real-form algebra under test.
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import {
  createPoleEditor,
  editPoles,
  modalForm,
  poleToModal,
  rebuildDynamics,
  resolveControls,
  type LinearDynamics,
} from '../../src/index.js';
import { seededRandom } from '../helpers/random.js';

/** AR(2) coefficients of a mode discretised exactly: z = e^{sT}. */
function arCoefficients(f: number, zeta: number, fps: number): [number, number] {
  const wn = 2 * Math.PI * f;
  const r = Math.exp((-zeta * wn) / fps);
  return [2 * r * Math.cos((wn * Math.sqrt(1 - zeta * zeta)) / fps), -r * r];
}

/** Decoupled modes mixed by a random orthogonal matrix, so A1 and A2 are full. */
function coupledDynamics(modes: [number, number][], fps: number, seed = 3): LinearDynamics {
  const k = modes.length;
  const rand = seededRandom(seed);
  const q = new Matrix(k, k);
  for (let i = 0; i < k; i++) for (let j = 0; j < k; j++) q.set(i, j, rand() - 0.5);
  const qr = new Matrix(new EigenvalueDecomposition(q.add(q.transpose())).eigenvectorMatrix); // orthogonal
  const d1 = Matrix.zeros(k, k);
  const d2 = Matrix.zeros(k, k);
  modes.forEach(([f, z], i) => {
    const [a1, a2] = arCoefficients(f, z, fps);
    d1.set(i, i, a1);
    d2.set(i, i, a2);
  });
  const a1 = qr.mmul(d1).mmul(qr.transpose());
  const a2 = qr.mmul(d2).mmul(qr.transpose());
  return {
    k,
    m: 0,
    a1: Float64Array.from(a1.to1DArray()),
    a2: Float64Array.from(a2.to1DArray()),
    b0: new Float64Array(0),
    b1: new Float64Array(0),
    inputMean: new Float64Array(0),
    inputScale: new Float64Array(0),
  };
}

/** Frequencies and damping ratios of [[A1, A2], [I, 0]] by ml-matrix, sorted by frequency. */
function companionModes(a1: Float64Array, a2: Float64Array, k: number, fps: number) {
  const f = Matrix.zeros(2 * k, 2 * k);
  for (let r = 0; r < k; r++) {
    for (let c = 0; c < k; c++) {
      f.set(r, c, a1[r * k + c]);
      f.set(r, k + c, a2[r * k + c]);
    }
    f.set(k + r, r, 1);
  }
  const e = new EigenvalueDecomposition(f);
  const out = [];
  const mags = [];
  for (let i = 0; i < 2 * k; i++) {
    mags.push(Math.hypot(e.realEigenvalues[i], e.imaginaryEigenvalues[i]));
    if (e.imaginaryEigenvalues[i] > 0)
      out.push(poleToModal(e.realEigenvalues[i], e.imaginaryEigenvalues[i], fps));
  }
  return {
    modes: out.sort((a, b) => a.frequencyHz - b.frequencyHz),
    maxMagnitude: Math.max(...mags),
  };
}

const MODES: [number, number][] = [
  [1.6, 0.07],
  [2.2, 0.12],
  [3.0, 0.15],
  [4.6, 0.22],
];

describe('pole editing', () => {
  // Worked values from z = e^{sT} (Franklin, Powell & Workman, Digital Control of Dynamic
  // Systems), as listed in the design: 3 Hz, ζ = 0.1.
  it('discretises 3 Hz, ζ = 0.1 to the worked poles at 24 and 60 fps', () => {
    const [a1, a2] = arCoefficients(3, 0.1, 24);
    expect(a1).toBeCloseTo(1.312528, 6);
    expect(a2).toBeCloseTo(-0.854636, 6);
    const modal = modalForm(coupledDynamics([[3, 0.1]], 24), 24, []);
    expect(modal.zRe[0]).toBeCloseTo(0.656264, 6);
    expect(Math.abs(modal.zIm[0])).toBeCloseTo(0.651117, 6);
    const at60 = modalForm(coupledDynamics([[3, 0.1]], 60), 60, []);
    expect(Math.hypot(at60.zRe[0], at60.zIm[0])).toBeCloseTo(0.969072, 6);
    expect(Math.abs(Math.atan2(at60.zIm[0], at60.zRe[0]))).toBeCloseTo(0.312585, 6);
  });

  it('stiffness s multiplies every natural frequency by s and keeps damping ratios', () => {
    const fps = 60;
    const dyn = coupledDynamics(MODES, fps);
    const ed = createPoleEditor(modalForm(dyn, fps, []));
    const a1 = new Float64Array(16);
    const a2 = new Float64Array(16);
    for (const s of [0.5, 1.3, 2]) {
      editPoles(ed, s, 1);
      expect(rebuildDynamics(ed, a1, a2, new Float64Array(32))).toBe(true);
      const { modes, maxMagnitude } = companionModes(a1, a2, 4, fps);
      modes.forEach((m, i) => {
        expect(Math.abs(m.frequencyHz / (MODES[i][0] * s) - 1)).toBeLessThan(1e-3);
        expect(m.dampingRatio).toBeCloseTo(MODES[i][1], 6);
      });
      expect(maxMagnitude).toBeLessThanOrEqual(0.995 + 1e-9);
    }
  });

  it('damping d multiplies every damping ratio by d and keeps frequencies', () => {
    const fps = 24;
    const dyn = coupledDynamics(MODES, fps);
    const ed = createPoleEditor(modalForm(dyn, fps, []));
    const a1 = new Float64Array(16);
    const a2 = new Float64Array(16);
    for (const d of [0.5, 1.7]) {
      editPoles(ed, 1, d);
      rebuildDynamics(ed, a1, a2, new Float64Array(32));
      const { modes } = companionModes(a1, a2, 4, fps);
      modes.forEach((m, i) => {
        expect(m.dampingRatio / (MODES[i][1] * d)).toBeCloseTo(1, 6);
        expect(m.frequencyHz / MODES[i][0]).toBeCloseTo(1, 6);
      });
    }
  });

  it('keeps the mode vectors: (z′²I − z′A1′ − A2′)v = 0 for the original vectors', () => {
    const fps = 60;
    const modal = modalForm(coupledDynamics(MODES, fps), fps, []);
    const ed = createPoleEditor(modal);
    const k = 4;
    const a1 = new Float64Array(16);
    const a2 = new Float64Array(16);
    editPoles(ed, 1.4, 0.8);
    rebuildDynamics(ed, a1, a2, new Float64Array(32));
    for (let i = 0; i < 2 * k; i++) {
      const zr = ed.zRe[i], zi = ed.zIm[i]; // prettier-ignore
      const z2r = zr * zr - zi * zi, z2i = 2 * zr * zi; // prettier-ignore
      for (let r = 0; r < k; r++) {
        let re = 0, im = 0; // prettier-ignore
        for (let c = 0; c < k; c++) {
          const vr = modal.vRe[i * k + c], vi = modal.vIm[i * k + c]; // prettier-ignore
          const m2r = (r === c ? z2r : 0) - zr * a1[r * k + c] - a2[r * k + c];
          const m2i = (r === c ? z2i : 0) - zi * a1[r * k + c];
          re += m2r * vr - m2i * vi;
          im += m2r * vi + m2i * vr;
        }
        expect(Math.hypot(re, im)).toBeLessThan(1e-9);
      }
    }
  });

  it('holds every pole inside |z| ≤ 0.995 when damping is cut hard', () => {
    const fps = 60;
    const ed = createPoleEditor(modalForm(coupledDynamics(MODES, fps), fps, []));
    const a1 = new Float64Array(16);
    const a2 = new Float64Array(16);
    editPoles(ed, 1, 0.01);
    rebuildDynamics(ed, a1, a2, new Float64Array(32));
    expect(companionModes(a1, a2, 4, fps).maxMagnitude).toBeLessThanOrEqual(0.995 + 1e-9);
  });

  it('turns an over-damped pair into two real poles without losing stability', () => {
    const fps = 60;
    const ed = createPoleEditor(modalForm(coupledDynamics(MODES, fps), fps, []));
    const a1 = new Float64Array(16);
    const a2 = new Float64Array(16);
    editPoles(ed, 1, 20);
    expect(Array.from(ed.zIm).every((v) => v === 0)).toBe(true);
    expect(rebuildDynamics(ed, a1, a2, new Float64Array(32))).toBe(true);
    expect(companionModes(a1, a2, 4, fps).maxMagnitude).toBeLessThan(1);
  });

  it('rejects controls out of range with BAD_CONTROL', () => {
    expect(() => resolveControls({ stiffness: 0 })).toThrow(
      expect.objectContaining({ code: 'BAD_CONTROL' }),
    );
    expect(() => resolveControls({ damping: -1 })).toThrow(
      expect.objectContaining({ code: 'BAD_CONTROL' }),
    );
    expect(() => resolveControls({ mutedModes: [4] }, 4)).toThrow(
      expect.objectContaining({ code: 'BAD_CONTROL' }),
    );
    expect(() => resolveControls({ gain: Number.NaN })).toThrow(
      expect.objectContaining({ code: 'BAD_CONTROL' }),
    );
  });
});
