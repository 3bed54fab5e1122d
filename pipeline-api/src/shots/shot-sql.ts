// The shot list's filter and sort as plain SQL on `shots s`, shared by the list, the CSV export
// and the late count so all three return the same rows. Plain SQL rather than ORM conditions: the
// list is the busiest read of the product, and building ORM criteria and hydrating entities cost
// several times the queries themselves (figures in bench/shot-list.bench.ts).
import { ReviewState } from '../takes/review-state';
import type { ShotFilterQuery, ShotSortField } from './dto/list-shots.query';

/** The FROM and WHERE of a shot query, with the WHERE's `?` parameters in order. */
export interface ShotSql {
  from: string;
  where: string;
  params: unknown[];
}

/** The list's order when none is asked for. */
export const DEFAULT_SHOT_SORT = 'sequence:asc,code:asc';

const SORT_COLUMNS: Record<ShotSortField, string> = {
  code: 's.code',
  sequence: 's.sequence',
  dueDate: 's.due_date',
  frameStart: 's.frame_start',
  renderState: 's.render_state',
  reviewState: 's.review_state',
  solveState: 's.solve_state',
  createdAt: 's.created_at',
  updatedAt: 's.updated_at',
};

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/**
 * The FROM and WHERE for a show's shots matching the filters on `today` (`YYYY-MM-DD`). Only
 * plain joins and conditions: no subqueries, which MariaDB may run through temporary tables (one
 * such plan crashed MariaDB 10.11.19 under load in the benchmark).
 */
export function shotWhere(showId: string, f: ShotFilterQuery, today: string): ShotSql {
  const and: string[] = ['s.show_id = ?'];
  const params: unknown[] = [showId];
  const add = (sql: string, ...values: unknown[]) => {
    and.push(sql);
    params.push(...values);
  };
  if (f.renderState) add('s.render_state = ?', f.renderState);
  if (f.reviewState === 'none') add('s.review_state is null');
  else if (f.reviewState) add('s.review_state = ?', f.reviewState);
  if (f.solveState === 'none') add('s.solve_state is null');
  else if (f.solveState) add('s.solve_state = ?', f.solveState);
  if (f.sequence) add('s.sequence = ?', f.sequence);
  // (shot_id, user_id) is the assignees' primary key: at most one row per shot, so paging and
  // counting need no DISTINCT.
  if (f.assigneeId) add('sa.user_id = ?', f.assigneeId);
  if (f.search) {
    const like = `%${likeEscape(f.search)}%`;
    add('(s.code like ? or s.sequence like ?)', like, like);
  }
  // Late: due date passed and the latest take not approved (a null state is not approved).
  if (f.late === true) {
    add(
      '(s.due_date < ? and (s.review_state is null or s.review_state <> ?))',
      today,
      ReviewState.Approved,
    );
  }
  if (f.late === false) {
    add(
      '(s.due_date is null or s.due_date >= ? or s.review_state = ?)',
      today,
      ReviewState.Approved,
    );
  }
  const from = f.assigneeId ? 'shots s join shot_assignees sa on sa.shot_id = s.id' : 'shots s';
  return { from, where: and.join(' and '), params };
}

/**
 * The ORDER BY of a `field:dir,…` sort (fields and directions checked by the query DTO), with the
 * id last so pages never overlap.
 */
export function shotOrderBy(sort = DEFAULT_SHOT_SORT): string {
  const parts = sort.split(',').map((part) => {
    const [field, dir] = part.split(':');
    const column = SORT_COLUMNS[field as ShotSortField];
    if (!column || (dir !== 'asc' && dir !== 'desc')) {
      throw new Error(`unknown shot sort "${part}"`);
    }
    return `${column} ${dir}`;
  });
  return [...parts, 's.id asc'].join(', ');
}
