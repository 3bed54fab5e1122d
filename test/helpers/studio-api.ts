// A small API client for browser tests: signs in with a cookie of its own and sets up the data
// a test needs (shows, users, shots) through the same routes the studio uses.
import { stackConfig } from '../../scripts/stack/config.ts';
import { readLink } from './mail-sink.ts';

const cfg = stackConfig('test');

/** Base URL of the API serving the built studio (the test stack's own port). */
export const STUDIO_URL = process.env.OVERSHOOT_API_URL ?? `http://${cfg.api.host}:${cfg.api.port}`;

/** The first admin the stack creates on start. */
export const ADMIN = { email: cfg.admin.email, password: cfg.admin.password ?? '' };

/** A password for the people tests create (the API wants 12 characters or more). */
export const TEST_PASSWORD = 'studio-test-password-1';

/** A name no earlier run used, for codes and addresses (the test database persists). */
export function unique(prefix: string): string {
  return `${prefix}${Date.now().toString(36)}${Math.floor(Math.random() * 1296).toString(36)}`.toUpperCase();
}

/** A signed-in API caller. */
export interface ApiCaller {
  /** Sends a request; throws with the API's error body unless the status is 2xx. */
  call<T = unknown>(method: string, path: string, body?: unknown): Promise<T>;
  /** The raw response, for CSV and status checks. */
  raw(method: string, path: string, body?: unknown): Promise<Response>;
}

function caller(headers: Record<string, string>): ApiCaller {
  const raw = (method: string, path: string, body?: unknown) =>
    fetch(`${STUDIO_URL}/api${path}`, {
      method,
      headers: {
        ...headers,
        Accept: 'application/json',
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  return {
    raw,
    async call<T>(method: string, path: string, body?: unknown): Promise<T> {
      const res = await raw(method, path, body);
      const text = await res.text();
      if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${text}`);
      return (text ? JSON.parse(text) : undefined) as T;
    },
  };
}

function sessionCookie(res: Response): string {
  const cookie = res.headers.getSetCookie().find((c) => c.startsWith('overshoot_session='));
  if (!cookie) throw new Error(`No session cookie in the answer (HTTP ${res.status}).`);
  return cookie.split(';')[0];
}

/** Signs in by e-mail and password. */
export async function signInApi(email: string, password: string): Promise<ApiCaller> {
  const res = await fetch(`${STUDIO_URL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`Sign-in of ${email} answered ${res.status}: ${await res.text()}`);
  return caller({ Cookie: sessionCookie(res) });
}

/** An API caller with a pipeline token. */
export function tokenApi(secret: string): ApiCaller {
  return caller({ Authorization: `Bearer ${secret}` });
}

/** A show as the API returns it. */
export interface TestShow {
  id: string;
  code: string;
  name: string;
}

/** Creates a show as admin. */
export function createShow(admin: ApiCaller, name: string): Promise<TestShow> {
  return admin.call('POST', '/admin/shows', { code: unique('T'), name });
}

/** A person made for a test: their address, id and a signed-in API caller. */
export interface TestUser {
  id: string;
  email: string;
  displayName: string;
  api: ApiCaller;
}

/** Invites someone as admin, reads the e-mail from the mail sink, accepts through the API. */
export async function createUser(
  admin: ApiCaller,
  role: string,
  showIds: string[],
  displayName: string,
): Promise<TestUser> {
  const email = `${unique(role.replace('_', '-'))}@studio.localhost`.toLowerCase();
  await admin.call('POST', '/admin/invitations', { email, role, showIds });
  const link = await readLink(email, /accept-invitation#token=/);
  const token = new URL(link).hash.replace('#token=', '');
  const res = await fetch(`${STUDIO_URL}/api/auth/invitations/accept`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ token, displayName, password: TEST_PASSWORD }),
  });
  if (!res.ok) throw new Error(`Accepting the invitation of ${email}: ${await res.text()}`);
  const me = (await res.clone().json()) as { user: { id: string } };
  return { id: me.user.id, email, displayName, api: caller({ Cookie: sessionCookie(res) }) };
}
