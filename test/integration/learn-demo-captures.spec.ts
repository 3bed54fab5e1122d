// Learning the two synthetic demo captures (assets-sample: invented data with exact ground truth)
// through the built solver with default options. Ground truth: *.truth.json and *.truth.bin beside
// each capture — 7 damped modes, each confined to a region, and 4 pose correctives. The acceptance
// figures are those of the design (solver.md, "Synthetic ground truth"): every mode's frequency
// within 1 % and damping ratio within 10 %, the pose-driven part within 10 %, and the held-out
// free run within a normalised RMS error of 0.3.
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import {
  companionEigen,
  learnProfile,
  readCapture,
  readCharacter,
  readProfile,
  spectralRadius,
  writeProfile,
  type LearnResult,
  type Mode,
} from '@overshoot/solver';
import { beforeAll, describe, expect, it } from 'vitest';

const FILES = fileURLToPath(new URL('../../assets-sample/files/', import.meta.url));

interface TruthMode {
  id: string;
  frequencyHz: number;
  dampingRatio: number;
  region: string;
  energyShare: number;
}

interface ArrayRef {
  dtype: 'float32' | 'float64';
  shape: number[];
  byteOffset: number;
  byteLength: number;
}

interface Truth {
  frameCount: number;
  vertexCount: number;
  modes: TruthMode[];
  arrays: { entries: Record<string, ArrayRef> };
}

/** A named array of the little-endian truth binary, as float64. */
function truthArray(bin: Uint8Array, ref: ArrayRef): Float64Array {
  const view = new DataView(bin.buffer, bin.byteOffset + ref.byteOffset, ref.byteLength);
  const width = ref.dtype === 'float64' ? 8 : 4;
  return Float64Array.from({ length: ref.byteLength / width }, (_, i) =>
    width === 8 ? view.getFloat64(8 * i, true) : view.getFloat32(4 * i, true),
  );
}

/** True pose-driven displacement, rest space (T × 3N): Σ_c activation_c(t) · correctiveShape_c. */
function truePoseDisplacement(truth: Truth, bin: Uint8Array): Float64Array {
  const shapes = truthArray(bin, truth.arrays.entries.correctiveShapes);
  const activations = truthArray(bin, truth.arrays.entries.correctiveActivations);
  const frames = truth.frameCount;
  const d = 3 * truth.vertexCount;
  const count = shapes.length / d;
  const out = new Float64Array(frames * d);
  for (let t = 0; t < frames; t++) {
    for (let c = 0; c < count; c++) {
      const a = activations[t * count + c];
      for (let i = 0; i < d; i++) out[t * d + i] += a * shapes[c * d + i];
    }
  }
  return out;
}

/**
 * Each true mode's counterpart: the learned mode of the same region nearest in frequency, no
 * learned mode serving two true ones (strongest true modes choose first).
 */
function matchModes(learned: Mode[], truth: TruthMode[]): Map<TruthMode, Mode | null> {
  const used = new Set<Mode>();
  const out = new Map<TruthMode, Mode | null>();
  for (const t of [...truth].sort((a, b) => b.energyShare - a.energyShare)) {
    const candidates = learned
      .filter((m) => m.region === t.region && !used.has(m))
      .sort(
        (a, b) => Math.abs(a.frequencyHz - t.frequencyHz) - Math.abs(b.frequencyHz - t.frequencyHz),
      );
    const best = candidates[0] ?? null;
    if (best) used.add(best);
    out.set(t, best);
  }
  return out;
}

interface Learned {
  result: LearnResult;
  truth: Truth;
  bin: Uint8Array;
}

async function learnDemo(name: string): Promise<Learned> {
  const character = await readCharacter(
    new Uint8Array(await readFile(`${FILES}characters/coach-madge.glb`)),
  );
  const capture = await readCapture(new Uint8Array(await readFile(`${FILES}captures/${name}.glb`)));
  const truth = JSON.parse(await readFile(`${FILES}captures/${name}.truth.json`, 'utf8')) as Truth;
  const bin = new Uint8Array(await readFile(`${FILES}captures/${name}.truth.bin`));
  return { result: learnProfile(character, capture), truth, bin };
}

for (const name of ['coach-poolside-drill', 'coach-whistle-and-bounce']) {
  describe(`learning ${name}`, () => {
    let learned: Learned;
    beforeAll(async () => {
      learned = await learnDemo(name);
    }, 120_000);

    it('writes a profile that reads back byte for byte', () => {
      const bytes = writeProfile(learned.result.profile);
      const back = readProfile(bytes);
      expect(back.id).toBe(learned.result.profile.id);
      expect(writeProfile(back)).toEqual(bytes);
    });

    it('keeps every pole inside |z| ≤ 0.995', () => {
      const { a1, a2, k } = learned.result.profile.dynamics;
      const eig = companionEigen(a1, a2, k);
      expect(spectralRadius(eig.zRe, eig.zIm)).toBeLessThanOrEqual(0.995 + 1e-12);
    });

    it('finds the strongest mode (belly bounce) in the belly within 1 % of its frequency', () => {
      const strongest = [...learned.result.profile.modes].sort(
        (a, b) => b.energyShare - a.energyShare,
      )[0];
      const truth = [...learned.truth.modes].sort((a, b) => b.energyShare - a.energyShare)[0];
      expect(strongest.region).toBe(truth.region);
      expect(Math.abs(strongest.frequencyHz / truth.frequencyHz - 1)).toBeLessThan(0.01);
    });

    it('recovers every mode: frequency within 1 %, damping ratio within 10 %', () => {
      const matched = matchModes(learned.result.profile.modes, learned.truth.modes);
      const errors = learned.truth.modes.map((t) => {
        const m = matched.get(t);
        return {
          id: t.id,
          found: m !== null && m !== undefined,
          frequency: m ? Math.abs(m.frequencyHz / t.frequencyHz - 1) : Infinity,
          damping: m ? Math.abs(m.dampingRatio / t.dampingRatio - 1) : Infinity,
        };
      });
      for (const e of errors) {
        expect(e.found, `${e.id} has a learned mode in its region`).toBe(true);
        expect(e.frequency, `${e.id} frequency error`).toBeLessThan(0.01);
        expect(e.damping, `${e.id} damping-ratio error`).toBeLessThan(0.1);
      }
    });

    it('splits pose-driven from dynamic displacement with under 10 % relative error', () => {
      // Relative error of the pose-driven part: ‖P̂ − P‖ / ‖P‖, Frobenius norms over every vertex
      // coordinate of every frame, in the rest-pose frame (the unposed space where correctives
      // live). P is the truth's corrective displacement; P̂ is learnProfile's poseDisplacement.
      const truePose = truePoseDisplacement(learned.truth, learned.bin);
      const estimate = learned.result.poseDisplacement;
      expect(estimate.length).toBe(truePose.length);
      let err = 0;
      let norm = 0;
      for (let i = 0; i < truePose.length; i++) {
        err += (estimate[i] - truePose[i]) ** 2;
        norm += truePose[i] ** 2;
      }
      expect(norm).toBeGreaterThan(0);
      expect(Math.sqrt(err / norm)).toBeLessThan(0.1);
    });

    it('free-runs the held-out frames with a normalised RMS error under 0.3', () => {
      const report = learned.result.profile.fitReport;
      expect(report.heldOutFrames).toBeGreaterThan(0);
      expect(report.freeRunNrmse).toBeLessThan(0.3);
    });
  });
}
