import { useMatch } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useShows } from '../api/get-shows';
import type { Show } from '../api/show';

/** The show the page belongs to. */
export interface CurrentShow {
  /** The `:showId` of the address. */
  showId: string;
  /** The show itself, once the list of the caller's shows has arrived. */
  show: Show | undefined;
}

/** The `:showId` of a show's pages (`/shows/:showId/...`), or undefined elsewhere. */
export function useShowIdParam(): string | undefined {
  // Matched by path, not by param name: admin pages name a show they manage `:showId` too.
  return useMatch({ path: paths.show.path, end: false })?.params.showId;
}

/**
 * The current show: its id from the address (`/shows/:showId/...`) and, when loaded, the show.
 * For pages under a show's address; throws elsewhere, since there is no show to speak of.
 */
export function useCurrentShow(): CurrentShow {
  const showId = useShowIdParam();
  if (!showId) throw new Error('useCurrentShow was called on a page that has no :showId.');
  const shows = useShows();
  return { showId, show: shows.data?.find((s) => s.id === showId) };
}
