import type { Take } from './entities/take.entity';
import type { ReviewState } from './review-state';
import type { JobState } from '../jobs/job-state';

/** A take as the API shows it. */
export interface TakeView {
  id: string;
  shotId: string;
  version: number;
  jobId: string;
  solveState: JobState;
  controls: Record<string, unknown>;
  metrics: Record<string, unknown> | null;
  files: string[];
  reviewState: ReviewState;
  createdBy: string | null;
  createdAt: string;
  reviewedAt: string | null;
}

/** The view of a take (job populated). */
export const takeView = (t: Take): TakeView => ({
  id: t.id,
  shotId: t.shot.id,
  version: t.version,
  jobId: t.job.id,
  solveState: t.job.state,
  controls: t.controls,
  metrics: t.metrics ?? null,
  files: t.files,
  reviewState: t.reviewState,
  createdBy: t.createdBy?.id ?? null,
  createdAt: t.createdAt.toISOString(),
  reviewedAt: t.reviewedAt?.toISOString() ?? null,
});
