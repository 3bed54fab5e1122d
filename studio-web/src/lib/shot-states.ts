// The three state machines of a shot (product.md, Words), as the API names their states.

/** Per retarget job: queued → solving → solved | failed | canceled. */
export const SOLVE_STATES = ['queued', 'solving', 'solved', 'failed', 'canceled'] as const;
/** A retarget job's state. */
export type SolveState = (typeof SOLVE_STATES)[number];

/** Per take: awaiting review → approved | changes requested. */
export const REVIEW_STATES = ['awaiting_review', 'approved', 'changes_requested'] as const;
/** A take's review state. */
export type ReviewState = (typeof REVIEW_STATES)[number];

/** Per shot: not started → queued → rendering → rendered | failed. */
export const RENDER_STATES = ['not_started', 'queued', 'rendering', 'rendered', 'failed'] as const;
/** A shot's render state. */
export type RenderState = (typeof RENDER_STATES)[number];

/** Solve state in words. */
export const SOLVE_STATE_WORDS: Record<SolveState, string> = {
  queued: 'Queued',
  solving: 'Solving',
  solved: 'Solved',
  failed: 'Failed',
  canceled: 'Canceled',
};

/** Review state in words. */
export const REVIEW_STATE_WORDS: Record<ReviewState, string> = {
  awaiting_review: 'Awaiting review',
  approved: 'Approved',
  changes_requested: 'Changes requested',
};

/** Render state in words. */
export const RENDER_STATE_WORDS: Record<RenderState, string> = {
  not_started: 'Not started',
  queued: 'Queued',
  rendering: 'Rendering',
  rendered: 'Rendered',
  failed: 'Failed',
};

/** The word for "no job or take yet", which the API writes `none` in filters and counts. */
export const NO_STATE_WORD = 'None yet';

/** True when `value` is one of `states`. */
export function isOneOf<T extends string>(states: readonly T[], value: unknown): value is T {
  return typeof value === 'string' && (states as readonly string[]).includes(value);
}

/**
 * Where a render state may go next, as the API allows it (it refuses any other move with
 * RENDER_STATE_INVALID_TRANSITION): the forward path, a queued render taken back, and a failed
 * or finished render queued again.
 */
export const RENDER_MOVES: Record<RenderState, readonly RenderState[]> = {
  not_started: ['queued'],
  queued: ['rendering', 'not_started'],
  rendering: ['rendered', 'failed'],
  rendered: ['queued'],
  failed: ['queued'],
};
