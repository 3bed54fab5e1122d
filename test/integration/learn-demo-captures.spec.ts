// Learning the two synthetic demo captures (assets-sample: invented data with exact ground truth)
// through the built solver. Ground truth: *.truth.json and *.truth.bin beside each capture.
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

async function learnDemo(name: string): Promise<{ result: LearnResult; modes: TruthMode[] }> {
  const character = await readCharacter(
    new Uint8Array(await readFile(`${FILES}characters/coach-madge.glb`)),
  );
  const capture = await readCapture(new Uint8Array(await readFile(`${FILES}captures/${name}.glb`)));
  const truth = JSON.parse(await readFile(`${FILES}captures/${name}.truth.json`, 'utf8')) as {
    modes: TruthMode[];
  };
  return { result: learnProfile(character, capture), modes: truth.modes };
}

for (const name of ['coach-poolside-drill', 'coach-whistle-and-bounce']) {
  describe(`learning ${name}`, () => {
    let learned: { result: LearnResult; modes: TruthMode[] };
    beforeAll(async () => {
      learned = await learnDemo(name);
    }, 60_000);

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
      const truth = [...learned.modes].sort((a, b) => b.energyShare - a.energyShare)[0];
      expect(strongest.region).toBe(truth.region);
      expect(Math.abs(strongest.frequencyHz / truth.frequencyHz - 1)).toBeLessThan(0.01);
    });

    // Not met yet. Relative error of the pose-driven part: 0.10 on the noise-free capture (0.74
    // before competing tissue signals, a 0.8 Hz cut-off and full-band correctives), 0.27 on the
    // noisy one; 5 of 7 modes within tolerance on the noise-free capture (the upper-arm sags are
    // 2–3 % off, the glutes 1.9 %); held-out free-run NRMSE 0.20 on the noisy capture but 18.6 on
    // the noise-free one (see the learn report for the figures).
    it.todo('recovers every mode: frequency within 1 %, damping ratio within 10 %');
    it.todo('splits pose-driven from dynamic displacement with under 10 % relative error');
    it.todo('free-runs the held-out frames with a normalised RMS error under 0.3');
  });
}
