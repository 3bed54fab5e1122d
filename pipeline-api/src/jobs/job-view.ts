import type { JobKind } from '../events/show-event';
import type { JobState } from './job-state';
import type { LearnJob } from './entities/learn-job.entity';
import type { RetargetJob } from './entities/retarget-job.entity';

/** A learn or retarget job as the API shows it. */
export interface JobView {
  id: string;
  kind: JobKind;
  state: JobState;
  stage: string | null;
  percent: number;
  attempts: number;
  errorCode: string | null;
  errorMessage: string | null;
  shotId: string | null;
  profileId: string | null;
  takeId: string | null;
  /** The retarget's controls, every field filled; null for a learn job. */
  controls: Record<string, unknown> | null;
  submittedBy: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

const common = (j: LearnJob | RetargetJob) => ({
  id: j.id,
  state: j.state,
  stage: j.stage ?? null,
  percent: j.percent,
  attempts: j.attempts,
  errorCode: j.errorCode ?? null,
  errorMessage: j.errorMessage ?? null,
  profileId: j.profile.id,
  submittedBy: j.submittedBy?.id ?? null,
  createdAt: j.createdAt.toISOString(),
  startedAt: j.startedAt?.toISOString() ?? null,
  finishedAt: j.finishedAt?.toISOString() ?? null,
});

/** The view of a learn job. */
export const learnJobView = (j: LearnJob): JobView => ({
  ...common(j),
  kind: 'learn',
  shotId: null,
  takeId: null,
  controls: null,
});

/** The view of a retarget job, with the id of its take once there is one. */
export const retargetJobView = (j: RetargetJob, takeId: string | null): JobView => ({
  ...common(j),
  kind: 'retarget',
  shotId: j.shot.id,
  takeId,
  controls: j.controls,
});
