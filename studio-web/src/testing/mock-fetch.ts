// A stand-in for the browser's fetch in component tests: the real API has its own tests.
import { vi } from 'vitest';

/** A JSON response with the given HTTP status. */
export function jsonResponse(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

/** Answers a request; may throw or reject to simulate a network failure. */
export type FetchHandler = (url: string, init: RequestInit) => Response | Promise<Response>;

/** Replaces global fetch with the handler (undone after each test) and returns the spy. */
export function mockFetch(handler: FetchHandler) {
  const spy = vi.fn((input: RequestInfo | URL, init: RequestInit = {}) =>
    Promise.resolve().then(() => handler(String(input), init)),
  );
  vi.stubGlobal('fetch', spy);
  return spy;
}
