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
/** A character whose file has not passed its check cannot be used yet. */
export const characterNotReady = (c: { id: string; name: string }) =>
  new DomainError('conflict', 'CHARACTER_NOT_READY', `Character ${c.name} is not ready.`, {
    characterId: c.id,
  });
/** A clip whose file has not passed its check cannot be used yet. */
export const clipNotReady = (c: { id: string; name: string }) =>
  new DomainError('conflict', 'CLIP_NOT_READY', `Clip ${c.name} is not ready.`, { clipId: c.id });
