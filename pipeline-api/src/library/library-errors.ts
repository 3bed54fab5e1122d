import { DomainError } from '../common/errors/domain-error';

/** Not-found errors of the library, one code per kind. */
export const characterNotFound = (id: string) =>
  new DomainError('not_found', 'CHARACTER_NOT_FOUND', `No character ${id} in this show.`, {
    characterId: id,
  });
/** No such capture in the show. */
export const captureNotFound = (id: string) =>
  new DomainError('not_found', 'CAPTURE_NOT_FOUND', `No capture ${id} in this show.`, {
    captureId: id,
  });
/** No such clip in the show. */
export const clipNotFound = (id: string) =>
  new DomainError('not_found', 'CLIP_NOT_FOUND', `No clip ${id} in this show.`, { clipId: id });
/** No such profile in the show. */
export const profileNotFound = (id: string) =>
  new DomainError('not_found', 'PROFILE_NOT_FOUND', `No tissue profile ${id} in this show.`, {
    profileId: id,
  });
