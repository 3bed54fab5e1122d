// Public face of the auth feature: who is signed in, what they may do, the current show.
export { getMe, getMeQueryOptions, ME_QUERY_KEY, useMe } from './api/get-me';
export type { SessionUser } from './api/session-user';
export { can, isRole, ROLE_LABELS, ROLES, type Action, type Role } from './permissions';
export { useSession, type Session } from './hooks/use-session';
export { usePermissions, type Permissions } from './hooks/use-permissions';
// Re-exported so pages get the session and the current show from one place.
export { useCurrentShow, type CurrentShow } from '@/features/shows';
