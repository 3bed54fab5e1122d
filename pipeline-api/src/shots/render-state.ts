import { DomainError } from '../common/errors/domain-error';

/** Per shot, as the render farm or a producer reports it. */
export enum RenderState {
  NotStarted = 'not_started',
  Queued = 'queued',
  Rendering = 'rendering',
  Rendered = 'rendered',
  Failed = 'failed',
}

/**
 * Allowed moves. Besides the forward path, a queued render can be taken back, and a failed or
 * finished render queued again (a new take needs a new render).
 */
export const RENDER_TRANSITIONS: Record<RenderState, readonly RenderState[]> = {
  [RenderState.NotStarted]: [RenderState.Queued],
  [RenderState.Queued]: [RenderState.Rendering, RenderState.NotStarted],
  [RenderState.Rendering]: [RenderState.Rendered, RenderState.Failed],
  [RenderState.Rendered]: [RenderState.Queued],
  [RenderState.Failed]: [RenderState.Queued],
};

/** Throws RENDER_STATE_INVALID_TRANSITION unless `from → to` is allowed (staying put is). */
export function assertRenderTransition(from: RenderState, to: RenderState): void {
  if (from === to || RENDER_TRANSITIONS[from].includes(to)) return;
  throw new DomainError(
    'conflict',
    'RENDER_STATE_INVALID_TRANSITION',
    `The render state cannot go from ${from} to ${to}.`,
    { from, to, allowed: RENDER_TRANSITIONS[from] },
  );
}
