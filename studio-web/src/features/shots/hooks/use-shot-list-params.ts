// The shot table's query kept in the address, so a filtered, sorted page can be shared and
// survives going back.
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { JobState } from '@/features/library/api/job-view';
import type { ShotListParams } from '../api/get-shots';
import type { RenderState, ReviewState } from '../api/shot-types';

/** Rows per page unless the address says otherwise. */
export const DEFAULT_PAGE_SIZE = 25;
/** Order of the table unless the address says otherwise. */
export const DEFAULT_SORT = 'sequence:asc,code:asc';

const positive = (v: string | null, fallback: number) => {
  const n = Number(v);
  return Number.isInteger(n) && n > 0 ? n : fallback;
};

/** Reads the list query from search params; anything unreadable falls back to the default. */
export function readShotListParams(search: URLSearchParams): ShotListParams {
  const late = search.get('late');
  return {
    page: positive(search.get('page'), 1),
    pageSize: Math.min(200, positive(search.get('pageSize'), DEFAULT_PAGE_SIZE)),
    sort: search.get('sort') || DEFAULT_SORT,
    search: search.get('search') || undefined,
    sequence: search.get('sequence') || undefined,
    solveState: (search.get('solveState') as JobState | 'none' | null) || undefined,
    reviewState: (search.get('reviewState') as ReviewState | 'none' | null) || undefined,
    renderState: (search.get('renderState') as RenderState | null) || undefined,
    late: late === 'true' ? true : undefined,
  };
}

/** The table's query and a setter that also goes back to page 1 when a filter changes. */
export function useShotListParams(): [ShotListParams, (change: Partial<ShotListParams>) => void] {
  const [search, setSearch] = useSearchParams();
  const params = useMemo(() => readShotListParams(search), [search]);
  const update = useCallback(
    (change: Partial<ShotListParams>) => {
      setSearch(
        (current) => {
          const next = new URLSearchParams(current);
          for (const [key, value] of Object.entries(change)) {
            if (value === undefined || value === '' || value === false) next.delete(key);
            else next.set(key, String(value));
          }
          if (!('page' in change)) next.delete('page');
          return next;
        },
        { replace: true },
      );
    },
    [setSearch],
  );
  return [params, update];
}
