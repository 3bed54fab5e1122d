// A shot's solve, review and render states as a word with an icon, the same on every screen.
import type { ReactNode } from 'react';
import {
  NO_STATE_WORD,
  RENDER_STATE_WORDS,
  REVIEW_STATE_WORDS,
  SOLVE_STATE_WORDS,
  type RenderState,
  type ReviewState,
  type SolveState,
} from '@/lib/shot-states';
import {
  ActivityIcon,
  CheckIcon,
  ClockIcon,
  CrossIcon,
  EmptyIcon,
  EyeIcon,
  ReturnIcon,
  StopIcon,
} from './icons';
import { StateLabel, type StateLabelProps } from './state-label';

type Look = { icon: ReactNode; color: StateLabelProps['color'] };

const NONE: Look = { icon: <EmptyIcon />, color: 'gray' };

const SOLVE_LOOK: Record<SolveState, Look> = {
  queued: { icon: <ClockIcon />, color: 'gray' },
  solving: { icon: <ActivityIcon />, color: 'blue' },
  solved: { icon: <CheckIcon />, color: 'green' },
  failed: { icon: <CrossIcon />, color: 'red' },
  canceled: { icon: <StopIcon />, color: 'gray' },
};

const REVIEW_LOOK: Record<ReviewState, Look> = {
  awaiting_review: { icon: <EyeIcon />, color: 'amber' },
  approved: { icon: <CheckIcon />, color: 'green' },
  changes_requested: { icon: <ReturnIcon />, color: 'orange' },
};

const RENDER_LOOK: Record<RenderState, Look> = {
  not_started: { icon: <EmptyIcon />, color: 'gray' },
  queued: { icon: <ClockIcon />, color: 'gray' },
  rendering: { icon: <ActivityIcon />, color: 'blue' },
  rendered: { icon: <CheckIcon />, color: 'green' },
  failed: { icon: <CrossIcon />, color: 'red' },
};

/** A retarget job's state; `null` means no job yet. */
export function SolveStateLabel({ state }: { state: SolveState | null }) {
  const look = state ? SOLVE_LOOK[state] : NONE;
  return (
    <StateLabel icon={look.icon} color={look.color}>
      {state ? SOLVE_STATE_WORDS[state] : NO_STATE_WORD}
    </StateLabel>
  );
}

/** A take's review state; `null` means no take yet. */
export function ReviewStateLabel({ state }: { state: ReviewState | null }) {
  const look = state ? REVIEW_LOOK[state] : NONE;
  return (
    <StateLabel icon={look.icon} color={look.color}>
      {state ? REVIEW_STATE_WORDS[state] : NO_STATE_WORD}
    </StateLabel>
  );
}

/** A shot's render state. */
export function RenderStateLabel({ state }: { state: RenderState }) {
  const look = RENDER_LOOK[state];
  return (
    <StateLabel icon={look.icon} color={look.color}>
      {RENDER_STATE_WORDS[state]}
    </StateLabel>
  );
}
