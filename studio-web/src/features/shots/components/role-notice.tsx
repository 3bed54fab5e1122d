import { Callout } from '@radix-ui/themes';
import { WarningIcon } from '@/components/ui/icons';

/** Said instead of a form the signed-in role may not use (the API would refuse it anyway). */
export function RoleNotice({ children }: { children: string }) {
  return (
    <Callout.Root color="gray" data-testid="role-notice">
      <Callout.Icon>
        <WarningIcon size={16} />
      </Callout.Icon>
      <Callout.Text>{children}</Callout.Text>
    </Callout.Root>
  );
}
