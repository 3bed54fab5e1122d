import { DomainError } from '../common/errors/domain-error';

/** No such asset in the show (or in a show the caller cannot see: the same answer). */
export const assetNotFound = (assetId: string) =>
  new DomainError('not_found', 'ASSET_NOT_FOUND', `No asset ${assetId} in this show.`, {
    assetId,
  });

/** The S3 store failed; the cause goes to the log, not to the client. */
export const storageUnavailable = (cause: unknown) =>
  new DomainError(
    'unavailable',
    'STORAGE_UNAVAILABLE',
    `The S3 store cannot be reached right now; try again. (${(cause as Error)?.name ?? 'error'})`,
  );
