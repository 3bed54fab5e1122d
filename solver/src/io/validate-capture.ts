// Checks that a capture fits a character before learning: topology, rate, length, joints.
import { SolverInputError } from '../errors.js';
import { matchClipJoints } from '../rig/skeleton.js';
import type { Capture, Character } from '../types.js';

/** Options for capture validation. */
export interface ValidateCaptureOptions {
  /** Shortest accepted capture, in seconds. */
  minSeconds?: number;
}

/** Default: two seconds, enough frames for a few cycles of the slowest tissue modes. */
export const VALIDATE_CAPTURE_DEFAULTS: Required<ValidateCaptureOptions> = { minSeconds: 2 };

/** Throws a SolverInputError for the first way the capture does not fit the character. */
export function validateCapture(
  character: Character,
  capture: Capture,
  options: ValidateCaptureOptions = {},
): void {
  const { minSeconds } = { ...VALIDATE_CAPTURE_DEFAULTS, ...options };
  const n = character.restPositions.length / 3;
  if (capture.vertexCount !== n) {
    throw new SolverInputError(
      'VERTEX_COUNT_MISMATCH',
      `capture has ${capture.vertexCount} vertices, the character ${n}`,
      { vertex: Math.min(n, capture.vertexCount) },
    );
  }
  const a = character.triangles;
  const b = capture.triangles;
  if (a.length !== b.length) {
    throw new SolverInputError(
      'TRIANGLE_MISMATCH',
      `capture has ${b.length / 3} triangles, the character ${a.length / 3}`,
      {},
    );
  }
  for (let i = 0; i < a.length; i++) {
    if (a[i] !== b[i]) {
      throw new SolverInputError('TRIANGLE_MISMATCH', `triangle ${Math.floor(i / 3)} differs`, {
        vertex: b[i],
        item: `triangle ${Math.floor(i / 3)}`,
      });
    }
  }
  if (!(capture.fps > 0) || !Number.isFinite(capture.fps)) {
    throw new SolverInputError(
      'BAD_FPS',
      `capture rate ${capture.fps} is not a positive number`,
      {},
    );
  }
  const seconds = capture.frameCount / capture.fps;
  if (seconds < minSeconds) {
    throw new SolverInputError(
      'NO_FRAMES',
      `capture lasts ${seconds.toFixed(2)} s; at least ${minSeconds} s is needed`,
      { frame: capture.frameCount },
    );
  }
  if (capture.clip) matchClipJoints(capture.clip, character.skeleton, { requireAll: true });
}
