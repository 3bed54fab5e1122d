import { Button, DropdownMenu, Flex, Text } from '@radix-ui/themes';
import { paths } from '@/config/paths';
import { useSignOut } from '../api/sign-out';
import type { SessionUser } from '../api/session-user';
import { ROLE_LABELS } from '../permissions';

/** Props of the user menu. */
export interface UserMenuProps {
  user: SessionUser;
  /** Opens the keyboard shortcut list. */
  onShowShortcuts: () => void;
}

/** The signed-in person's name and role, with sign-out and the shortcut list. */
export function UserMenu({ user, onShowShortcuts }: UserMenuProps) {
  const signOut = useSignOut();

  const leave = () =>
    signOut.mutate(undefined, {
      // Signed out or not (an expired session), a fresh page load leaves nothing of this user
      // in memory, and no page still on screen reads a session that is gone.
      onSettled: () => window.location.assign(paths.signIn.getHref()),
    });

  return (
    <DropdownMenu.Root>
      <DropdownMenu.Trigger>
        <Button variant="ghost" color="gray" data-testid="user-menu">
          <Flex direction="column" align="end" gap="0">
            <Text size="2" weight="medium">
              {user.displayName}
            </Text>
            <Text size="1" color="gray" data-testid="user-role">
              {ROLE_LABELS[user.role]}
            </Text>
          </Flex>
          <DropdownMenu.TriggerIcon />
        </Button>
      </DropdownMenu.Trigger>
      <DropdownMenu.Content align="end">
        <DropdownMenu.Label>{user.email}</DropdownMenu.Label>
        <DropdownMenu.Item shortcut="?" onSelect={onShowShortcuts}>
          Keyboard shortcuts
        </DropdownMenu.Item>
        <DropdownMenu.Separator />
        <DropdownMenu.Item onSelect={leave} disabled={signOut.isPending}>
          Sign out
        </DropdownMenu.Item>
      </DropdownMenu.Content>
    </DropdownMenu.Root>
  );
}
