import { Callout } from '@radix-ui/themes';
import { WarningIcon } from '@/components/ui/icons';

/** The caution every capture upload and capture page shows. */
export function CaptureCaution() {
  return (
    <Callout.Root color="amber" size="1" role="note" data-testid="capture-caution">
      <Callout.Icon>
        <WarningIcon size={16} />
      </Callout.Icon>
      <Callout.Text>
        Body captures are personal data. Follow local data-protection law, the performer’s agreement
        and the studio’s counsel. Record who consented (by reference code, never by name), to what,
        and until when.
      </Callout.Text>
    </Callout.Root>
  );
}
