import { CheckIcon, CrossIcon } from '@/components/ui/icons';
import { StateLabel } from '@/components/ui/state-label';
import type { ServiceHealth } from '../api/health-report';

/** A service's state as a word with an icon: "Up" or "Down". */
export function ServiceStateLabel({ state }: { state: ServiceHealth['status'] }) {
  return state === 'up' ? (
    <StateLabel icon={<CheckIcon />} color="jade">
      Up
    </StateLabel>
  ) : (
    <StateLabel icon={<CrossIcon />} color="red">
      Down
    </StateLabel>
  );
}
