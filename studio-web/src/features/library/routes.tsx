import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs, RouteObject } from 'react-router-dom';
import { paths } from '@/config/paths';
import { getCharactersQueryOptions } from './api/get-characters';
import { getClipsQueryOptions } from './api/get-clips';
import { getProfileQueryOptions } from './api/get-profile';
import { getProfilesQueryOptions } from './api/get-profiles';
import { CaptureRoute } from './routes/capture-route';
import { CharacterRoute } from './routes/character-route';
import { ClipRoute } from './routes/clip-route';
import { LibraryRoute } from './routes/library-route';
import { ProfileRoute } from './routes/profile-route';

/** Starts the library's requests as the page opens; the page shows its own waits and errors. */
function libraryLoader(queryClient: QueryClient) {
  return ({ params }: LoaderFunctionArgs) => {
    const showId = params.showId ?? '';
    void queryClient.prefetchQuery(getCharactersQueryOptions(showId));
    void queryClient.prefetchQuery(getClipsQueryOptions(showId));
    void queryClient.prefetchQuery(getProfilesQueryOptions(showId));
    return null;
  };
}

/** Starts loading a profile as its page opens. */
function profileLoader(queryClient: QueryClient) {
  return ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(
      getProfileQueryOptions(params.showId ?? '', params.profileId ?? ''),
    );
    return null;
  };
}

/** The library screens' routes, mounted inside the signed-in layout. */
export function libraryRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    { path: paths.library.path, loader: libraryLoader(queryClient), element: <LibraryRoute /> },
    { path: paths.character.path, element: <CharacterRoute /> },
    { path: paths.capture.path, element: <CaptureRoute /> },
    { path: paths.clip.path, element: <ClipRoute /> },
    { path: paths.profile.path, loader: profileLoader(queryClient), element: <ProfileRoute /> },
  ];
}
