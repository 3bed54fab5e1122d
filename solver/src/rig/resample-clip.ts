// Resampling a clip to another frame rate: slerp for rotations, linear for translations.
import { SolverInputError } from '../errors.js';
import { quatMakeContinuous, quatSlerp } from '../linalg/quat.js';
import type { Clip } from '../types.js';

/**
 * The clip at `fps`, covering the same duration ((T − 1)/fps_old seconds, rounded down to
 * whole new frames). Frame f samples source time f / fps.
 */
export function resampleClip(clip: Clip, fps: number): Clip {
  if (!(fps > 0) || !Number.isFinite(fps)) {
    throw new SolverInputError('BAD_FPS', `target rate ${fps} is not a positive number`, {});
  }
  const jc = clip.jointNames.length;
  const duration = (clip.frameCount - 1) / clip.fps;
  const frameCount = Math.floor(duration * fps + 1e-9) + 1;
  const rotations = new Float32Array(4 * jc * frameCount);
  const translations = new Float32Array(3 * jc * frameCount);
  for (let f = 0; f < frameCount; f++) {
    const src = Math.min((f / fps) * clip.fps, clip.frameCount - 1);
    const a = Math.floor(src);
    const b = Math.min(a + 1, clip.frameCount - 1);
    const u = src - a;
    for (let j = 0; j < jc; j++) {
      quatSlerp(
        rotations,
        4 * (f * jc + j),
        clip.rotations,
        4 * (a * jc + j),
        clip.rotations,
        4 * (b * jc + j),
        u,
      );
      for (let k = 0; k < 3; k++) {
        const ta = clip.translations[3 * (a * jc + j) + k];
        const tb = clip.translations[3 * (b * jc + j) + k];
        translations[3 * (f * jc + j) + k] = ta + (tb - ta) * u;
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
