// A take made by the solver in the test process, for what the API cannot be asked for: the
// live-tuning budget's own case, 600 frames with a basis of K = 32. Learning keeps every
// direction up to the cap (no noise test), so the demo capture fills all 32.
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import {
  learnProfile,
  readCapture,
  readCharacter,
  readClip,
  readTakeGlb,
  retarget,
  writeTakeGlb,
} from '@overshoot/solver';

const FILES = fileURLToPath(new URL('../../assets-sample/files/', import.meta.url));

/** The take file and what it holds. */
export interface SolverTake {
  bytes: Uint8Array;
  k: number;
  frameCount: number;
}

/** Learns from the demo capture with K = 32 and retargets the 600-frame demo clip (about a minute). */
export async function makeK32Take(): Promise<SolverTake> {
  const read = async (p: string) => new Uint8Array(await readFile(`${FILES}${p}`));
  const character = await readCharacter(await read('characters/coach-madge.glb'));
  const capture = await readCapture(await read('captures/coach-whistle-and-bounce.glb'));
  const clip = await readClip(await read('clips/coach-poolside-drill.glb'), 'gltf');
  const { profile } = learnProfile(character, capture, {
    maxModes: 32,
    noiseFactor: 0,
    minEnergyShare: 0,
  });
  const result = retarget(profile, character, clip, {});
  const bytes = await writeTakeGlb(result.take, character, result.clip);
  const back = await readTakeGlb(bytes);
  return { bytes, k: back.live.k, frameCount: back.live.frameCount };
}
