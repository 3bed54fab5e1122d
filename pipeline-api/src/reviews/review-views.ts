import type { Note, NoteMark } from './entities/note.entity';
import type { ReviewDecision } from './entities/review-decision.entity';
import type { Decision } from '../takes/review-state';

/** A note as the API shows it. */
export interface NoteView {
  id: string;
  takeId: string;
  frame: number;
  text: string;
  mark: NoteMark | null;
  author: { id: string; displayName: string };
  resolved: boolean;
  resolvedBy: string | null;
  resolvedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

/** The view of a note (author populated). */
export const noteView = (n: Note): NoteView => ({
  id: n.id,
  takeId: n.take.id,
  frame: n.frame,
  text: n.text,
  mark: n.mark ?? null,
  author: { id: n.author.id, displayName: n.author.displayName },
  resolved: n.resolved,
  resolvedBy: n.resolvedBy?.id ?? null,
  resolvedAt: n.resolvedAt?.toISOString() ?? null,
  createdAt: n.createdAt.toISOString(),
  updatedAt: n.updatedAt.toISOString(),
});

/** A decision as the API shows it. */
export interface DecisionView {
  id: string;
  takeId: string;
  decision: Decision;
  comment: string | null;
  supervisor: { id: string; displayName: string };
  at: string;
}

/** The view of a decision (supervisor populated). */
export const decisionView = (d: ReviewDecision): DecisionView => ({
  id: d.id,
  takeId: d.take.id,
  decision: d.decision,
  comment: d.comment ?? null,
  supervisor: { id: d.supervisor.id, displayName: d.supervisor.displayName },
  at: d.at.toISOString(),
});
