// GET /api/shows/:showId/shots/summary's answer: counts by state and the late shots.
import {
  RENDER_STATES,
  REVIEW_STATES,
  SOLVE_STATES,
  type RenderState,
  type ReviewState,
  type SolveState,
} from '@/lib/shot-states';

/** One late shot. */
export interface LateShot {
  id: string;
  code: string;
  dueDate: string;
  daysLate: number;
}

/** Shot counts per state (`none`: no job or take yet) and what is late. */
export interface ShotSummary {
  total: number;
  solve: Record<SolveState | 'none', number>;
  review: Record<ReviewState | 'none', number>;
  render: Record<RenderState, number>;
  late: { count: number; shots: LateShot[] };
}

function counts<K extends string>(value: unknown, keys: readonly K[], what: string) {
  const body = (value ?? {}) as Record<string, unknown>;
  const out = {} as Record<K, number>;
  for (const key of keys) {
    const n = body[key];
    if (typeof n !== 'number') throw new TypeError(`The summary has no ${what} count "${key}".`);
    out[key] = n;
  }
  return out;
}

/** Checks the summary answer. */
export function parseShotSummary(value: unknown): ShotSummary {
  const b = (value ?? {}) as Record<string, unknown>;
  if (typeof b.total !== 'number') throw new TypeError('The summary has no "total".');
  const late = (b.late ?? {}) as Record<string, unknown>;
  if (typeof late.count !== 'number' || !Array.isArray(late.shots)) {
    throw new TypeError('The summary has no "late" count and list.');
  }
  return {
    total: b.total,
    solve: counts(b.solve, [...SOLVE_STATES, 'none' as const], 'solve'),
    review: counts(b.review, [...REVIEW_STATES, 'none' as const], 'review'),
    render: counts(b.render, RENDER_STATES, 'render'),
    late: {
      count: late.count,
      shots: late.shots.map((s) => {
        const shot = s as Record<string, unknown>;
        return {
          id: String(shot.id),
          code: String(shot.code),
          dueDate: String(shot.dueDate),
          daysLate: Number(shot.daysLate),
        };
      }),
    },
  };
}
