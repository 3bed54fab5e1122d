// Query keys of the library, one tree per show so a show's data can be refreshed at once.

/** Query keys for a show's library. */
export const libraryKeys = {
  all: (showId: string) => ['shows', showId, 'library'] as const,
  characters: (showId: string) => [...libraryKeys.all(showId), 'characters'] as const,
  character: (showId: string, id: string) => [...libraryKeys.characters(showId), id] as const,
  captures: (showId: string) => [...libraryKeys.all(showId), 'captures'] as const,
  capture: (showId: string, id: string) => [...libraryKeys.captures(showId), id] as const,
  clips: (showId: string) => [...libraryKeys.all(showId), 'clips'] as const,
  clip: (showId: string, id: string) => [...libraryKeys.clips(showId), id] as const,
  profiles: (showId: string) => [...libraryKeys.all(showId), 'profiles'] as const,
  profile: (showId: string, id: string) => [...libraryKeys.profiles(showId), id] as const,
  asset: (showId: string, id: string) => [...libraryKeys.all(showId), 'assets', id] as const,
};

/** How often a page without the live event stream asks again while something is working, ms. */
export const LIBRARY_POLL_MS = 2000;

/** Path prefix of a show's routes in the API. */
export const showPath = (showId: string) => `/shows/${encodeURIComponent(showId)}`;
