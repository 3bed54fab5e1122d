// Fetch wrapper for the pipeline API: JSON in, JSON out, and every failure as a typed ApiError.
import { env } from '@/config/env';
import { API_UNREACHABLE, ApiError, UNEXPECTED_RESPONSE } from './api-error';

// Re-exported so callers get requests and their error type from one module.
export { API_UNREACHABLE, ApiError, UNEXPECTED_RESPONSE, isApiUnreachable } from './api-error';
export type { ApiErrorInit } from './api-error';

/** Options for one API request. */
export interface ApiRequestOptions {
  /** HTTP method; GET by default. */
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  /** Request body, sent as JSON. */
  body?: unknown;
  /** Cancels the request (TanStack Query passes one per query). */
  signal?: AbortSignal;
  /** Non-2xx statuses whose body is still a valid answer, e.g. 503 from the health check. */
  acceptStatus?: readonly number[];
  /** What the caller wants back (default JSON); a download asks for its own type. */
  accept?: string;
}

/** Checks an answer's shape and returns it typed; throws an Error saying what is missing. */
export type ResponseParser<T> = (body: unknown) => T;

// A gateway status with an empty or non-JSON body comes from a proxy in front of the API (the
// dev server's, or one in production) that got no answer: report it as unreachable.
const GATEWAY_STATUSES = new Set([502, 503, 504]);

type ParsedBody = { ok: true; value: unknown } | { ok: false };

async function readJson(response: Response, signal?: AbortSignal): Promise<ParsedBody> {
  let text: string;
  try {
    text = await response.text();
  } catch (error) {
    // The connection dropped mid-answer: as good as no answer, unless the caller cancelled.
    if (signal?.aborted) throw error;
    throw unreachable(response.status, error instanceof Error ? error.message : String(error));
  }
  if (text.trim() === '') return { ok: true, value: undefined };
  try {
    return { ok: true, value: JSON.parse(text) as unknown };
  } catch {
    return { ok: false };
  }
}

function isErrorBody(
  value: unknown,
): value is { code: string; message: string; details?: unknown } {
  if (typeof value !== 'object' || value === null) return false;
  const body = value as Record<string, unknown>;
  return typeof body.code === 'string' && typeof body.message === 'string';
}

function unreachable(status: number, cause: string): ApiError {
  return new ApiError({
    status,
    code: API_UNREACHABLE,
    message: 'The Overshoot API could not be reached.',
    details: { cause },
  });
}

async function send(url: string, options: ApiRequestOptions): Promise<Response> {
  const { method = 'GET', body, signal, accept = 'application/json' } = options;
  try {
    return await fetch(url, {
      method,
      signal,
      headers: {
        Accept: accept,
        ...(body === undefined ? {} : { 'Content-Type': 'application/json' }),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch (error) {
    // A cancelled request is not an outage; let the caller see the abort as it is.
    if (signal?.aborted) throw error;
    throw unreachable(0, error instanceof Error ? error.message : String(error));
  }
}

/** Calls the API at `path` (e.g. "/health") and returns the parsed JSON body. */
export async function apiRequest<T = unknown>(
  path: string,
  options: ApiRequestOptions = {},
  parse?: ResponseParser<T>,
): Promise<T> {
  const response = await send(`${env.apiBaseUrl}${path}`, options);
  const { status } = response;
  const body = await readJson(response, options.signal);
  const accepted = response.ok || (options.acceptStatus ?? []).includes(status);

  const noApiBody = !body.ok || body.value === undefined;
  if (!response.ok && GATEWAY_STATUSES.has(status) && noApiBody) {
    throw unreachable(status, `HTTP ${status} without an API body`);
  }
  if (accepted && body.ok)
    return parse ? parseOrThrow(parse, body.value, status) : (body.value as T);
  if (!accepted && body.ok && isErrorBody(body.value)) {
    const { code, message, details } = body.value;
    throw new ApiError({ status, code, message, details });
  }
  const request = `${options.method ?? 'GET'} ${path}`;
  throw new ApiError({
    status,
    code: UNEXPECTED_RESPONSE,
    message: body.ok
      ? `The API answered ${request} with HTTP ${status} but no error description.`
      : `The API answered ${request} with something that is not JSON (HTTP ${status}).`,
  });
}

/** A file the API sent, with the name it suggested. */
export interface ApiFile {
  blob: Blob;
  /** From Content-Disposition's filename, if the API gave one. */
  filename: string | undefined;
}

function dispositionFilename(header: string | null): string | undefined {
  const match = /filename="?([^";]+)"?/i.exec(header ?? '');
  return match ? match[1] : undefined;
}

/** Downloads a file from the API at `path`; failures raise the same ApiError as apiRequest. */
export async function apiDownload(path: string, options: ApiRequestOptions = {}): Promise<ApiFile> {
  const response = await send(`${env.apiBaseUrl}${path}`, {
    ...options,
    accept: options.accept ?? '*/*',
  });
  if (response.ok) {
    try {
      const blob = await response.blob();
      return { blob, filename: dispositionFilename(response.headers.get('Content-Disposition')) };
    } catch (error) {
      // The API cuts a download short when it fails half-way: say so rather than save half.
      if (options.signal?.aborted) throw error;
      throw unreachable(response.status, error instanceof Error ? error.message : String(error));
    }
  }
  const body = await readJson(response, options.signal);
  if (body.ok && isErrorBody(body.value)) {
    const { code, message, details } = body.value;
    throw new ApiError({ status: response.status, code, message, details });
  }
  if (GATEWAY_STATUSES.has(response.status)) {
    throw unreachable(response.status, `HTTP ${response.status} without an API body`);
  }
  throw new ApiError({
    status: response.status,
    code: UNEXPECTED_RESPONSE,
    message: `The API answered GET ${path} with HTTP ${response.status} but no error description.`,
  });
}

function parseOrThrow<T>(parse: ResponseParser<T>, value: unknown, status: number): T {
  try {
    return parse(value);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    throw new ApiError({ status, code: UNEXPECTED_RESPONSE, message, details: value });
  }
}
