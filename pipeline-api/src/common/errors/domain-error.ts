// Services throw domain errors, never HTTP exceptions (the same services run in workers);
// one filter maps them to HTTP.

/** What kind of failure a domain error is, which the HTTP filter turns into a status. */
export type DomainErrorKind =
  | 'invalid'
  | 'not_found'
  | 'conflict'
  | 'too_large'
  | 'forbidden'
  | 'unauthenticated'
  | 'throttled'
  | 'unavailable';

/** An error with a stable code, a human sentence and optional details of where. */
export class DomainError extends Error {
  constructor(
    readonly kind: DomainErrorKind,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'DomainError';
  }
}
