import { TabNav } from '@radix-ui/themes';
import { Link, useMatch } from 'react-router-dom';
import type { NavItem } from './nav-items';

function NavLink({ item }: { item: NavItem }) {
  const match = useMatch({ path: item.match, end: false });
  return (
    <TabNav.Link asChild active={match !== null}>
      <Link to={item.href} data-nav={item.key}>
        {item.label}
      </Link>
    </TabNav.Link>
  );
}

/** The studio's main navigation: only the places the user's role can use. */
export function MainNav({ items }: { items: NavItem[] }) {
  return (
    <TabNav.Root aria-label="Main" size="2">
      {items.map((item) => (
        <NavLink key={item.key} item={item} />
      ))}
    </TabNav.Root>
  );
}
