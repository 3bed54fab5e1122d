import { TabNav } from '@radix-ui/themes';
import { Link, useMatch } from 'react-router-dom';
import { paths } from '@/config/paths';

const NAV_ITEMS = [{ label: 'Status', path: paths.status.path, href: paths.status.getHref() }];

function NavItem({ label, path, href }: (typeof NAV_ITEMS)[number]) {
  const match = useMatch({ path, end: false });
  return (
    <TabNav.Link asChild active={match !== null}>
      <Link to={href}>{label}</Link>
    </TabNav.Link>
  );
}

/** The studio's main navigation. */
export function MainNav() {
  return (
    <TabNav.Root aria-label="Main" size="2">
      {NAV_ITEMS.map((item) => (
        <NavItem key={item.href} {...item} />
      ))}
    </TabNav.Root>
  );
}
