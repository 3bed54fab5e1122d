import { ActivityIcon, StopIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';

/** "In production" or "Archived", with an icon. */
export function ShowStateLabel({ archived }: { archived: boolean }) {
  return archived ? (
    <StateLabel icon={<StopIcon />} color="gray">
      Archived
    </StateLabel>
  ) : (
    <StateLabel icon={<ActivityIcon />} color="green">
      In production
    </StateLabel>
  );
}
