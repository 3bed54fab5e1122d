import { Box, Button, Container, Flex, Text } from '@radix-ui/themes';
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import { Link, Outlet, useMatch, useMatches, useNavigate } from 'react-router-dom';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';
import { isUnauthenticated } from '@/lib/query-client';
import { useMe } from '@/features/auth/api/get-me';
import { UserMenu } from '@/features/auth/components/user-menu';
import { ShowPicker } from '@/features/shows/components/show-picker';
import { useShowIdParam } from '@/features/shows/hooks/use-current-show';
import { MainNav } from './main-nav';
import { navItems, navTargets, type NavItem } from './nav-items';
import { ShortcutsDialog } from './shortcuts-dialog';
import {
  ShortcutsProvider,
  useShortcutHandlers,
  type ShortcutHandlers,
} from './shortcuts-provider';

/** A route's `handle` may ask for the whole window width (the take player does). */
export interface LayoutHandle {
  wide?: boolean;
}

/** Registers the "go" shortcuts of the links the user has. */
function NavShortcuts({ items }: { items: NavItem[] }) {
  const navigate = useNavigate();
  const handlers = useMemo(() => {
    const out: ShortcutHandlers = {};
    for (const [command, href] of Object.entries(navTargets(items, paths.shows.getHref()))) {
      out[command as keyof ShortcutHandlers] = () => void navigate(href);
    }
    return out;
  }, [items, navigate]);
  useShortcutHandlers(handlers);
  return null;
}

/** The page's width: the usual column, or the whole window less a margin for wide pages. */
function PageWidth({ wide, children }: { wide: boolean; children: ReactNode }) {
  return wide ? (
    <Box px={{ initial: '4', md: '6' }} className="page-wide">
      {children}
    </Box>
  ) : (
    <Container size="4" px="4">
      {children}
    </Container>
  );
}

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
  const wide = useMatches().some((m) => (m.handle as LayoutHandle | undefined)?.wide === true);

  return (
    <ShortcutsProvider enabled={user !== undefined} onHelp={openHelp}>
      {user ? <NavShortcuts items={items} /> : null}
      <Flex direction="column" minHeight="100vh">
        <a href="#main" className="skip-link">
          Skip to content
        </a>
        <header className="app-header">
          <PageWidth wide={wide}>
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
          </PageWidth>
        </header>
        <Box asChild flexGrow="1">
          <main id="main" tabIndex={-1}>
            <PageWidth wide={wide}>
              <Box py="6">
                <Outlet />
              </Box>
            </PageWidth>
          </main>
        </Box>
        <ShortcutsDialog open={helpOpen} onOpenChange={setHelpOpen} />
      </Flex>
    </ShortcutsProvider>
  );
}
