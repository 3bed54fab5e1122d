import { CheckIcon, StopIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';

/** "Active" or "Disabled", with an icon. */
export function AccountStateLabel({ disabled }: { disabled: boolean }) {
  return disabled ? (
    <StateLabel icon={<StopIcon />} color="gray">
      Disabled
    </StateLabel>
  ) : (
    <StateLabel icon={<CheckIcon />} color="green">
      Active
    </StateLabel>
  );
}
