// Cache keys and API paths of the take screens, in one place so mutations invalidate exactly.

/** Path of a show's routes under the API base. */
export const showPath = (showId: string) => `/shows/${encodeURIComponent(showId)}`;

/** Query keys: everything about one take sits under `take(showId, takeId)`. */
export const takeKeys = {
  take: (showId: string, takeId: string) => ['shows', showId, 'takes', takeId] as const,
  file: (showId: string, takeId: string) => ['shows', showId, 'takes', takeId, 'file'] as const,
  notes: (showId: string, takeId: string) => ['shows', showId, 'takes', takeId, 'notes'] as const,
  decisions: (showId: string, takeId: string) =>
    ['shows', showId, 'takes', takeId, 'decisions'] as const,
  shotTakes: (showId: string, shotId: string) =>
    ['shows', showId, 'shots', shotId, 'takes'] as const,
  job: (showId: string, jobId: string) => ['shows', showId, 'jobs', jobId] as const,
};
