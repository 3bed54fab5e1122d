// The shot table's filters, sort and page: kept in the address so a view can be shared, and
// sent to the API as the same query for the list and the CSV export.
import {
  isOneOf,
  RENDER_STATES,
  REVIEW_STATES,
  SOLVE_STATES,
  type RenderState,
  type ReviewState,
  type SolveState,
} from '@/lib/shot-states';

/** Columns the API sorts by. */
export const SORT_FIELDS = [
  'code',
  'sequence',
  'dueDate',
  'frameStart',
  'renderState',
  'reviewState',
  'solveState',
  'updatedAt',
] as const;
/** A column the API sorts by. */
export type SortField = (typeof SORT_FIELDS)[number];

/** Sort direction. */
export type SortDirection = 'asc' | 'desc';

/** Rows per page of the tracking table. */
export const PAGE_SIZE = 25;

/** What the table shows. Absent fields mean "any". */
export interface ShotFilters {
  search?: string;
  sequence?: string;
  /** true: late only; false: not late. */
  late?: boolean;
  solveState?: SolveState | 'none';
  reviewState?: ReviewState | 'none';
  renderState?: RenderState;
  assigneeId?: string;
  sort?: { field: SortField; direction: SortDirection };
  page?: number;
}

/** Reads the filters from an address's query; unknown values are dropped, not trusted. */
export function filtersFromSearch(params: URLSearchParams): ShotFilters {
  const f: ShotFilters = {};
  const text = (name: string) => params.get(name)?.trim() || undefined;
  f.search = text('search');
  f.sequence = text('sequence');
  const late = params.get('late');
  if (late === 'true' || late === 'false') f.late = late === 'true';
  const solve = params.get('solveState');
  if (solve === 'none' || isOneOf(SOLVE_STATES, solve)) f.solveState = solve;
  const review = params.get('reviewState');
  if (review === 'none' || isOneOf(REVIEW_STATES, review)) f.reviewState = review;
  const render = params.get('renderState');
  if (isOneOf(RENDER_STATES, render)) f.renderState = render;
  f.assigneeId = text('assigneeId');
  const [field, direction] = (params.get('sort') ?? '').split(':');
  if (isOneOf(SORT_FIELDS, field) && (direction === 'asc' || direction === 'desc')) {
    f.sort = { field, direction };
  }
  const page = Number(params.get('page'));
  if (Number.isInteger(page) && page > 1) f.page = page;
  return dropEmpty(f);
}

function dropEmpty(f: ShotFilters): ShotFilters {
  return Object.fromEntries(
    Object.entries(f).filter(([, v]) => v !== undefined && v !== ''),
  ) as ShotFilters;
}

/** The filters as query parameters: for the address, the list (with paging) and the export. */
export function filtersToSearch(
  f: ShotFilters,
  { paging }: { paging: 'none' | 'address' | 'api' },
): URLSearchParams {
  const p = new URLSearchParams();
  if (f.search) p.set('search', f.search);
  if (f.sequence) p.set('sequence', f.sequence);
  if (f.late !== undefined) p.set('late', String(f.late));
  if (f.solveState) p.set('solveState', f.solveState);
  if (f.reviewState) p.set('reviewState', f.reviewState);
  if (f.renderState) p.set('renderState', f.renderState);
  if (f.assigneeId) p.set('assigneeId', f.assigneeId);
  if (f.sort) {
    // The code breaks ties so equal due dates (say) always come in the same order.
    const tie = f.sort.field === 'code' ? '' : ',code:asc';
    p.set(
      'sort',
      paging === 'address'
        ? `${f.sort.field}:${f.sort.direction}`
        : `${f.sort.field}:${f.sort.direction}${tie}`,
    );
  }
  if (paging === 'address' && f.page && f.page > 1) p.set('page', String(f.page));
  if (paging === 'api') {
    p.set('page', String(f.page ?? 1));
    p.set('pageSize', String(PAGE_SIZE));
  }
  return p;
}

/** The query string (with "?", or empty) of the filters for an API call. */
export function apiQuery(f: ShotFilters, paging: boolean): string {
  const query = filtersToSearch(f, { paging: paging ? 'api' : 'none' }).toString();
  return query ? `?${query}` : '';
}
