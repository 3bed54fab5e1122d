// Applies the show's live events to the shot screens' cached answers: job progress and state,
// new takes. The library's share (learn jobs, file checks) is applied too.
import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { applyJobEvent, isJobFinished, type Job } from '@/features/library/api/job-view';
import { useShowEvents, type ShowEvent } from '@/features/library/api/show-events';
import { applyLibraryEvent } from '@/features/library/hooks/use-live-library';
import { shotKeys } from '../api/shot-keys';

/** Updates the cache for one event. */
export function applyShotEvent(queryClient: QueryClient, showId: string, event: ShowEvent): void {
  applyLibraryEvent(queryClient, showId, event);
  if (event.type === 'job.progress' || event.type === 'job.state') {
    if (event.data.kind !== 'retarget') return;
    const { jobId, shotId } = event.data;
    queryClient.setQueryData<Job>(shotKeys.job(showId, jobId), (old) =>
      old ? applyJobEvent(old, event.data) : old,
    );
    if (shotId) {
      queryClient.setQueryData<Job[]>(shotKeys.jobList(showId, shotId), (old) =>
        old?.map((j) => applyJobEvent(j, event.data)),
      );
    }
    if (event.type === 'job.state') {
      // The shot's solve state moved, and a finished job has its final record.
      void queryClient.invalidateQueries({ queryKey: shotKeys.all(showId) });
      if (isJobFinished(event.data.state))
        void queryClient.invalidateQueries({ queryKey: shotKeys.jobs(showId) });
    }
  }
  if (event.type === 'take.ready') {
    void queryClient.invalidateQueries({ queryKey: shotKeys.takes(showId, event.data.shotId) });
    void queryClient.invalidateQueries({ queryKey: shotKeys.job(showId, event.data.jobId) });
  }
}

/** Follows the show's events on a shot page; `live` false means the page should poll. */
export function useLiveShots(showId: string): { live: boolean } {
  const queryClient = useQueryClient();
  return useShowEvents(showId, {
    onEvent: (event) => applyShotEvent(queryClient, showId, event),
    onOpen: (reconnected) => {
      if (!reconnected) return;
      void queryClient.invalidateQueries({ queryKey: shotKeys.all(showId) });
      void queryClient.invalidateQueries({ queryKey: shotKeys.jobs(showId) });
    },
  });
}
