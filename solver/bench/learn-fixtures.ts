// Invented benchmark data for learning: the swimmer character of assets-sample (about 7,500
// vertices) and a capture made here by skinning a smooth clip plus one damped 3 Hz belly jiggle
// driven by the pelvis. Not a real capture.
import { readFile } from 'node:fs/promises';
import {
  clipFramePose,
  createPose,
  driverInputs,
  modalToPole,
  readCharacter,
  skinPositions,
  skinningMatrices,
  worldMatrices,
  type Capture,
  type Character,
} from '../src/index.js';
import { syntheticClip } from '../test/helpers/synthetic-capture.js';

const SWIMMER = new URL('../../assets-sample/files/characters/swimmer-otto.glb', import.meta.url);

/** Invented capture: the clip's skinning plus a 3 Hz belly jiggle driven by the pelvis. */
export function benchCapture(character: Character, frames: number, fps: number): Capture {
  const clip = syntheticClip(character, frames, fps, 5, 0.4);
  const s = character.skeleton;
  const n = character.restPositions.length / 3;
  const belly = character.regions?.names.indexOf('belly') ?? -1;
  const u = driverInputs(s, clip, [{ joint: s.names[0], signals: ['specificForce'] }]);
  const z = modalToPole(3, 0.12, fps);
  const q = new Float64Array(frames);
  for (let t = 0; t < frames; t++) {
    const drive = 0.002 * (u.values[3 * t + 1] - u.rest[1]);
    q[t] =
      (t > 0 ? 2 * z.re * q[t - 1] : 0) - (t > 1 ? (z.re ** 2 + z.im ** 2) * q[t - 2] : 0) + drive;
  }
  const map = Int32Array.from(s.names, (_, j) => j);
  const pose = createPose(s.names.length);
  const skin = new Float64Array(16 * s.names.length);
  const positions = new Float32Array(3 * n * frames);
  const frame = new Float32Array(3 * n);
  for (let t = 0; t < frames; t++) {
    clipFramePose(clip, t, s, map, pose);
    worldMatrices(s, pose, skin);
    skinningMatrices(s, skin, skin);
    const rest = character.restPositions.slice();
    for (let i = 0; i < n; i++) {
      if (character.regions?.labels[i] === belly) rest[3 * i + 2] += q[t];
    }
    skinPositions(rest, character.skinJoints, character.skinWeights, skin, frame);
    positions.set(frame, 3 * n * t);
  }
  return {
    name: 'bench-capture',
    fps,
    frameCount: frames,
    vertexCount: n,
    positions,
    basePositions: character.restPositions.slice(),
    triangles: character.triangles.slice(),
    clip,
    warnings: [],
  };
}

/** The swimmer character read from assets-sample. */
export async function benchSwimmer(): Promise<Character> {
  return readCharacter(new Uint8Array(await readFile(SWIMMER)));
}
