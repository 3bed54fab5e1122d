// Invented test data: the synthetic character skinned by a smooth clip, plus one damped tissue
// mode on the soft chest vertices driven by the chest joint's vertical specific force. Ground
// truth for learning; not a real capture.
import {
  driverInputs,
  modalToPole,
  type Capture,
  type Character,
  type Clip,
} from '../../src/index.js';
import { syntheticCapture, syntheticClip } from './synthetic-capture.js';
import { syntheticCharacter } from './synthetic-character.js';

/** The mode the capture carries. */
export const TISSUE_MODE = { frequencyHz: 3, dampingRatio: 0.12, gain: 0.004 };

/** A capture of `seconds` at `fps` with one known mode; `shape` is its rest-space shape (3N). */
export function tissueCapture(
  seconds = 6,
  fps = 60,
): { character: Character; clip: Clip; capture: Capture; shape: Float32Array } {
  const character = syntheticCharacter({ sides: 12, rings: 8 });
  const frames = Math.round(seconds * fps);
  const clip = syntheticClip(character, frames, fps, 3, 0.5);
  const { capture, soft } = syntheticCapture(character, clip);
  const n = character.restPositions.length / 3;
  const shape = new Float32Array(3 * n);
  for (let i = 0; i < n; i++) {
    if (!soft[i]) continue;
    for (let c = 0; c < 3; c++) shape[3 * i + c] = character.restNormals[3 * i + c];
  }
  const u = driverInputs(character.skeleton, clip, [
    { joint: 'chest', signals: ['specificForce'] },
  ]);
  const z = modalToPole(TISSUE_MODE.frequencyHz, TISSUE_MODE.dampingRatio, fps);
  const a1 = 2 * z.re;
  const a2 = -(z.re * z.re + z.im * z.im);
  const q = new Float64Array(frames);
  const b = TISSUE_MODE.gain * (1 - a1 - a2);
  for (let t = 0; t < frames; t++) {
    const drive = b * (u.values[3 * t + 1] - u.rest[1]);
    q[t] = (t > 0 ? a1 * q[t - 1] : 0) + (t > 1 ? a2 * q[t - 2] : 0) + drive;
  }
  // Re-skin with the mode added in rest space: posed = LBS(rest + q·shape); the tissue rides the bones.
  const moved = syntheticCaptureWithOffsets(character, clip, (t, rest) => {
    for (let i = 0; i < rest.length; i++) rest[i] += q[t] * shape[i];
  });
  return { character, clip, capture: { ...capture, positions: moved, clip }, shape };
}

import {
  clipFramePose,
  createPose,
  skinPositions,
  skinningMatrices,
  worldMatrices,
} from '../../src/index.js';

function syntheticCaptureWithOffsets(
  character: Character,
  clip: Clip,
  offset: (frame: number, rest: Float32Array) => void,
): Float32Array {
  const s = character.skeleton;
  const n = character.restPositions.length / 3;
  const map = Int32Array.from(s.names, (_, j) => j);
  const pose = createPose(s.names.length);
  const skin = new Float64Array(16 * s.names.length);
  const out = new Float32Array(3 * n * clip.frameCount);
  const frame = new Float32Array(3 * n);
  for (let f = 0; f < clip.frameCount; f++) {
    clipFramePose(clip, f, s, map, pose);
    worldMatrices(s, pose, skin);
    skinningMatrices(s, skin, skin);
    const rest = character.restPositions.slice();
    offset(f, rest);
    skinPositions(rest, character.skinJoints, character.skinWeights, skin, frame);
    out.set(frame, 3 * n * f);
  }
  return out;
}
