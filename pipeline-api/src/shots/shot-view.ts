import type { Shot } from './entities/shot.entity';
import type { RenderState } from './render-state';
import type { JobState } from '../jobs/job-state';
import { ReviewState } from '../takes/review-state';

/** A shot as the API shows it. */
export interface ShotView {
  id: string;
  sequence: string;
  code: string;
  frameStart: number;
  frameEnd: number;
  fps: number;
  characterId: string | null;
  clipId: string | null;
  assignees: { id: string; displayName: string }[];
  dueDate: string | null;
  late: boolean;
  renderState: RenderState;
  solveState: JobState | null;
  reviewState: ReviewState | null;
  latestTakeVersion: number | null;
  createdAt: string;
  updatedAt: string;
}

/** Late: the due date has passed and the shot's latest take is not approved. */
export const isLate = (s: Pick<Shot, 'dueDate' | 'reviewState'>, today: string): boolean =>
  !!s.dueDate && s.dueDate < today && s.reviewState !== ReviewState.Approved;

/** The view of a shot (assignees populated). */
export const shotView = (s: Shot, today: string): ShotView => ({
  id: s.id,
  sequence: s.sequence,
  code: s.code,
  frameStart: s.frameStart,
  frameEnd: s.frameEnd,
  fps: s.fps,
  characterId: s.character?.id ?? null,
  clipId: s.clip?.id ?? null,
  assignees: s.assignees
    .getItems()
    .map((u) => ({ id: u.id, displayName: u.displayName }))
    .sort((a, b) => a.displayName.localeCompare(b.displayName) || a.id.localeCompare(b.id)),
  dueDate: s.dueDate ?? null,
  late: isLate(s, today),
  renderState: s.renderState,
  solveState: s.solveState ?? null,
  reviewState: s.reviewState ?? null,
  latestTakeVersion: s.latestTakeVersion ?? null,
  createdAt: s.createdAt.toISOString(),
  updatedAt: s.updatedAt.toISOString(),
});
