// GET /api/shows/:showId/takes/:takeId/notes: the take's notes, by frame.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { parseNotes, type Note } from './note-view';
import { showPath, takeKeys } from './take-keys';

/** Fetches the notes of a take. */
export function getNotes(
  showId: string,
  takeId: string,
  { signal }: { signal?: AbortSignal } = {},
): Promise<Note[]> {
  return apiRequest(
    `${showPath(showId)}/takes/${encodeURIComponent(takeId)}/notes`,
    { signal },
    parseNotes,
  );
}

/** Query options for the notes of a take. */
export function getNotesQueryOptions(showId: string, takeId: string) {
  return queryOptions({
    queryKey: takeKeys.notes(showId, takeId),
    queryFn: ({ signal }) => getNotes(showId, takeId, { signal }),
  });
}

/** The notes of a take. */
export function useNotes(showId: string, takeId: string) {
  return useQuery(getNotesQueryOptions(showId, takeId));
}
