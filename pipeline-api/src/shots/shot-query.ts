// The shot list's filter and sort as MikroORM conditions, shared by the list and the CSV export
// so both return the same rows.
import {
  LoadStrategy,
  type FilterQuery,
  type FindOptions,
  type QueryOrderMap,
} from '@mikro-orm/core';
import { ReviewState } from '../takes/review-state';
import type { Shot } from './entities/shot.entity';
import type { ShotFilterQuery } from './dto/list-shots.query';

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** The SQL condition for a show's shots matching the filters on `today` (`YYYY-MM-DD`). */
export function shotFilter(showId: string, f: ShotFilterQuery, today: string): FilterQuery<Shot> {
  const and: FilterQuery<Shot>[] = [{ show: showId }];
  if (f.renderState) and.push({ renderState: f.renderState });
  if (f.reviewState) and.push({ reviewState: f.reviewState === 'none' ? null : f.reviewState });
  if (f.solveState) and.push({ solveState: f.solveState === 'none' ? null : f.solveState });
  if (f.sequence) and.push({ sequence: f.sequence });
  if (f.assigneeId) and.push({ assignees: { id: f.assigneeId } });
  if (f.search) {
    const like = `%${likeEscape(f.search)}%`;
    and.push({ $or: [{ code: { $like: like } }, { sequence: { $like: like } }] });
  }
  const notApproved = {
    $or: [{ reviewState: null }, { reviewState: { $ne: ReviewState.Approved } }],
  };
  if (f.late === true) and.push({ dueDate: { $lt: today } }, notApproved as FilterQuery<Shot>);
  if (f.late === false) {
    and.push({
      $or: [{ dueDate: null }, { dueDate: { $gte: today } }, { reviewState: ReviewState.Approved }],
    });
  }
  return { $and: and };
}

/** The ORDER BY of a `field:dir,…` sort, with the id last so pages never overlap. */
export function shotOrder(sort = 'sequence:asc,code:asc'): QueryOrderMap<Shot>[] {
  const order = sort.split(',').map((part) => {
    const [field, dir] = part.split(':');
    return { [field]: dir } as QueryOrderMap<Shot>;
  });
  return [...order, { id: 'asc' }];
}

/**
 * Find options for one page of shots with their assignees. The assignees load in a second query
 * (`where shot_id in (…page…)`): joined into a limited query, MikroORM pages through a JSON
 * subquery that the database checks against every row of the shots table, of every show.
 */
export function shotPage(
  sort: string | undefined,
  limit: number,
  offset: number,
): FindOptions<Shot, 'assignees'> {
  return {
    populate: ['assignees'],
    strategy: LoadStrategy.SELECT_IN,
    orderBy: shotOrder(sort),
    limit,
    offset,
  };
}
