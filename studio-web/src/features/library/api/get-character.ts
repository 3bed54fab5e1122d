// GET /api/shows/:showId/characters/:characterId: one character with its metadata.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { libraryKeys, showPath } from './library-keys';
import { parseCharacter } from './library-types';

/** Fetches one character. */
export function getCharacter(
  showId: string,
  id: string,
  { signal }: { signal?: AbortSignal } = {},
) {
  return apiRequest(
    `${showPath(showId)}/characters/${encodeURIComponent(id)}`,
    { signal },
    parseCharacter,
  );
}

/** Query options for one character. */
export function getCharacterQueryOptions(showId: string, id: string) {
  return queryOptions({
    queryKey: libraryKeys.character(showId, id),
    queryFn: ({ signal }) => getCharacter(showId, id, { signal }),
  });
}

/** One character; idle without an id. */
export function useCharacter(showId: string, id: string | undefined) {
  return useQuery({ ...getCharacterQueryOptions(showId, id ?? ''), enabled: !!id });
}
