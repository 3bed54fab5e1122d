// Every route of the studio, in one place: links and the router both read from here.

/** Route patterns (`path`) and link builders (`getHref`). */
export const paths = {
  home: { path: '/', getHref: () => '/' },
  status: { path: '/status', getHref: () => '/status' },
  notFound: { path: '*' },
} as const;
