// Content hash and the binary profile format.
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import {
  PROFILE_FORMAT_VERSION,
  readProfile,
  sha256Hex,
  writeProfile,
  type TissueProfile,
} from '../../src/index.js';
import { syntheticCharacter } from '../helpers/synthetic-character.js';

describe('SHA-256', () => {
  // FIPS 180-4 example "abc" and the empty message (NIST test vectors).
  it('matches the NIST vectors and node:crypto on every padding length', () => {
    expect(sha256Hex(new TextEncoder().encode('abc'))).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
    expect(sha256Hex(new Uint8Array(0))).toBe(
      'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855',
    );
    for (let n = 0; n < 200; n += 7) {
      const data = Uint8Array.from({ length: n }, (_, i) => (i * 31 + n) & 255);
      expect(sha256Hex(data)).toBe(createHash('sha256').update(data).digest('hex'));
    }
  });
});

/** A small but complete profile (hand-made, not learned). */
function smallProfile(): TissueProfile {
  const source = syntheticCharacter({ sides: 4, rings: 2 });
  const n = source.restPositions.length / 3;
  return {
    formatVersion: 1,
    id: '',
    name: 'small',
    fps: 60,
    settings: { cutoffHz: 1.5, note: 'hand-made', flag: true },
    source,
    drivers: [{ joint: 'chest', signals: ['specificForce'] }],
    basis: Float32Array.from({ length: 3 * n }, (_, i) => Math.sin(i)),
    singularValues: Float64Array.of(2.5),
    correctives: {
      featuresPerVertex: 36,
      featureJoints: new Uint16Array(4 * n),
      coefficients: Float32Array.from({ length: n * 3 * 36 }, (_, i) => i * 1e-3),
      ridgeLambda: 0.25,
    },
    dynamics: {
      k: 1,
      m: 3,
      a1: Float64Array.of(1.9),
      a2: Float64Array.of(-0.95),
      b0: Float64Array.of(0.1, -0.2, 0.3),
      b1: Float64Array.of(0, 0.1, -0.1),
      inputMean: Float64Array.of(0, 9.81, -0),
      inputScale: Float64Array.of(1, 2, 3),
    },
    modes: [{ frequencyHz: 3, dampingRatio: 0.1, region: 'body', energyShare: 1, flags: [] }],
    fitReport: {
      trainFrames: 480,
      heldOutFrames: 120,
      oneStepNrmse: 0.01,
      freeRunNrmse: 0.2,
      varianceExplained: 0.96,
      stabilityMargin: 0.03,
      poseShare: 0.1,
      dynamicShare: 0.9,
      spectrumPeaks: [{ region: 'body', frequencyHz: 3, power: 1e-4 }],
    },
  };
}

describe('profile format', () => {
  it('round-trips exactly, typed arrays and −0 included, with the content hash as id', () => {
    const p = smallProfile();
    const bytes = writeProfile(p);
    const back = readProfile(bytes);
    expect(back.id).toMatch(/^[0-9a-f]{64}$/);
    expect({ ...back, id: '' }).toEqual(p);
    expect(Object.is(back.dynamics.inputMean[2], -0)).toBe(true);
    expect(back.basis).toBeInstanceOf(Float32Array);
    expect(writeProfile(back)).toEqual(bytes);
  });

  it('rejects another format version with UNSUPPORTED_FORMAT_VERSION', () => {
    const bytes = writeProfile(smallProfile());
    new DataView(bytes.buffer).setUint32(4, PROFILE_FORMAT_VERSION + 1, true);
    expect(() => readProfile(bytes)).toThrow(
      expect.objectContaining({ code: 'UNSUPPORTED_FORMAT_VERSION' }),
    );
  });

  it('rejects other files, truncated files and altered content with NOT_A_PROFILE', () => {
    const bytes = writeProfile(smallProfile());
    expect(() => readProfile(new TextEncoder().encode('glTF....'))).toThrow(
      expect.objectContaining({ code: 'NOT_A_PROFILE' }),
    );
    expect(() => readProfile(bytes.subarray(0, bytes.length - 100))).toThrow(
      expect.objectContaining({ code: 'NOT_A_PROFILE' }),
    );
    const altered = bytes.slice();
    altered[altered.length - 3] ^= 1;
    expect(() => readProfile(altered)).toThrow(expect.objectContaining({ code: 'NOT_A_PROFILE' }));
  });
});
