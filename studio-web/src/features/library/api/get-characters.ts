// GET /api/shows/:showId/characters?includeRejected=true: the show's characters.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { LIBRARY_POLL_MS, libraryKeys, showPath } from './library-keys';
import { parseCharacter, type Character } from './library-types';
import { asArray } from '@/lib/parse-answer';

/** Fetches the show's characters, refused uploads included (they carry their report). */
export function getCharacters(showId: string, { signal }: { signal?: AbortSignal } = {}) {
  return apiRequest(`${showPath(showId)}/characters?includeRejected=true`, { signal }, (v) =>
    asArray(v, 'character list').map(parseCharacter),
  );
}

/** Query options for the character list; polls while a file is being checked if `poll`. */
export function getCharactersQueryOptions(showId: string, poll = false) {
  return queryOptions({
    queryKey: libraryKeys.characters(showId),
    queryFn: ({ signal }) => getCharacters(showId, { signal }),
    refetchInterval: (query) =>
      poll && query.state.data?.some((c: Character) => c.state === 'pending')
        ? LIBRARY_POLL_MS
        : false,
  });
}

/** The show's characters. */
export function useCharacters(showId: string, { poll = false }: { poll?: boolean } = {}) {
  return useQuery(getCharactersQueryOptions(showId, poll));
}
