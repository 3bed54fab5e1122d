// Shots of the list read as plain rows with only the view's columns, their assignees gathered by
// the database into a JSON array on the same row: one query per page, no entity hydration.
import type { EntityManager } from '@mikro-orm/mariadb';
import type { RenderState } from './render-state';
import type { JobState } from '../jobs/job-state';
import type { ReviewState } from '../takes/review-state';
import { isLate, type ShotView } from './shot-view';
import { shotOrderBy, shotWhere } from './shot-sql';
import type { ShotFilterQuery } from './dto/list-shots.query';

/** A shot row as the list query returns it (column names as in the table). */
interface ShotRow {
  id: string;
  sequence: string;
  code: string;
  frame_start: number;
  frame_end: number;
  fps: number;
  character_id: string | null;
  clip_id: string | null;
  due_date: string | null;
  render_state: RenderState;
  solve_state: JobState | null;
  review_state: ReviewState | null;
  latest_take_version: number | null;
  created_at: string | Date;
  updated_at: string | Date;
  /** JSON array of `{ id, displayName }`, or null without assignees (text if not parsed yet). */
  assignees: string | { id: string; displayName: string }[] | null;
}

const COLUMNS = [
  's.id',
  's.sequence',
  's.code',
  's.frame_start',
  's.frame_end',
  's.fps',
  's.character_id',
  's.clip_id',
  's.due_date',
  's.render_state',
  's.solve_state',
  's.review_state',
  's.latest_take_version',
  's.created_at',
  's.updated_at',
  "(select json_arrayagg(json_object('id', u.id, 'displayName', u.display_name)) from shot_assignees sa join users u on u.id = sa.user_id where sa.shot_id = s.id) as assignees",
].join(', ');

/** A range of rows and how many match in all. */
export interface ShotRange {
  items: ShotView[];
  total: number;
}

/**
 * A filtered, sorted range of a show's shots as the API shows them, with the number of matches:
 * one round trip, the count an uncorrelated subquery that the database runs once.
 */
export async function shotRange(
  em: EntityManager,
  showId: string,
  filter: ShotFilterQuery,
  today: string,
  range: { limit: number; offset: number },
): Promise<ShotRange> {
  const where = shotWhere(showId, filter, today);
  const rows: (ShotRow & { total: number | bigint })[] = await em
    .getConnection()
    .execute(
      `select (select count(*) from shots s where ${where.sql}) as total, ${COLUMNS} from shots s ` +
        `where ${where.sql} order by ${shotOrderBy(filter.sort)} limit ? offset ?`,
      [...where.params, ...where.params, range.limit, range.offset],
    );
  const date = (v: string | Date) => em.getPlatform().parseDate(v as string);
  const items = rows.map((r) => rowView(r, today, date));
  if (rows.length > 0) return { items, total: Number(rows[0].total) };
  // Past the last page (or nothing matches) there is no row to carry the count.
  return { items, total: range.offset === 0 ? 0 : await countShots(em, showId, filter, today) };
}

/** A filtered, sorted range of a show's shots as the API shows them, without the count. */
export async function shotRows(
  em: EntityManager,
  showId: string,
  filter: ShotFilterQuery,
  today: string,
  range: { limit: number; offset: number },
): Promise<ShotView[]> {
  const where = shotWhere(showId, filter, today);
  const rows: ShotRow[] = await em
    .getConnection()
    .execute(
      `select ${COLUMNS} from shots s where ${where.sql} order by ${shotOrderBy(filter.sort)} limit ? offset ?`,
      [...where.params, range.limit, range.offset],
    );
  const date = (v: string | Date) => em.getPlatform().parseDate(v as string);
  return rows.map((r) => rowView(r, today, date));
}

/** How many of a show's shots match the filter. */
export async function countShots(
  em: EntityManager,
  showId: string,
  filter: ShotFilterQuery,
  today: string,
): Promise<number> {
  const where = shotWhere(showId, filter, today);
  const [row] = await em
    .getConnection()
    .execute<{ n: number | bigint }[]>(
      `select count(*) as n from shots s where ${where.sql}`,
      where.params,
    );
  return Number(row.n);
}

/** The view of a row; the same fields and rules as `shotView` of an entity. */
function rowView(r: ShotRow, today: string, date: (v: string | Date) => Date): ShotView {
  const listed = typeof r.assignees === 'string' ? JSON.parse(r.assignees) : r.assignees;
  const assignees = ((listed ?? []) as { id: string; displayName: string }[]).sort(
    (a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id),
  );
  return {
    id: r.id,
    sequence: r.sequence,
    code: r.code,
    frameStart: r.frame_start,
    frameEnd: r.frame_end,
    fps: r.fps,
    characterId: r.character_id,
    clipId: r.clip_id,
    assignees,
    dueDate: r.due_date,
    late: isLate({ dueDate: r.due_date, reviewState: r.review_state }, today),
    renderState: r.render_state,
    solveState: r.solve_state,
    reviewState: r.review_state,
    latestTakeVersion: r.latest_take_version,
    createdAt: date(r.created_at).toISOString(),
    updatedAt: date(r.updated_at).toISOString(),
  };
}
