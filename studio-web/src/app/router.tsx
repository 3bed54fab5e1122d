import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { createBrowserRouter, Navigate, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/errors/route-error';
import { AppLayout } from '@/components/layouts/app-layout';
import { AppLoading } from '@/components/layouts/app-loading';
import { paths } from '@/config/paths';
import { NotFoundRoute } from './routes/not-found';
import { statusLoader, StatusRoute } from './routes/status';
import { adminRoutes } from '@/features/admin/routes';
import { libraryRoutes } from '@/features/library/routes';
import { shotsRoutes } from '@/features/shots/routes';
import { takesRoutes } from '@/features/takes/routes';
import { trackingRoutes } from '@/features/tracking/routes';

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
            { index: true, element: <Navigate to={paths.status.getHref()} replace /> },
            {
              path: paths.status.path,
              loader: statusLoader(queryClient),
              element: <StatusRoute />,
            },
            ...libraryRoutes(queryClient),
            ...shotsRoutes(queryClient),
            ...takesRoutes(queryClient),
            ...trackingRoutes(queryClient),
            ...adminRoutes(queryClient),
            { path: paths.notFound.path, element: <NotFoundRoute /> },
          ],
        },
      ],
    },
  ];
}

/** The router for the browser, built once per query client. */
export function AppRouter() {
  const queryClient = useQueryClient();
  const router = useMemo(() => createBrowserRouter(createAppRoutes(queryClient)), [queryClient]);
  return <RouterProvider router={router} />;
}
