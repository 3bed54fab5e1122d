import { Box, Button, Container, Flex, Text } from '@radix-ui/themes';
import { useCallback, useMemo, useState } from 'react';
import { Link, Outlet, useMatch } from 'react-router-dom';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';
import { isUnauthenticated } from '@/lib/query-client';
import { useMe } from '@/features/auth/api/get-me';
import { UserMenu } from '@/features/auth/components/user-menu';
import { ShowPicker } from '@/features/shows/components/show-picker';
import { useShowIdParam } from '@/features/shows/hooks/use-current-show';
import { MainNav } from './main-nav';
import { navItems } from './nav-items';
import { ShortcutsDialog } from './shortcuts-dialog';
import { useShellShortcuts } from './use-shell-shortcuts';

/** Page frame: the header with the mark, show, navigation and user, then the current page. */
export function AppLayout() {
  const me = useMe();
  // After a 401 the query still holds the last user; the error is what counts.
  const user = isUnauthenticated(me.error) ? undefined : me.data;
  const showId = useShowIdParam();
  const onSignIn = useMatch(paths.signIn.path) !== null;
  const items = useMemo(() => navItems(user?.role, showId), [user?.role, showId]);
  const [helpOpen, setHelpOpen] = useState(false);
  const openHelp = useCallback(() => setHelpOpen(true), []);
  useShellShortcuts(items, openHelp, user !== undefined);

  return (
    <Flex direction="column" minHeight="100vh">
      <a href="#main" className="skip-link">
        Skip to content
      </a>
      <header className="app-header">
        <Container size="4" px="4">
          <Flex align="center" gap="5" height="56px">
            <Link to={paths.home.getHref()} className="brand-link" aria-label="Overshoot, home">
              <Flex align="center" gap="2">
                <Logo size={26} />
                <Text size="4" weight="bold">
                  Overshoot
                </Text>
              </Flex>
            </Link>
            {user ? <ShowPicker showId={showId} /> : null}
            <MainNav items={items} />
            <Box flexGrow="1" />
            {user ? <UserMenu user={user} onShowShortcuts={openHelp} /> : null}
            {!user && !me.isPending && !onSignIn ? (
              <Button asChild variant="soft">
                <Link to={paths.signIn.getHref()}>Sign in</Link>
              </Button>
            ) : null}
          </Flex>
        </Container>
      </header>
      <Box asChild flexGrow="1">
        <main id="main" tabIndex={-1}>
          <Container size="4" px="4" py="6">
            <Outlet />
          </Container>
        </main>
      </Box>
      <ShortcutsDialog open={helpOpen} onOpenChange={setHelpOpen} />
    </Flex>
  );
}
