// A shot as the tracking screen reads it from GET /api/shows/:showId/shots.
import {
  isOneOf,
  RENDER_STATES,
  REVIEW_STATES,
  SOLVE_STATES,
  type RenderState,
  type ReviewState,
  type SolveState,
} from '@/lib/shot-states';

/** One row of the shot table. */
export interface TrackedShot {
  id: string;
  sequence: string;
  code: string;
  frameStart: number;
  frameEnd: number;
  fps: number;
  assignees: { id: string; displayName: string }[];
  /** `YYYY-MM-DD`, or null when no due date is set. */
  dueDate: string | null;
  /** Due date passed and the latest take not approved. */
  late: boolean;
  solveState: SolveState | null;
  reviewState: ReviewState | null;
  renderState: RenderState;
  latestTakeVersion: number | null;
  updatedAt: string;
}

/** One page of the table. */
export interface ShotPage {
  items: TrackedShot[];
  total: number;
  page: number;
  pageSize: number;
}

function str(body: Record<string, unknown>, name: string, where: string): string {
  if (typeof body[name] !== 'string') throw new TypeError(`${where} has no "${name}".`);
  return body[name] as string;
}

function num(body: Record<string, unknown>, name: string, where: string): number {
  if (typeof body[name] !== 'number') throw new TypeError(`${where} has no number "${name}".`);
  return body[name] as number;
}

/** Checks one shot of the answer. */
export function parseTrackedShot(value: unknown, where = 'The shot'): TrackedShot {
  const b = (value ?? {}) as Record<string, unknown>;
  if (!isOneOf(RENDER_STATES, b.renderState)) {
    throw new TypeError(`${where} has an unknown render state: ${String(b.renderState)}.`);
  }
  if (b.solveState !== null && !isOneOf(SOLVE_STATES, b.solveState)) {
    throw new TypeError(`${where} has an unknown solve state: ${String(b.solveState)}.`);
  }
  if (b.reviewState !== null && !isOneOf(REVIEW_STATES, b.reviewState)) {
    throw new TypeError(`${where} has an unknown review state: ${String(b.reviewState)}.`);
  }
  const assignees = Array.isArray(b.assignees) ? b.assignees : [];
  return {
    id: str(b, 'id', where),
    sequence: str(b, 'sequence', where),
    code: str(b, 'code', where),
    frameStart: num(b, 'frameStart', where),
    frameEnd: num(b, 'frameEnd', where),
    fps: num(b, 'fps', where),
    assignees: assignees.map((a) => {
      const person = a as Record<string, unknown>;
      return { id: String(person.id), displayName: String(person.displayName) };
    }),
    dueDate: typeof b.dueDate === 'string' ? b.dueDate : null,
    late: b.late === true,
    solveState: b.solveState,
    reviewState: b.reviewState,
    renderState: b.renderState,
    latestTakeVersion: typeof b.latestTakeVersion === 'number' ? b.latestTakeVersion : null,
    updatedAt: str(b, 'updatedAt', where),
  };
}

/** Checks a page of shots. */
export function parseShotPage(value: unknown): ShotPage {
  const b = (value ?? {}) as Record<string, unknown>;
  if (!Array.isArray(b.items)) throw new TypeError('The shot list answer has no "items" list.');
  return {
    items: b.items.map((item, i) => parseTrackedShot(item, `Shot ${i + 1} of the answer`)),
    total: num(b, 'total', 'The shot list answer'),
    page: num(b, 'page', 'The shot list answer'),
    pageSize: num(b, 'pageSize', 'The shot list answer'),
  };
}
