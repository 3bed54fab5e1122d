import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { getShotQueryOptions } from './api/get-shot';
import { getShotsQueryOptions } from './api/get-shots';
import { readShotListParams } from './hooks/use-shot-list-params';
import { EditShotRoute } from './routes/edit-shot-route';
import { NewShotRoute } from './routes/new-shot-route';
import { RetargetRoute } from './routes/retarget-route';
import { ShotRoute } from './routes/shot-route';
import { ShotsRoute } from './routes/shots-route';

/** Starts loading the page of shots the address asks for. */
function shotsLoader(queryClient: QueryClient) {
  return ({ params, request }: LoaderFunctionArgs) => {
    const query = readShotListParams(new URL(request.url).searchParams);
    void queryClient.prefetchQuery(getShotsQueryOptions(params.showId ?? '', query));
    return null;
  };
}

/** Starts loading one shot. */
function shotLoader(queryClient: QueryClient) {
  return ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(getShotQueryOptions(params.showId ?? '', params.shotId ?? ''));
    return null;
  };
}

/** The shots screens' routes, mounted inside the signed-in layout. */
export function shotsRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    { path: paths.shots.path, loader: shotsLoader(queryClient), element: <ShotsRoute /> },
    { path: paths.newShot.path, element: <NewShotRoute /> },
    { path: paths.shot.path, loader: shotLoader(queryClient), element: <ShotRoute /> },
    { path: paths.editShot.path, loader: shotLoader(queryClient), element: <EditShotRoute /> },
    { path: paths.retarget.path, loader: shotLoader(queryClient), element: <RetargetRoute /> },
  ];
}
