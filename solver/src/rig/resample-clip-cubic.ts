// Resampling a clip with Catmull–Rom cubics: translations per component, rotations per
// quaternion component (signs are continuous in a clip) then renormalised. Unlike slerp, which
// is piecewise linear and puts kinks at every source frame, the cubic keeps velocity continuous,
// so accelerations taken from the resampled clip stay close to the motion's own: a 24 fps shot
// run at 60 fps then drives the dynamics like the 60 fps version of the same motion.
import { SolverInputError } from '../errors.js';
import { quatMakeContinuous, quatNormalize } from '../linalg/quat.js';
import type { Clip } from '../types.js';

/**
 * The clip at `fps` over the same duration ((T − 1)/fps_old seconds, rounded down to whole new
 * frames); frame f samples source time f / fps. Ends are extended by repeating the end frames.
 */
export function resampleClipCubic(clip: Clip, fps: number): Clip {
  if (!(fps > 0) || !Number.isFinite(fps)) {
    throw new SolverInputError('BAD_FPS', `target rate ${fps} is not a positive number`, {});
  }
  const jc = clip.jointNames.length;
  const last = clip.frameCount - 1;
  const frameCount = Math.floor((last / clip.fps) * fps + 1e-9) + 1;
  const rotations = new Float32Array(4 * jc * frameCount);
  const translations = new Float32Array(3 * jc * frameCount);
  const at = (i: number) => Math.min(last, Math.max(0, i));
  for (let f = 0; f < frameCount; f++) {
    const src = Math.min((f / fps) * clip.fps, last);
    const i = Math.floor(src + 1e-9);
    const u = Math.max(0, src - i);
    const u2 = u * u;
    const u3 = u2 * u;
    const w0 = (-u3 + 2 * u2 - u) / 2;
    const w1 = (3 * u3 - 5 * u2 + 2) / 2;
    const w2 = (-3 * u3 + 4 * u2 + u) / 2;
    const w3 = (u3 - u2) / 2;
    const f0 = at(i - 1), f1 = at(i), f2 = at(i + 1), f3 = at(i + 2); // prettier-ignore
    for (let j = 0; j < jc; j++) {
      const o = 4 * (f * jc + j);
      for (let c = 0; c < 4; c++) {
        rotations[o + c] =
          w0 * clip.rotations[4 * (f0 * jc + j) + c] +
          w1 * clip.rotations[4 * (f1 * jc + j) + c] +
          w2 * clip.rotations[4 * (f2 * jc + j) + c] +
          w3 * clip.rotations[4 * (f3 * jc + j) + c];
      }
      quatNormalize(rotations, o);
      const p = 3 * (f * jc + j);
      for (let c = 0; c < 3; c++) {
        translations[p + c] =
          w0 * clip.translations[3 * (f0 * jc + j) + c] +
          w1 * clip.translations[3 * (f1 * jc + j) + c] +
          w2 * clip.translations[3 * (f2 * jc + j) + c] +
          w3 * clip.translations[3 * (f3 * jc + j) + c];
      }
    }
  }
  for (let j = 0; j < jc; j++) quatMakeContinuous(rotations, frameCount, 4 * jc, 4 * j);
  return {
    ...clip,
    fps,
    frameCount,
    rotations,
    translations,
    translationAnimated: clip.translationAnimated.slice(),
    warnings: [...clip.warnings],
  };
}
