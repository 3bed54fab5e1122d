// Applies the show's live events to the library's cached answers: file checks and learn jobs.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { applyJobEvent, isJobFinished } from '../api/job-view';
import { libraryKeys } from '../api/library-keys';
import type { Asset } from '../api/library-types';
import type { Profile } from '../api/profile-types';
import { useShowEvents, type ShowEvent } from '../api/show-events';

/** Updates the cache for one event; exported for the shot pages, which list profiles too. */
export function applyLibraryEvent(
  queryClient: QueryClient,
  showId: string,
  event: ShowEvent,
): void {
  if (event.type === 'asset.progress') {
    const { assetId, stage, percent, state } = event.data;
    queryClient.setQueryData<Asset>(libraryKeys.asset(showId, assetId), (old) =>
      old ? { ...old, state, progress: { stage, percent } } : old,
    );
    // The check is over: the lists now carry the metadata or the report.
    if (state !== 'pending')
      void queryClient.invalidateQueries({ queryKey: libraryKeys.all(showId) });
    return;
  }
  if (
    (event.type === 'job.progress' || event.type === 'job.state') &&
    event.data.kind === 'learn'
  ) {
    const { profileId } = event.data;
    if (!profileId) return;
    queryClient.setQueryData<Profile>(libraryKeys.profile(showId, profileId), (old) =>
      old?.job
        ? {
            ...old,
            state: old.state === 'queued' ? 'learning' : old.state,
            job: applyJobEvent(old.job, event.data),
          }
        : old,
    );
    if (event.type === 'job.state' && isJobFinished(event.data.state)) {
      void queryClient.invalidateQueries({ queryKey: libraryKeys.profiles(showId) });
    }
  }
}

/** Follows the show's events for a library page; `live` false means the page should poll. */
export function useLiveLibrary(showId: string): { live: boolean } {
  const queryClient = useQueryClient();
  return useShowEvents(showId, {
    onEvent: (event) => applyLibraryEvent(queryClient, showId, event),
    onOpen: (reconnected) => {
      if (reconnected) void queryClient.invalidateQueries({ queryKey: libraryKeys.all(showId) });
    },
  });
}
