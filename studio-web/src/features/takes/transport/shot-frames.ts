// Shot frame numbers and the take's own frames. A shot counts its frames from its first frame
// (often 1001); the take file holds one frame per shot frame, stored from 0. Everything people
// see and type (the counter, steps, loop in and out, notes, `?frame=`) is a shot frame; only the
// viewer is posed by take frame index, and this module is the one place that converts.

/** The shot frames a take covers, inclusive. */
export interface ShotFrameRange {
  first: number;
  last: number;
}

/** The range of a take of `frameCount` frames whose shot starts at `frameStart`. */
export function takeFrameRange(frameStart: number, frameCount: number): ShotFrameRange {
  const first = Math.round(frameStart);
  return { first, last: first + Math.max(1, Math.round(frameCount)) - 1 };
}

/** A shot frame kept inside the range (whole frames only). */
export function clampShotFrame(frame: number, range: ShotFrameRange): number {
  return Math.min(range.last, Math.max(range.first, Math.round(frame)));
}

/** The take frame index (0 … count − 1) that shows shot frame `frame`. */
export function takeIndexOf(frame: number, range: ShotFrameRange): number {
  return clampShotFrame(frame, range) - range.first;
}

/** The shot frame shown by take frame index `index`. */
export function shotFrameAt(index: number, range: ShotFrameRange): number {
  return clampShotFrame(range.first + index, range);
}

/** Frames in the range. */
export function frameCountOf(range: ShotFrameRange): number {
  return range.last - range.first + 1;
}
