import type { Principal } from '../auth/principal';
import { CAPTURE_ROLES } from '../library/capture-roles';
import { Role } from '../users/entities/role';
import type { ShowEventType } from './show-event';

/**
 * Whether a watcher of the show receives an event. Upload progress goes only to those who may
 * read the upload list (captures are biometric data, and an upload's existence is part of it);
 * job and take events go to every member and token of the show.
 */
export function mayReceive(principal: Principal, type: ShowEventType): boolean {
  if (type !== 'asset.progress') return true;
  if (principal.kind !== 'user') return false;
  return principal.user.role === Role.Admin || CAPTURE_ROLES.includes(principal.user.role);
}
