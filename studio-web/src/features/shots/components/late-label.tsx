import { LateIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';

/** "Late": the due date has passed and the latest take is not approved. */
export function LateLabel() {
  return (
    <StateLabel icon={<LateIcon />} color="red">
      Late
    </StateLabel>
  );
}
