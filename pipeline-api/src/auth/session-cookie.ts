import type { CookieOptions, Request } from 'express';
import type { Env } from '../config/env.validation';

/** Name of the cookie that carries the session secret. */
export const SESSION_COOKIE = 'overshoot_session';

/** The cookie's attributes: script-proof, same-site only, API paths only, Secure when configured. */
export function sessionCookieOptions(env: Env): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'strict',
    secure: env.COOKIE_SECURE,
    path: '/api',
    maxAge: env.SESSION_ABSOLUTE_HOURS * 3_600_000,
  };
}

/** Reads one cookie from the request header (the API needs no other cookie, so no parser). */
export function readCookie(req: Request, name: string): string | undefined {
  const header = req.headers.cookie;
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq < 0 || part.slice(0, eq).trim() !== name) continue;
    const value = part.slice(eq + 1).trim();
    try {
      return decodeURIComponent(value);
    } catch {
      return undefined;
    }
  }
  return undefined;
}
