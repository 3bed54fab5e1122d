// Checks before learning that go beyond fitting the character: finite numbers, a capture that
// moves, and a skeleton clip that covers it.
import { SolverInputError } from '../errors.js';
import { resampleClip } from '../rig/resample-clip.js';
import type { Capture, Clip } from '../types.js';

/** Throws NON_FINITE_VALUE at the first NaN or infinite coordinate (frame and vertex). */
export function checkFinite(capture: Capture): void {
  const { positions, vertexCount } = capture;
  for (let i = 0; i < positions.length; i++) {
    if (!Number.isFinite(positions[i])) {
      const frame = Math.floor(i / (3 * vertexCount));
      throw new SolverInputError(
        'NON_FINITE_VALUE',
        `capture position is ${positions[i]} at frame ${frame}`,
        { frame, vertex: Math.floor((i % (3 * vertexCount)) / 3) },
      );
    }
  }
}

/** Throws NO_MOTION when no vertex moves more than `tolerance` metres from the first frame. */
export function checkMoves(capture: Capture, tolerance = 1e-6): void {
  const { positions, vertexCount, frameCount } = capture;
  const d = 3 * vertexCount;
  for (let t = 1; t < frameCount; t++) {
    for (let i = 0; i < d; i++) {
      if (Math.abs(positions[t * d + i] - positions[i]) > tolerance) return;
    }
  }
  throw new SolverInputError(
    'NO_MOTION',
    'every frame of the capture is the same: there is no motion to learn from',
    { frame: 0 },
  );
}

/**
 * The clip at the capture's rate, covering every capture frame; NO_FRAMES when it is shorter.
 * NO_MOTION when no joint of it moves (nothing drives the tissue).
 */
export function clipForCapture(clip: Clip, capture: Capture): Clip {
  const c = Math.abs(clip.fps - capture.fps) > 1e-9 ? resampleClip(clip, capture.fps) : clip;
  if (c.frameCount < capture.frameCount) {
    throw new SolverInputError(
      'NO_FRAMES',
      `the clip has ${c.frameCount} frames at ${capture.fps} fps, the capture ${capture.frameCount}`,
      { frame: c.frameCount },
    );
  }
  const jc = c.jointNames.length;
  for (let t = 1; t < capture.frameCount; t++) {
    for (let i = 0; i < 4 * jc; i++)
      if (Math.abs(c.rotations[t * 4 * jc + i] - c.rotations[i]) > 1e-7) return c;
    for (let i = 0; i < 3 * jc; i++) {
      if (Math.abs(c.translations[t * 3 * jc + i] - c.translations[i]) > 1e-7) return c;
    }
  }
  throw new SolverInputError('NO_MOTION', 'the skeleton does not move during the capture', {
    item: c.name,
  });
}
