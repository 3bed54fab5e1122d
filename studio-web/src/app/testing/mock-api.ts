// A routed stand-in for the API in component tests: "METHOD /api/path" → answer.
import { jsonResponse, mockFetch } from '@/testing/mock-fetch';

/** Answers one request; gets the URL (with its query) and the init. */
export type ApiHandler = (url: URL, init: RequestInit) => Response | Promise<Response>;

/** A user as /api/auth/me returns it, with the given role. */
export function meBody(role: string, name = 'Robin Vale') {
  return {
    kind: 'user',
    user: {
      id: `user-${role}`,
      email: `${role}@studio.example`,
      displayName: name,
      role,
      disabled: false,
      createdAt: '2030-01-01T00:00:00.000Z',
    },
  };
}

/** The API's answer when nobody is signed in. */
export const NOT_SIGNED_IN = () =>
  jsonResponse({ code: 'NOT_SIGNED_IN', message: 'Sign in first.' }, 401);

/** Replaces fetch with the routes (unknown ones answer 404 ROUTE_NOT_FOUND); returns the spy. */
export function mockApi(routes: Record<string, ApiHandler>) {
  return mockFetch((input, init) => {
    const url = new URL(input, 'http://studio.test');
    const key = `${init.method ?? 'GET'} ${url.pathname}`;
    const handler = routes[key];
    if (handler) return handler(url, init);
    return jsonResponse({ code: 'ROUTE_NOT_FOUND', message: `No route ${key}.` }, 404);
  });
}

/** The "METHOD path?query" of every call the spy saw, in order. */
export function calls(spy: ReturnType<typeof mockApi>): string[] {
  return spy.mock.calls.map(([input, init]) => {
    const url = new URL(String(input), 'http://studio.test');
    return `${init?.method ?? 'GET'} ${url.pathname}${url.search}`;
  });
}
