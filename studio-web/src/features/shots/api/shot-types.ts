// Shapes of the shot answers (shot, page of shots, take, member) and their checks.
import { JOB_STATES, type JobState } from '@/features/library/api/job-view';
import { asArray, asObject, num, oneOf, optNum, optStr, str, type Json } from '@/lib/parse-answer';
import {
  RENDER_STATES,
  REVIEW_STATES,
  type RenderState,
  type ReviewState,
} from '@/lib/shot-states';

export type { RenderState, ReviewState };

/** A shot. */
export interface Shot {
  id: string;
  sequence: string;
  code: string;
  frameStart: number;
  frameEnd: number;
  fps: number;
  characterId: string | null;
  clipId: string | null;
  assignees: { id: string; displayName: string }[];
  dueDate: string | null;
  late: boolean;
  renderState: RenderState;
  solveState: JobState | null;
  reviewState: ReviewState | null;
  latestTakeVersion: number | null;
  updatedAt: string;
}

/** One page of the shot table. */
export interface ShotPage {
  items: Shot[];
  total: number;
  page: number;
  pageSize: number;
}

/** A versioned result of a retarget job. */
export interface Take {
  id: string;
  shotId: string;
  version: number;
  jobId: string;
  reviewState: ReviewState;
  createdAt: string;
}

/** A member of the show, e.g. to assign a shot to. */
export interface Member {
  userId: string;
  displayName: string;
  role: string;
  disabled: boolean;
}

const nullable = <T extends string>(
  b: Json,
  key: string,
  allowed: readonly T[],
  what: string,
): T | null => (b[key] === null || b[key] === undefined ? null : oneOf(b, key, allowed, what));

/** Checks a shot answer. */
export function parseShot(value: unknown): Shot {
  const what = 'shot';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    sequence: str(b, 'sequence', what),
    code: str(b, 'code', what),
    frameStart: num(b, 'frameStart', what),
    frameEnd: num(b, 'frameEnd', what),
    fps: num(b, 'fps', what),
    characterId: optStr(b, 'characterId'),
    clipId: optStr(b, 'clipId'),
    assignees: Array.isArray(b.assignees)
      ? b.assignees.map((a) => {
          const u = asObject(a, 'shot assignee');
          return { id: str(u, 'id', 'shot assignee'), displayName: optStr(u, 'displayName') ?? '' };
        })
      : [],
    dueDate: optStr(b, 'dueDate'),
    late: b.late === true,
    renderState: oneOf(b, 'renderState', RENDER_STATES, what),
    solveState: nullable(b, 'solveState', JOB_STATES, what),
    reviewState: nullable(b, 'reviewState', REVIEW_STATES, what),
    latestTakeVersion: optNum(b, 'latestTakeVersion'),
    updatedAt: optStr(b, 'updatedAt') ?? '',
  };
}

/** Checks a page of shots. */
export function parseShotPage(value: unknown): ShotPage {
  const b = asObject(value, 'shot list');
  return {
    items: asArray(b.items, 'shot list').map(parseShot),
    total: num(b, 'total', 'shot list'),
    page: num(b, 'page', 'shot list'),
    pageSize: num(b, 'pageSize', 'shot list'),
  };
}

/** Checks a take answer. */
export function parseTake(value: unknown): Take {
  const what = 'take';
  const b = asObject(value, what);
  return {
    id: str(b, 'id', what),
    shotId: str(b, 'shotId', what),
    version: num(b, 'version', what),
    jobId: optStr(b, 'jobId') ?? '',
    reviewState: oneOf(b, 'reviewState', REVIEW_STATES, what),
    createdAt: optStr(b, 'createdAt') ?? '',
  };
}

/** Checks a member answer. */
export function parseMember(value: unknown): Member {
  const what = 'member';
  const b = asObject(value, what);
  return {
    userId: str(b, 'userId', what),
    displayName: optStr(b, 'displayName') ?? '',
    role: optStr(b, 'role') ?? '',
    disabled: b.disabled === true,
  };
}
