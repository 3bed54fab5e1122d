// Learning on small invented data (test/helpers/tissue-capture.ts): determinism, the structure
// of the result, and bad input.
import { describe, expect, it } from 'vitest';
import {
  companionEigen,
  learnProfile,
  spectralRadius,
  unpose,
  writeProfile,
  type Capture,
} from '../../src/index.js';
import { TISSUE_MODE, tissueCapture } from '../helpers/tissue-capture.js';

const data = tissueCapture(4, 60);
const options = { maxModes: 8 };
const first = learnProfile(data.character, data.capture, options);

describe('learnProfile on a noise-free synthetic capture', () => {
  it('re-solves to byte-identical profiles', () => {
    const again = learnProfile(data.character, data.capture, options);
    expect(writeProfile(again.profile)).toEqual(writeProfile(first.profile));
    expect(again.profile.id).toBe(first.profile.id);
  });

  it('gives back the mode within 0.5 % and leaves the tissue motion out of the correctives', () => {
    // Noise-free synthetic data must give back its modes within 0.5 % (solver.md, Dynamics).
    const modes = first.profile.modes.filter((m) => m.energyShare > 0.01);
    expect(modes).toHaveLength(1);
    expect(Math.abs(modes[0].frequencyHz / TISSUE_MODE.frequencyHz - 1)).toBeLessThan(0.005);
    expect(Math.abs(modes[0].dampingRatio / TISSUE_MODE.dampingRatio - 1)).toBeLessThan(0.005);
    // The capture has no correctives: the pose-driven part should be empty.
    const { residuals } = unpose(data.character, data.capture, data.clip);
    const energy = (a: Float32Array): number => a.reduce((s, v) => s + v * v, 0);
    expect(energy(first.poseDisplacement)).toBeLessThan(1e-6 * energy(residuals));
  });

  it('keeps the dynamic basis orthonormal and orthogonal to the corrective span', () => {
    const { basis, k } = first.subspace;
    const span = first.correctiveSpan;
    const d = basis.length / k;
    const dot = (a: Float64Array, ao: number, b: Float64Array, bo: number): number => {
      let s = 0;
      for (let c = 0; c < d; c++) s += a[ao + c] * b[bo + c];
      return s;
    };
    for (let p = 0; p < k; p++) {
      for (let q = 0; q < k; q++)
        expect(dot(basis, p * d, basis, q * d)).toBeCloseTo(p === q ? 1 : 0, 9);
      for (let s = 0; s < span.length / d; s++)
        expect(Math.abs(dot(basis, p * d, span, s * d))).toBeLessThan(1e-9);
    }
  });

  it('keeps every pole inside |z| ≤ 0.995 and reports the margin', () => {
    const { a1, a2, k } = first.profile.dynamics;
    const eig = companionEigen(a1, a2, k);
    const radius = spectralRadius(eig.zRe, eig.zIm);
    expect(radius).toBeLessThanOrEqual(0.995 + 1e-12);
    expect(first.profile.fitReport.stabilityMargin).toBeCloseTo(1 - radius, 12);
    expect(first.profile.modes.reduce((s, m) => s + m.energyShare, 0)).toBeCloseTo(1, 9);
  });

  it('reports progress with increasing fractions ending at 1', () => {
    const seen: number[] = [];
    learnProfile(data.character, data.capture, { ...options, onProgress: (_s, f) => seen.push(f) });
    expect(seen.length).toBeGreaterThan(5);
    for (let i = 1; i < seen.length; i++) expect(seen[i]).toBeGreaterThanOrEqual(seen[i - 1]);
    expect(seen[seen.length - 1]).toBeCloseTo(1, 6);
  });
});

describe('learnProfile on bad input', () => {
  const withPositions = (f: (p: Float32Array, n: number) => void): Capture => {
    const positions = data.capture.positions.slice();
    f(positions, 3 * data.capture.vertexCount);
    return { ...data.capture, positions };
  };

  it('rejects a capture whose frames are all the same with NO_MOTION', () => {
    const still = withPositions((p, d) => {
      for (let t = 1; t < data.capture.frameCount; t++) p.copyWithin(t * d, 0, d);
    });
    expect(() => learnProfile(data.character, still)).toThrow(
      expect.objectContaining({ code: 'NO_MOTION' }),
    );
  });

  it('rejects a skeleton that never moves with NO_MOTION', () => {
    const clip = data.clip;
    const jc = clip.jointNames.length;
    const rotations = clip.rotations.slice();
    const translations = clip.translations.slice();
    for (let t = 1; t < clip.frameCount; t++) {
      rotations.copyWithin(t * 4 * jc, 0, 4 * jc);
      translations.copyWithin(t * 3 * jc, 0, 3 * jc);
    }
    expect(() =>
      learnProfile(data.character, data.capture, { clip: { ...clip, rotations, translations } }),
    ).toThrow(expect.objectContaining({ code: 'NO_MOTION' }));
  });

  it('rejects NaN with NON_FINITE_VALUE at its frame and vertex', () => {
    const d = 3 * data.capture.vertexCount;
    const nan = withPositions((p) => (p[17 * d + 3 * 5 + 1] = Number.NaN));
    expect(() => learnProfile(data.character, nan)).toThrow(
      expect.objectContaining({ code: 'NON_FINITE_VALUE', where: { frame: 17, vertex: 5 } }),
    );
  });

  it('rejects a capture of another character with VERTEX_COUNT_MISMATCH', () => {
    const other = tissueCapture(4, 60);
    const n = other.capture.vertexCount - 8;
    const short: Capture = {
      ...other.capture,
      vertexCount: n,
      positions: new Float32Array(other.capture.frameCount * 3 * n),
    };
    expect(() => learnProfile(data.character, short)).toThrow(
      expect.objectContaining({ code: 'VERTEX_COUNT_MISMATCH' }),
    );
  });
});
