// A small client for the Overshoot API as a signed-in person, for browser tests that set up their
// own data through the real routes (no database shortcuts).
import { createHash } from 'node:crypto';
import { API_URL } from './env.ts';

/** Password of every person the take tests invite (test data only). */
export const TEST_PERSON_PASSWORD = 'take-tests-password-1';

/** An API answer that was not 2xx: says which call and what came back. */
export class ApiCallError extends Error {
  constructor(
    readonly status: number,
    readonly body: unknown,
    call: string,
  ) {
    super(`${call} answered ${status}: ${JSON.stringify(body)}`);
  }
}

/** Someone signed in to the API (session cookie kept). */
export class ApiSession {
  private constructor(
    readonly email: string,
    private readonly cookie: string,
  ) {}

  /** Signs in with e-mail and password. */
  static async signIn(email: string, password: string): Promise<ApiSession> {
    const res = await fetch(`${API_URL}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password }),
    });
    if (res.status !== 200) throw new ApiCallError(res.status, await res.text(), 'sign-in');
    const cookie = (res.headers.getSetCookie?.() ?? [])
      .map((c) => c.split(';')[0])
      .find((c) => c.includes('='));
    if (!cookie) throw new Error('sign-in set no session cookie');
    return new ApiSession(email, cookie);
  }

  /** The first admin of the stack under test. */
  static admin(): Promise<ApiSession> {
    return ApiSession.signIn(
      process.env.ADMIN_EMAIL ?? 'admin@overshoot.localhost',
      process.env.ADMIN_PASSWORD ?? 'test-admin-password-1',
    );
  }

  /** Calls `path` (under /api) and returns the JSON answer; throws ApiCallError unless 2xx. */
  async call<T = Record<string, unknown>>(
    method: string,
    path: string,
    body?: unknown,
  ): Promise<T> {
    const res = await fetch(`${API_URL}/api${path}`, {
      method,
      headers: {
        Cookie: this.cookie,
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    const parsed: unknown = text ? JSON.parse(text) : undefined;
    if (!res.ok) throw new ApiCallError(res.status, parsed, `${method} ${path}`);
    return parsed as T;
  }

  /** Uploads a file the way the studio does (create, PUT each part, complete); returns the asset id. */
  async upload(
    showId: string,
    file: { kind: string; fileName: string; bytes: Uint8Array; extra?: object },
  ): Promise<string> {
    const created = await this.call<{
      asset: { id: string };
      partSize: number;
      parts: { partNumber: number; url: string }[];
    }>('POST', `/shows/${showId}/uploads`, {
      kind: file.kind,
      fileName: file.fileName,
      size: file.bytes.length,
      sha256: createHash('sha256').update(file.bytes).digest('hex'),
      contentType: 'model/gltf-binary',
      ...file.extra,
    });
    const parts = [];
    for (const part of created.parts) {
      const start = (part.partNumber - 1) * created.partSize;
      const res = await fetch(part.url, {
        method: 'PUT',
        body: file.bytes.slice(start, start + created.partSize),
      });
      if (!res.ok)
        throw new ApiCallError(res.status, await res.text(), `PUT part ${part.partNumber}`);
      parts.push({ partNumber: part.partNumber, etag: res.headers.get('etag') });
    }
    await this.call('POST', `/shows/${showId}/uploads/${created.asset.id}/complete`, { parts });
    return created.asset.id;
  }
}

/** Polls `read` every `everyMs` until `done` says so; throws with the last value after `timeoutMs`. */
export async function pollUntil<T>(
  what: string,
  read: () => Promise<T>,
  done: (value: T) => boolean,
  { timeoutMs = 60_000, everyMs = 250 } = {},
): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > until) throw new Error(`${what}: still ${JSON.stringify(value)}`);
    await new Promise((r) => setTimeout(r, everyMs));
  }
}

/** A short unique suffix, so runs against the same stack never collide. */
export const uniq = () => Math.random().toString(36).slice(2, 8);
