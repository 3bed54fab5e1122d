import type { QueryClient } from '@tanstack/react-query';
import { redirect, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { AppLayout } from '@/components/layouts/app-layout';
import { AppLoading } from '@/components/layouts/app-loading';
import { paths } from '@/config/paths';
import {
  homeRedirect,
  redirectIfSignedIn,
  requirePermission,
  requireSession,
} from '@/features/auth/session-loaders';
import { adminRoutes } from '@/features/admin/routes';
import { libraryRoutes } from '@/features/library/routes';
import { shotsRoutes } from '@/features/shots/routes';
import { showsLoader } from '@/features/shows/loaders';
import { takesRoutes } from '@/features/takes/routes';
import { trackingRoutes } from '@/features/tracking/routes';
import { AcceptInvitationRoute } from './routes/accept-invitation';
import { NotFoundRoute } from './routes/not-found';
import { ResetPasswordRoute } from './routes/reset-password';
import { ShowsRoute } from './routes/shows';
import { SignInRoute } from './routes/sign-in';
import { statusLoader, StatusRoute } from './routes/status';

/** The studio's route table; loaders get the app's query client to fill its cache. */
export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      path: paths.home.path,
      element: <AppLayout />,
      errorElement: <RouteError />,
      hydrateFallbackElement: <AppLoading />,
      children: [
        {
          // Errors inside a page keep the header and navigation around the message.
          errorElement: <RouteError />,
          children: [
            { index: true, loader: homeRedirect(queryClient) },
            // Open to anyone.
            {
              path: paths.status.path,
              loader: statusLoader(queryClient),
              element: <StatusRoute />,
            },
            {
              path: paths.signIn.path,
              loader: redirectIfSignedIn(queryClient),
              element: <SignInRoute />,
            },
            { path: paths.acceptInvitation.path, element: <AcceptInvitationRoute /> },
            { path: paths.resetPassword.path, element: <ResetPasswordRoute /> },
            // Signed-in users only; the middleware sends everyone else to sign-in and back.
            {
              id: 'signed-in',
              middleware: [requireSession(queryClient)],
              children: [
                {
                  path: paths.shows.path,
                  loader: showsLoader(queryClient),
                  element: <ShowsRoute />,
                },
                {
                  path: paths.show.path,
                  loader: ({ params }) => redirect(paths.shots.getHref(params.showId ?? '')),
                },
                ...libraryRoutes(queryClient),
                ...shotsRoutes(queryClient),
                ...takesRoutes(queryClient),
                ...trackingRoutes(queryClient),
                {
                  middleware: [requirePermission(queryClient, 'admin')],
                  children: adminRoutes(queryClient),
                },
              ],
            },
            { path: paths.notFound.path, element: <NotFoundRoute /> },
          ],
        },
      ],
    },
  ];
}
