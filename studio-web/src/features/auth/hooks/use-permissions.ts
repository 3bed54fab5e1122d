import { can, type Action, type Role } from '../permissions';
import { useSession } from './use-session';

/** What the signed-in user may do: `can('upload')`, with their role. */
export interface Permissions {
  role: Role;
  can: (action: Action) => boolean;
}

/** The signed-in user's permissions (see `can` for the table); signed-in pages only. */
export function usePermissions(): Permissions {
  const { role } = useSession();
  return { role, can: (action: Action) => can(role, action) };
}
