// GET /api/shows/:showId/shots/export: the shot table with the same filters, every page, as CSV.
import { useMutation } from '@tanstack/react-query';
import { apiDownload, type ApiFile } from '@/lib/api-client';
import { apiQuery, type ShotFilters } from './shot-filters';

/** What an export needs: the show and the table's filters (paging is ignored). */
export interface ExportShotsInput {
  showId: string;
  filters: ShotFilters;
}

/** Downloads the CSV of every shot matching the filters. */
export function exportShots({ showId, filters }: ExportShotsInput): Promise<ApiFile> {
  const path = `/shows/${encodeURIComponent(showId)}/shots/export${apiQuery(filters, false)}`;
  return apiDownload(path, { accept: 'text/csv' });
}

/** Mutation that downloads the CSV; the caller saves the file. */
export function useExportShots() {
  return useMutation({ mutationFn: exportShots });
}
