// Shots of the list read as plain rows with only the view's columns, and their assignees by one
// more query for the page: no ORM criteria, no entity hydration. Every statement is a plain
// select (see shot-sql.ts for why there are no subqueries).
//
// Approaches measured with bench/shot-list.bench.ts (1,000 shots, 50 clients, 2 shared cores;
// API CPU per request, which the load of other tenants changes far less than latency):
// - ORM findAndCount with the assignees populated: 11–14 ms for the first page, 16–23 ms for one
//   assignee's late shots (the ORM pages that through a JSON subquery checked against every shot
//   of every show: 46–60 ms of database CPU per request, time-outs under load).
// - One statement: the count as a subquery, the assignees as a correlated JSON_ARRAYAGG: 3.5–4.9
//   ms; but MariaDB 10.11.19 crashed (signal 11, freeing the expression cache's temporary table)
//   once after some ten thousand of them at 50 clients.
// - Page and count side by side, then the page's assignees, all plain selects: 4–8 ms.
// - Now: the page, then its assignees and (only when the page is full or past the end) the count
//   side by side, with the show check cached (shows/show-access-cache.ts): 2.4–5 ms.
// All four figures are whole requests; the last three with session lookups cached (auth/).
import type { EntityManager } from '@mikro-orm/mariadb';
import type { RenderState } from './render-state';
import type { JobState } from '../jobs/job-state';
import type { ReviewState } from '../takes/review-state';
import { isLate, type ShotView } from './shot-view';
import { shotOrderBy, shotWhere, type ShotSql } from './shot-sql';
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
}

/** One assignee of a shot of the page. */
interface AssigneeRow {
  shot_id: string;
  id: string;
  display_name: string;
}

/** A range of rows and how many match in all. */
export interface ShotRange {
  items: ShotView[];
  total: number;
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
].join(', ');

/**
 * A filtered, sorted range of a show's shots and the number of matches. The page comes first;
 * then its assignees and, side by side, the count — unless the page itself tells the total (a page
 * short of the limit is the last one), which saves a query on most filtered lists.
 */
export async function shotRange(
  em: EntityManager,
  showId: string,
  filter: ShotFilterQuery,
  today: string,
  range: { limit: number; offset: number },
): Promise<ShotRange> {
  const q = shotWhere(showId, filter, today);
  const rows = await pageRows(em, q, filter.sort, range);
  const last = rows.length < range.limit && (rows.length > 0 || range.offset === 0);
  const [items, total] = await Promise.all([
    views(em, rows, today),
    last ? range.offset + rows.length : countWhere(em, q),
  ]);
  return { items, total };
}

/** A filtered, sorted range of a show's shots as the API shows them. */
export async function shotRows(
  em: EntityManager,
  showId: string,
  filter: ShotFilterQuery,
  today: string,
  range: { limit: number; offset: number },
): Promise<ShotView[]> {
  const rows = await pageRows(em, shotWhere(showId, filter, today), filter.sort, range);
  return views(em, rows, today);
}

/** The page's rows in the asked order. */
function pageRows(
  em: EntityManager,
  q: ShotSql,
  sort: string | undefined,
  range: { limit: number; offset: number },
): Promise<ShotRow[]> {
  return em
    .getConnection()
    .execute(
      `select ${COLUMNS} from ${q.from} where ${q.where} order by ${shotOrderBy(sort)} limit ? offset ?`,
      [...q.params, range.limit, range.offset],
    );
}

/** How many shots match a FROM and WHERE. */
async function countWhere(em: EntityManager, q: ShotSql): Promise<number> {
  const [row] = await em
    .getConnection()
    .execute<{ n: number | bigint }[]>(
      `select count(*) as n from ${q.from} where ${q.where}`,
      q.params,
    );
  return Number(row.n);
}

/** The views of rows, with their assignees (one query). */
async function views(em: EntityManager, rows: ShotRow[], today: string): Promise<ShotView[]> {
  const assignees = await assigneesOf(
    em,
    rows.map((r) => r.id),
  );
  const date = (v: string | Date) => em.getPlatform().parseDate(v as string);
  return rows.map((r) => rowView(r, assignees.get(r.id) ?? [], today, date));
}

/** The assignees of the given shots, by shot id, in the view's order. */
async function assigneesOf(
  em: EntityManager,
  shotIds: string[],
): Promise<Map<string, { id: string; displayName: string }[]>> {
  const out = new Map<string, { id: string; displayName: string }[]>();
  if (shotIds.length === 0) return out;
  const rows: AssigneeRow[] = await em
    .getConnection()
    .execute(
      `select sa.shot_id, u.id, u.display_name from shot_assignees sa join users u on u.id = sa.user_id where sa.shot_id in (${shotIds.map(() => '?').join(', ')})`,
      shotIds,
    );
  for (const r of rows) {
    const list = out.get(r.shot_id) ?? [];
    list.push({ id: r.id, displayName: r.display_name });
    out.set(r.shot_id, list);
  }
  for (const list of out.values()) {
    list.sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id));
  }
  return out;
}

/** The view of a row; the same fields and rules as `shotView` of an entity. */
function rowView(
  r: ShotRow,
  assignees: { id: string; displayName: string }[],
  today: string,
  date: (v: string | Date) => Date,
): ShotView {
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
