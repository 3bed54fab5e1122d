import { Flex, Heading, TabNav, Text } from '@radix-ui/themes';
import { Link, Outlet, useMatch } from 'react-router-dom';
import { paths } from '@/config/paths';

const TABS = [
  { label: 'Users', path: paths.adminUsers.path },
  { label: 'Invitations', path: paths.adminInvitations.path },
  { label: 'Shows', path: paths.adminShows.path },
  { label: 'Outbox', path: paths.adminOutbox.path },
];

function Tab({ label, path }: (typeof TABS)[number]) {
  const active = useMatch({ path, end: false }) !== null;
  return (
    <TabNav.Link asChild active={active}>
      <Link to={path}>{label}</Link>
    </TabNav.Link>
  );
}

/** The admin area: its heading, its own tabs, then the chosen screen. */
export function AdminLayout() {
  return (
    <Flex direction="column" gap="5">
      <Flex direction="column" gap="1">
        <Heading as="h1" size="7">
          Admin
        </Heading>
        <Text color="gray">People, roles, shows, memberships and pipeline tokens.</Text>
      </Flex>
      <TabNav.Root aria-label="Admin">
        {TABS.map((t) => (
          <Tab key={t.path} {...t} />
        ))}
      </TabNav.Root>
      <Outlet />
    </Flex>
  );
}
