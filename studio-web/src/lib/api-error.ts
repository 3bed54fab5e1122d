// The one error type the client raises for anything the API answered badly, or not at all.

/** Code used when no answer came back from the API (network down, server stopped). */
export const API_UNREACHABLE = 'API_UNREACHABLE';

/** Code used when the API answered, but not in the shape the client expects. */
export const UNEXPECTED_RESPONSE = 'UNEXPECTED_RESPONSE';

/** Fields of an ApiError. */
export interface ApiErrorInit {
  /** HTTP status, or 0 when there was no answer. */
  status: number;
  /** Stable machine-readable code from the API's error body. */
  code: string;
  /** Human sentence from the API's error body. */
  message: string;
  /** Extra detail from the error body (e.g. which field was wrong), if any. */
  details?: unknown;
}

/** A failed API call: the HTTP status plus the API's stable code, sentence and details. */
export class ApiError extends Error {
  /** HTTP status, or 0 when there was no answer. */
  readonly status: number;
  /** Stable machine-readable code. */
  readonly code: string;
  /** Extra detail from the error body, if any. */
  readonly details?: unknown;

  constructor({ status, code, message, details }: ApiErrorInit) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

/** True when the error means the API could not be reached at all. */
export function isApiUnreachable(error: unknown): boolean {
  return error instanceof ApiError && error.code === API_UNREACHABLE;
}
