// Every route of the studio, in one place: links and the router both read from here.

/** Route patterns (`path`) and link builders (`getHref`). */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  signIn: {
    path: '/sign-in',
    getHref: (redirectTo?: string) =>
      `/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
  },
  // These two match the links the API e-mails (their token travels in the URL fragment).
  acceptInvitation: { path: '/accept-invitation', getHref: () => '/accept-invitation' },
  resetPassword: { path: '/reset-password', getHref: () => '/reset-password' },
  status: { path: '/status', getHref: () => '/status' },
  shows: { path: '/shows', getHref: () => '/shows' },
  show: {
    path: '/shows/:showId',
    getHref: (showId: string) => `/shows/${showId}`,
  },
  library: {
    path: '/shows/:showId/library',
    getHref: (showId: string) => `/shows/${showId}/library`,
  },
  character: {
    path: '/shows/:showId/library/characters/:characterId',
    getHref: (showId: string, id: string) => `/shows/${showId}/library/characters/${id}`,
  },
  capture: {
    path: '/shows/:showId/library/captures/:captureId',
    getHref: (showId: string, id: string) => `/shows/${showId}/library/captures/${id}`,
  },
  clip: {
    path: '/shows/:showId/library/clips/:clipId',
    getHref: (showId: string, id: string) => `/shows/${showId}/library/clips/${id}`,
  },
  profile: {
    path: '/shows/:showId/library/profiles/:profileId',
    getHref: (showId: string, id: string) => `/shows/${showId}/library/profiles/${id}`,
  },
  shots: {
    path: '/shows/:showId/shots',
    getHref: (showId: string) => `/shows/${showId}/shots`,
  },
  newShot: {
    path: '/shows/:showId/shots/new',
    getHref: (showId: string) => `/shows/${showId}/shots/new`,
  },
  shot: {
    path: '/shows/:showId/shots/:shotId',
    getHref: (showId: string, shotId: string) => `/shows/${showId}/shots/${shotId}`,
  },
  editShot: {
    path: '/shows/:showId/shots/:shotId/edit',
    getHref: (showId: string, shotId: string) => `/shows/${showId}/shots/${shotId}/edit`,
  },
  retarget: {
    path: '/shows/:showId/shots/:shotId/retarget',
    getHref: (showId: string, shotId: string) => `/shows/${showId}/shots/${shotId}/retarget`,
  },
  take: {
    path: '/shows/:showId/takes/:takeId',
    getHref: (showId: string, takeId: string, frame?: number) =>
      `/shows/${showId}/takes/${takeId}${frame === undefined ? '' : `?frame=${frame}`}`,
  },
  tracking: {
    path: '/shows/:showId/tracking',
    getHref: (showId: string) => `/shows/${showId}/tracking`,
  },
  admin: { path: '/admin', getHref: () => '/admin' },
  adminUsers: { path: '/admin/users', getHref: () => '/admin/users' },
  adminInvitations: { path: '/admin/invitations', getHref: () => '/admin/invitations' },
  adminShows: { path: '/admin/shows', getHref: () => '/admin/shows' },
  adminShow: {
    path: '/admin/shows/:showId',
    getHref: (showId: string) => `/admin/shows/${showId}`,
  },
  adminOutbox: { path: '/admin/outbox', getHref: () => '/admin/outbox' },
  notFound: { path: '*' },
} as const;
