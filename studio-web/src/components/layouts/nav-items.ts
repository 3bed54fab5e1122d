// What the main navigation offers a role, in order. Pure, so the rule is tested on its own.
import { paths } from '@/config/paths';
import { can, type Role } from '@/features/auth/permissions';

/** One link of the main navigation. */
export interface NavItem {
  /** Stable key, also the `data-nav` attribute the tests read. */
  key: 'library' | 'shots' | 'tracking' | 'admin' | 'status';
  label: string;
  /** Route pattern that marks the link as the current page. */
  match: string;
  href: string;
  /** Key that follows `g` to go there (see the shortcut list), if any. */
  shortcut?: string;
}

/** The links a user with `role` sees; the show's links only once a show is chosen. */
export function navItems(role: Role | undefined, showId: string | undefined): NavItem[] {
  const items: NavItem[] = [];
  if (role && showId) {
    items.push(
      {
        key: 'library',
        label: 'Library',
        match: paths.library.path,
        href: paths.library.getHref(showId),
        shortcut: 'l',
      },
      {
        key: 'shots',
        label: 'Shots',
        match: paths.shots.path,
        href: paths.shots.getHref(showId),
        shortcut: 's',
      },
    );
    if (can(role, 'track')) {
      items.push({
        key: 'tracking',
        label: 'Tracking',
        match: paths.tracking.path,
        href: paths.tracking.getHref(showId),
        shortcut: 't',
      });
    }
  }
  if (can(role, 'admin')) {
    items.push({
      key: 'admin',
      label: 'Admin',
      match: paths.admin.path,
      href: paths.adminUsers.getHref(),
      shortcut: 'a',
    });
  }
  items.push({
    key: 'status',
    label: 'Status',
    match: paths.status.path,
    href: paths.status.getHref(),
  });
  return items;
}
