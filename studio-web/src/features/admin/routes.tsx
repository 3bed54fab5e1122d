import type { QueryClient } from '@tanstack/react-query';
import { redirect, type RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { AdminLayout } from './components/admin-layout';
import { InvitationsScreen } from './components/invitations-screen';
import { OutboxScreen } from './components/outbox-screen';
import { ShowAdminScreen } from './components/show-admin-screen';
import { ShowsScreen } from './components/shows-screen';
import { UsersScreen } from './components/users-screen';
import { getAdminShowsQueryOptions } from './api/get-admin-shows';
import { getUsersQueryOptions } from './api/get-users';

/** The admin screens' routes, mounted inside the signed-in layout (admins only). */
export function adminRoutes(queryClient: QueryClient): RouteObject[] {
  // Started, not awaited: each screen shows its own wait and errors.
  const prefetch =
    (...starts: ((client: QueryClient) => Promise<void>)[]) =>
    () => {
      for (const start of starts) void start(queryClient);
      return null;
    };
  const users = (client: QueryClient) => client.prefetchQuery(getUsersQueryOptions());
  const shows = (client: QueryClient) => client.prefetchQuery(getAdminShowsQueryOptions());
  return [
    {
      path: paths.admin.path,
      element: <AdminLayout />,
      children: [
        { index: true, loader: () => redirect(paths.adminUsers.getHref()) },
        {
          path: paths.adminUsers.path,
          loader: prefetch(users, shows),
          element: <UsersScreen />,
        },
        {
          path: paths.adminInvitations.path,
          loader: prefetch(shows),
          element: <InvitationsScreen />,
        },
        {
          path: paths.adminShows.path,
          loader: prefetch(shows),
          element: <ShowsScreen />,
        },
        {
          path: paths.adminShow.path,
          loader: prefetch(shows, users),
          element: <ShowAdminScreen />,
        },
        { path: paths.adminOutbox.path, element: <OutboxScreen /> },
      ],
    },
  ];
}
