// The shot form's values, their checks (the API's rules, in words that say what to fix) and
// the mapping of the API's refusals onto the fields they concern.
import { ApiError } from '@/lib/api-client';
import { fieldErrorMap } from '@/features/library/api/field-errors';
import type { Clip } from '@/features/library/api/library-types';
import type { ShotInput } from '../api/create-shot';
import type { Shot } from '../api/shot-types';

/** The form's values, as typed. */
export interface ShotFormValues {
  sequence: string;
  code: string;
  frameStart: string;
  frameEnd: string;
  fps: string;
  characterId: string;
  clipId: string;
  assigneeIds: string[];
  dueDate: string;
}

/** A field of the form. */
export type ShotField = keyof ShotFormValues;

/** Field → what is wrong with it. */
export type ShotFormErrors = Partial<Record<ShotField, string>>;

/** Every field, in form order. */
export const SHOT_FIELDS: readonly ShotField[] = [
  'sequence',
  'code',
  'frameStart',
  'frameEnd',
  'fps',
  'characterId',
  'clipId',
  'assigneeIds',
  'dueDate',
];

/** A new shot's starting values. */
export const EMPTY_SHOT: ShotFormValues = {
  sequence: '',
  code: '',
  frameStart: '1001',
  frameEnd: '',
  fps: '24',
  characterId: '',
  clipId: '',
  assigneeIds: [],
  dueDate: '',
};

/** The values of an existing shot. */
export function shotToValues(shot: Shot): ShotFormValues {
  return {
    sequence: shot.sequence,
    code: shot.code,
    frameStart: String(shot.frameStart),
    frameEnd: String(shot.frameEnd),
    fps: String(shot.fps),
    characterId: shot.characterId ?? '',
    clipId: shot.clipId ?? '',
    assigneeIds: shot.assignees.map((a) => a.id),
    dueDate: shot.dueDate ?? '',
  };
}

// The API's rule for sequence and shot codes (shot DTO).
const CODE = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,39}$/;
const CODE_RULE = 'Use 1 to 40 letters, digits, _ . or -, starting with a letter or digit.';

function wholeFrame(raw: string, what: string): { value: number | null; error?: string } {
  if (raw.trim() === '') return { value: null, error: `Enter the ${what}.` };
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 0)
    return { value: null, error: `The ${what} is a whole number, 0 or more.` };
  if (n > 10_000_000) return { value: null, error: `The ${what} is at most 10 000 000.` };
  return { value: n };
}

/** Checks the form against the API's rules and, when a clip is chosen, the clip's length. */
export function checkShotValues(v: ShotFormValues, clip?: Clip): ShotFormErrors {
  const errors: ShotFormErrors = {};
  if (v.sequence.trim() === '') errors.sequence = 'Enter the sequence code, e.g. SQ010.';
  else if (!CODE.test(v.sequence.trim())) errors.sequence = CODE_RULE;
  if (v.code.trim() === '') errors.code = 'Enter the shot code, e.g. SQ010_0040.';
  else if (!CODE.test(v.code.trim())) errors.code = CODE_RULE;
  const start = wholeFrame(v.frameStart, 'first frame');
  const end = wholeFrame(v.frameEnd, 'last frame');
  if (start.error) errors.frameStart = start.error;
  if (end.error) errors.frameEnd = end.error;
  else if (start.value !== null && end.value !== null && end.value < start.value) {
    errors.frameEnd = `The last frame comes before the first (${start.value}).`;
  }
  const fps = Number(v.fps);
  if (v.fps.trim() === '' || !Number.isFinite(fps)) errors.fps = 'Enter the frame rate, e.g. 24.';
  else if (fps < 1 || fps > 1000) errors.fps = 'The frame rate is between 1 and 1000 fps.';
  // Frame f of the shot is at time f / fps in the clip, whose frames run 0 … n − 1.
  if (clip?.frameCount && clip.fps && !errors.fps && end.value !== null && !errors.frameEnd) {
    const lastTime = (clip.frameCount - 1) / clip.fps;
    const maxEnd = Math.floor(lastTime * fps + 1e-9);
    if (end.value > maxEnd) {
      errors.frameEnd = `The clip ${clip.name} lasts ${clip.frameCount} frames at ${clip.fps} fps: at ${fps} fps the last frame can be at most ${maxEnd}.`;
    }
  }
  if (v.dueDate !== '' && !/^\d{4}-\d{2}-\d{2}$/.test(v.dueDate)) errors.dueDate = 'Enter a date.';
  return errors;
}

/** The request body for a new shot. */
export function valuesToInput(v: ShotFormValues): ShotInput {
  return {
    sequence: v.sequence.trim(),
    code: v.code.trim(),
    frameStart: Number(v.frameStart),
    frameEnd: Number(v.frameEnd),
    fps: Number(v.fps),
    ...(v.characterId ? { characterId: v.characterId } : {}),
    ...(v.clipId ? { clipId: v.clipId } : {}),
    ...(v.assigneeIds.length ? { assigneeIds: v.assigneeIds } : {}),
    ...(v.dueDate ? { dueDate: v.dueDate } : {}),
  };
}

/** The changed fields only (an edit sends what changed; empty choices clear). */
export function changedFields(
  before: ShotFormValues,
  after: ShotFormValues,
  allowed: readonly ShotField[],
): Partial<ShotInput> {
  const full = valuesToInput(after);
  const change: Partial<ShotInput> = {};
  const set = change as Record<string, unknown>;
  for (const field of allowed) {
    if (JSON.stringify(before[field]) === JSON.stringify(after[field])) continue;
    if (field === 'characterId' || field === 'clipId' || field === 'dueDate')
      set[field] = after[field] || null;
    else set[field] = (full as unknown as Record<string, unknown>)[field] ?? [];
  }
  return change;
}

// Domain refusals that concern one field.
const CODE_FIELDS: Record<string, ShotField> = {
  SHOT_CODE_TAKEN: 'code',
  SHOT_FRAME_RANGE_INVALID: 'frameEnd',
  CHARACTER_NOT_FOUND: 'characterId',
  CHARACTER_NOT_READY: 'characterId',
  CLIP_NOT_FOUND: 'clipId',
  CLIP_NOT_READY: 'clipId',
  SHOT_ASSIGNEE_INVALID: 'assigneeIds',
};

/** The API's refusal spread over the fields it names; `rest` is what no field can show. */
export function serverShotErrors(error: unknown): { fields: ShotFormErrors; rest: unknown } {
  if (!error) return { fields: {}, rest: null };
  const fields: ShotFormErrors = fieldErrorMap(error, SHOT_FIELDS);
  if (error instanceof ApiError && CODE_FIELDS[error.code])
    fields[CODE_FIELDS[error.code]] = error.message;
  return { fields, rest: Object.keys(fields).length > 0 ? null : error };
}
