import { Box, Container, Flex, Text } from '@radix-ui/themes';
import { Link, Outlet } from 'react-router-dom';
import { Logo } from '@/components/ui/logo';
import { paths } from '@/config/paths';
import { MainNav } from './main-nav';

/** Page frame: the header with the mark, name and navigation, then the current page. */
export function AppLayout() {
  return (
    <Flex direction="column" minHeight="100vh">
      <header className="app-header">
        <Container size="4" px="4">
          <Flex align="center" gap="6" height="56px">
            <Link to={paths.home.getHref()} className="brand-link">
              <Flex align="center" gap="2">
                <Logo size={26} />
                <Text size="4" weight="bold">
                  Overshoot
                </Text>
              </Flex>
            </Link>
            <MainNav />
          </Flex>
        </Container>
      </header>
      <Box asChild flexGrow="1">
        <main>
          <Container size="3" px="4" py="6">
            <Outlet />
          </Container>
        </main>
      </Box>
    </Flex>
  );
}
