import { CheckIcon, ClockIcon, CrossIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';
import type { AssetState } from '../api/library-types';

/** A library file's state in words with an icon: being checked, ready, or rejected. */
export function AssetStateLabel({ state }: { state: AssetState }) {
  if (state === 'ready') {
    return (
      <StateLabel icon={<CheckIcon />} color="jade">
        Ready
      </StateLabel>
    );
  }
  if (state === 'rejected') {
    return (
      <StateLabel icon={<CrossIcon />} color="red">
        Rejected
      </StateLabel>
    );
  }
  return (
    <StateLabel icon={<ClockIcon />} color="gray">
      Being checked
    </StateLabel>
  );
}
