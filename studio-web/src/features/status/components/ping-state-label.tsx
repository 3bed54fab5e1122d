import type { ReactNode } from 'react';
import { ActivityIcon, CheckIcon, ClockIcon, CrossIcon } from '@/components/ui/icons';
import { StateLabel, type StateLabelProps } from '@/components/ui/state-label';
import type { PingState } from '../api/ping-job';

const LOOK: Record<PingState, { word: string; icon: ReactNode; color: StateLabelProps['color'] }> =
  {
    waiting: { word: 'Waiting in queue', icon: <ClockIcon />, color: 'gray' },
    active: { word: 'Running', icon: <ActivityIcon />, color: 'amber' },
    completed: { word: 'Completed', icon: <CheckIcon />, color: 'jade' },
    failed: { word: 'Failed', icon: <CrossIcon />, color: 'red' },
  };

/** A test job's state as a word with an icon. */
export function PingStateLabel({ state }: { state: PingState }) {
  const { word, icon, color } = LOOK[state];
  return (
    <StateLabel icon={icon} color={color}>
      {word}
    </StateLabel>
  );
}
