import { ParseUUIDPipe } from '@nestjs/common';
import { DomainError } from './errors/domain-error';
import type { ErrorCode } from './errors/error-codes';

/**
 * A path id pipe: a value that is not a UUID cannot name anything, so it gets the route's own
 * "not found" code rather than a database round trip.
 */
export const uuidParam = (code: ErrorCode) =>
  new ParseUUIDPipe({
    exceptionFactory: () => new DomainError('not_found', code, 'No such object in this show.'),
  });
