// Typed input errors: every rejection of bad input carries a stable code and a location.

/** Stable codes for rejected input; callers branch on these, never on messages. */
export type SolverErrorCode =
  | 'NOT_GLTF'
  | 'TRUNCATED_FILE'
  | 'NO_SKINNED_MESH'
  | 'NO_MORPH_TARGETS'
  | 'VERTEX_COUNT_MISMATCH'
  | 'TRIANGLE_MISMATCH'
  | 'NON_FINITE_VALUE'
  | 'KEY_TIMES_NOT_INCREASING'
  | 'WEIGHTS_NOT_NORMALISED'
  | 'MISSING_JOINT'
  | 'BVH_SYNTAX'
  | 'BVH_CHANNEL_COUNT'
  | 'NO_FRAMES'
  | 'BAD_FPS'
  | 'UNSUPPORTED_INPUT'
  // Learning and profiles.
  | 'NO_MOTION'
  | 'NOT_A_PROFILE'
  | 'UNSUPPORTED_FORMAT_VERSION'
  // Retarget and live tuning.
  | 'PROFILE_MISMATCH'
  | 'UNMAPPED_DRIVER'
  | 'BAD_JOINT_MAP'
  | 'CLIP_TOO_SHORT'
  | 'BAD_CONTROL'
  | 'UNKNOWN_REGION'
  | 'BAD_FRAME_RANGE'
  | 'NOT_A_TAKE';

/** Where in the input the problem is; only the fields that apply are set. */
export interface ErrorLocation {
  frame?: number;
  vertex?: number;
  joint?: string | number;
  line?: number;
  /** Free-form position, e.g. an accessor or animation name. */
  item?: string;
}

/** Bad input: what is wrong (code, message) and where. */
export class SolverInputError extends Error {
  /** Stable machine-readable code. */
  readonly code: SolverErrorCode;
  /** Location of the problem in the input. */
  readonly where: ErrorLocation;

  constructor(code: SolverErrorCode, message: string, where: ErrorLocation = {}) {
    super(message);
    this.name = 'SolverInputError';
    this.code = code;
    this.where = where;
  }

  /** Plain-object form for JSON output. */
  toJSON(): { code: SolverErrorCode; message: string; where: ErrorLocation } {
    return { code: this.code, message: this.message, where: this.where };
  }
}

/** True when `e` is a SolverInputError (works across bundle copies by checking shape). */
export function isSolverInputError(e: unknown): e is SolverInputError {
  return (
    e instanceof SolverInputError ||
    (typeof e === 'object' && e !== null && (e as { name?: unknown }).name === 'SolverInputError')
  );
}
