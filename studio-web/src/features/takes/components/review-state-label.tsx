import type { ReactNode } from 'react';
import { CheckIcon, ClockIcon, WarningIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';
import type { ReviewState } from '../api/take-view';

const LOOKS: Record<
  ReviewState,
  { word: string; icon: ReactNode; color: 'gray' | 'green' | 'orange' }
> = {
  awaiting_review: { word: 'Awaiting review', icon: <ClockIcon />, color: 'gray' },
  approved: { word: 'Approved', icon: <CheckIcon />, color: 'green' },
  changes_requested: { word: 'Changes requested', icon: <WarningIcon />, color: 'orange' },
};

/** A take's review state in words with an icon. */
export function ReviewStateLabel({ state, testId }: { state: ReviewState; testId?: string }) {
  const { word, icon, color } = LOOKS[state];
  return (
    <span data-testid={testId} data-state={state}>
      <StateLabel icon={icon} color={color}>
        {word}
      </StateLabel>
    </span>
  );
}
