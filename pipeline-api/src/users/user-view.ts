import type { Role } from './entities/role';
import type { User } from './entities/user.entity';

/** A user as the API shows it (never the password hash). */
export interface UserView {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  disabled: boolean;
  createdAt: string;
}

/** A user with the shows they belong to, for the admin screen. */
export interface AdminUserView extends UserView {
  showIds: string[];
}

/** The public view of a user. */
export const userView = (u: User): UserView => ({
  id: u.id,
  email: u.email,
  displayName: u.displayName,
  role: u.role,
  disabled: !!u.disabledAt,
  createdAt: u.createdAt.toISOString(),
});
