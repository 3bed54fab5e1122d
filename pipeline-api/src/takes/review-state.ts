/** Per take: `awaiting review → approved | changes requested`. */
export enum ReviewState {
  AwaitingReview = 'awaiting_review',
  Approved = 'approved',
  ChangesRequested = 'changes_requested',
}

/** What a supervisor decides about a take. */
export type Decision = ReviewState.Approved | ReviewState.ChangesRequested;
