import type { ReactNode } from 'react';
import { ActivityIcon, CheckIcon, ClockIcon, CrossIcon } from '@/components/ui/icons';
import { StateLabel, type StateLabelProps } from '@/components/ui/state-label';
import type { ProfileState } from '../api/profile-types';

const LOOK: Record<
  ProfileState,
  { word: string; icon: ReactNode; color: StateLabelProps['color'] }
> = {
  queued: { word: 'Waiting to learn', icon: <ClockIcon />, color: 'gray' },
  learning: { word: 'Learning', icon: <ActivityIcon />, color: 'amber' },
  ready: { word: 'Ready', icon: <CheckIcon />, color: 'jade' },
  failed: { word: 'Failed', icon: <CrossIcon />, color: 'red' },
};

/** A profile's state as a word with an icon. */
export function ProfileStateLabel({ state }: { state: ProfileState }) {
  const { word, icon, color } = LOOK[state];
  return (
    <StateLabel icon={icon} color={color}>
      {word}
    </StateLabel>
  );
}
