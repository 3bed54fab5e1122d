// What the main navigation offers a role, in order. Pure, so the rule is tested on its own.
import { paths } from '@/config/paths';
import type { ShortcutCommand } from '@/config/shortcuts';
import { can, type Role } from '@/features/auth/permissions';

/** One link of the main navigation. */
export interface NavItem {
  /** Stable key, also the `data-nav` attribute the tests read. */
  key: 'library' | 'shots' | 'tracking' | 'admin' | 'status';
  label: string;
  /** Route pattern that marks the link as the current page. */
  match: string;
  href: string;
  /** The shortcut that goes there (config/shortcuts.ts), if any. */
  shortcut?: ShortcutCommand;
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
        shortcut: 'goLibrary',
      },
      {
        key: 'shots',
        label: 'Shots',
        match: paths.shots.path,
        href: paths.shots.getHref(showId),
        shortcut: 'goShots',
      },
    );
    if (can(role, 'track')) {
      items.push({
        key: 'tracking',
        label: 'Tracking',
        match: paths.tracking.path,
        href: paths.tracking.getHref(showId),
        shortcut: 'goTracking',
      });
    }
  }
  if (can(role, 'admin')) {
    items.push({
      key: 'admin',
      label: 'Admin',
      match: paths.admin.path,
      href: paths.adminUsers.getHref(),
      shortcut: 'goAdmin',
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

/** Where each "go" shortcut leads for this user: their own links, and all their shows. */
export function navTargets(
  items: NavItem[],
  allShowsHref: string,
): Partial<Record<ShortcutCommand, string>> {
  const targets: Partial<Record<ShortcutCommand, string>> = { goShows: allShowsHref };
  for (const item of items) if (item.shortcut) targets[item.shortcut] = item.href;
  return targets;
}
