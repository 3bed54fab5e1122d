// Posed vertex positions of a take at one shot frame: linear blend skinning of the rest mesh plus
// the pose correctives plus the dynamic offsets (basis × morph weights). With gain 0 this is
// skinning plus correctives only. The correctives see the pose features clamped into the range
// they were learned on.
import { applyCorrectives, poseFeatures } from '../learn/pose-features.js';
import { skinPositions } from '../rig/linear-blend.js';
import {
  clipFramePose,
  createPose,
  matchClipJoints,
  skinningMatrices,
  worldMatrices,
} from '../rig/skeleton.js';
import type { Character, Clip, Take } from '../types.js';

/** Positions (3N) of `frame` of the take on `character` with its shot `clip`, into `out`. */
export function takeFramePositions(
  take: Take,
  character: Character,
  clip: Clip,
  frame: number,
  out = new Float32Array(character.restPositions.length),
): Float32Array {
  const n3 = character.restPositions.length;
  const k = take.live.k;
  const s = character.skeleton;
  const rest = new Float64Array(n3);
  if (take.correctives.coefficients.length > 0) {
    const one = {
      ...clip,
      frameCount: 1,
      rotations: clip.rotations.subarray(
        4 * clip.jointNames.length * frame,
        4 * clip.jointNames.length * (frame + 1),
      ),
    };
    applyCorrectives(take.correctives, poseFeatures(s, one), 0, rest);
  }
  for (let i = 0; i < n3; i++) rest[i] += character.restPositions[i];
  for (let m = 0; m < k; m++) {
    const w = take.weights[frame * k + m];
    if (w === 0) continue;
    for (let i = 0; i < n3; i++) rest[i] += w * take.basis[m * n3 + i];
  }
  const pose = clipFramePose(clip, frame, s, matchClipJoints(clip, s), createPose(s.names.length));
  const skin = new Float64Array(16 * s.names.length);
  worldMatrices(s, pose, skin);
  skinningMatrices(s, skin, skin);
  skinPositions(rest, character.skinJoints, character.skinWeights, skin, out);
  return out;
}
