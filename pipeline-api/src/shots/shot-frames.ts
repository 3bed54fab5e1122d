// How a shot's frames sit in its clip. A shot's first frame is the clip's first instant whatever
// its number (shots commonly start at 1001): shot frame f is at (f − frameStart) / fps seconds
// into the clip, whose frames 0 … frameCount − 1 run at the clip's own rate.

/** A shot's frame range and rate. */
export interface ShotFrames {
  frameStart: number;
  frameEnd: number;
  fps: number;
}

/** The clip frames the shot covers, counted at the shot's rate from the clip's start. */
export const shotClipFrames = (shot: ShotFrames): [number, number] => [
  0,
  shot.frameEnd - shot.frameStart,
];

/** The last shot frame a clip of `frameCount` frames at `clipFps` reaches. */
export function lastShotFrame(shot: ShotFrames, frameCount: number, clipFps: number): number {
  const clipSeconds = (frameCount - 1) / clipFps;
  // The epsilon keeps a last frame that lands exactly on the clip's end from rounding down.
  return shot.frameStart + Math.floor(clipSeconds * shot.fps + 1e-6);
}
