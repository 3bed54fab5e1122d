// Client configuration comes from Vite's build-time environment and is checked once, here.

/** Validated client settings. */
export interface ClientEnv {
  /** Base of every API request, without a trailing slash: a path ("/api") or an http(s) URL. */
  apiBaseUrl: string;
}

/** Reads and checks the client settings; throws an Error naming the bad variable. */
export function readEnv(source: Record<string, unknown>): ClientEnv {
  const raw = source.VITE_API_BASE_URL ?? '/api';
  if (typeof raw !== 'string' || !/^(\/|https?:\/\/)/.test(raw)) {
    throw new Error(
      `VITE_API_BASE_URL must be a path such as /api or an http(s) URL; got "${String(raw)}".`,
    );
  }
  return { apiBaseUrl: raw.replace(/\/+$/, '') };
}

/** The settings this build runs with. */
export const env: ClientEnv = readEnv(import.meta.env);
