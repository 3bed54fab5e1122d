import { Role } from '../users/entities/role';

/**
 * Who may see captures (biometric data) and their consent records besides admins: the technical
 * artists who upload them and learn from them, supervisors who review what they produce, and
 * producers, who read everything in their shows. Animators work with profiles and takes, never
 * with the raw performance, and pipeline tokens have no capture scope.
 */
export const CAPTURE_ROLES: readonly Role[] = [
  Role.TechnicalArtist,
  Role.Supervisor,
  Role.Producer,
];
