import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { filtersFromSearch, filtersToSearch, type ShotFilters } from '../api/shot-filters';

/** The table's filters from the address, and a setter that writes them back (page 1 on change). */
export function useShotFilters(): [ShotFilters, (next: ShotFilters) => void] {
  const [params, setParams] = useSearchParams();
  const filters = useMemo(() => filtersFromSearch(params), [params]);
  const setFilters = useCallback(
    (next: ShotFilters) =>
      setParams(filtersToSearch(next, { paging: 'address' }), { replace: true }),
    [setParams],
  );
  return [filters, setFilters];
}
