// The shot's clip and the clip the dynamics run on: frame range, shot rate, the profile's rate
// (Catmull–Rom resampling) with the first pose held for the pre-roll, and the Catmull–Rom weights that
// sample the simulation at the shot's frames. Running at the profile's rate keeps the learned
// dynamics exact; a 24 fps and a 60 fps version of one motion then give the same offsets.
import { SolverInputError } from '../errors.js';
import { resampleClipCubic } from '../rig/resample-clip-cubic.js';
import type { Clip } from '../types.js';

/** Frames [first, last] (inclusive) of a clip; BAD_FRAME_RANGE when outside it. */
export function clipFrameRange(clip: Clip, first: number, last: number): Clip {
  if (
    !Number.isInteger(first) ||
    !Number.isInteger(last) ||
    first < 0 ||
    last < first ||
    last >= clip.frameCount
  ) {
    throw new SolverInputError(
      'BAD_FRAME_RANGE',
      `frames ${first}:${last} are not a range within the clip's 0:${clip.frameCount - 1}`,
      { item: `${first}:${last}` },
    );
  }
  if (first === 0 && last === clip.frameCount - 1) return clip;
  const jc = clip.jointNames.length;
  return {
    ...clip,
    frameCount: last - first + 1,
    rotations: clip.rotations.slice(4 * jc * first, 4 * jc * (last + 1)),
    translations: clip.translations.slice(3 * jc * first, 3 * jc * (last + 1)),
    warnings: [...clip.warnings],
  };
}

/** The clip with its first frame repeated `frames` times in front. */
export function holdFirstPose(clip: Clip, frames: number): Clip {
  if (frames <= 0) return clip;
  const jc = clip.jointNames.length;
  const count = clip.frameCount + frames;
  const rotations = new Float32Array(4 * jc * count);
  const translations = new Float32Array(3 * jc * count);
  for (let f = 0; f < frames; f++) {
    rotations.set(clip.rotations.subarray(0, 4 * jc), 4 * jc * f);
    translations.set(clip.translations.subarray(0, 3 * jc), 3 * jc * f);
  }
  rotations.set(clip.rotations, 4 * jc * frames);
  translations.set(clip.translations, 3 * jc * frames);
  return { ...clip, frameCount: count, rotations, translations, warnings: [...clip.warnings] };
}

/** The clip the dynamics run on and how shot frames sample it. */
export interface SimulationClip {
  clip: Clip;
  /** Held frames in front. */
  prerollFrames: number;
  /** Per shot frame: 4 simulation frame indices and Catmull–Rom weights. */
  sampleIndex: Int32Array;
  sampleWeight: Float64Array;
}

/**
 * Resamples the shot clip to `simFps` (unless equal), holds its first pose for `prerollSeconds`,
 * and computes the sampling of each shot frame. CLIP_TOO_SHORT when the shot lasts less than
 * the pre-roll (the held lead-in would outweigh the motion).
 */
export function simulationClip(shot: Clip, simFps: number, prerollSeconds: number): SimulationClip {
  const duration = (shot.frameCount - 1) / shot.fps;
  if (duration < prerollSeconds) {
    throw new SolverInputError(
      'CLIP_TOO_SHORT',
      `the clip lasts ${duration.toFixed(3)} s, less than the ${prerollSeconds} s pre-roll`,
      { item: 'prerollSeconds' },
    );
  }
  const resampled = Math.abs(shot.fps - simFps) < 1e-9 ? shot : resampleClipCubic(shot, simFps);
  const prerollFrames = Math.round(prerollSeconds * simFps);
  const clip = holdFirstPose(resampled, prerollFrames);
  const t = shot.frameCount;
  const last = clip.frameCount - 1;
  const sampleIndex = new Int32Array(4 * t);
  const sampleWeight = new Float64Array(4 * t);
  for (let f = 0; f < t; f++) {
    const x = prerollFrames + (f * simFps) / shot.fps;
    let i = Math.floor(x + 1e-9);
    let u = x - i;
    if (u < 1e-9) u = 0;
    if (i > last) {
      i = last;
      u = 0;
    }
    const u2 = u * u;
    const u3 = u2 * u;
    const w = [
      (-u3 + 2 * u2 - u) / 2,
      (3 * u3 - 5 * u2 + 2) / 2,
      (-3 * u3 + 4 * u2 + u) / 2,
      (u3 - u2) / 2,
    ];
    for (let m = 0; m < 4; m++) {
      sampleIndex[4 * f + m] = Math.min(last, Math.max(0, i - 1 + m));
      sampleWeight[4 * f + m] = u === 0 ? (m === 1 ? 1 : 0) : w[m];
    }
  }
  return { clip, prerollFrames, sampleIndex, sampleWeight };
}
