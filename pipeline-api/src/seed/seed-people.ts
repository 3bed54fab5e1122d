// The demo's people (one per role, a second animator) with their demo-only passwords, the show,
// and its memberships.
import { Role } from '../users/entities/role';
import { User } from '../users/entities/user.entity';
import { hashPassword } from '../users/users.service';
import { Membership } from '../shows/entities/membership.entity';
import { DemoDataError, type DemoUser } from './demo-show-file';
import { demoUser, type SeedContext } from './seed-context';

/** The role of a product role name as the demo file writes it ("technical artist"). */
export function roleOf(name: string, where: string): Role {
  const value = name.trim().toLowerCase().replace(/\s+/g, '_');
  const role = Object.values(Role).find((r) => r === value);
  if (!role) {
    throw new DemoDataError(
      `role "${name}" is none of ${Object.values(Role).join(', ')}`,
      `${where}.role`,
    );
  }
  return role;
}

/** Creates the users (passwords hashed as at sign-up). */
export async function seedUsers(ctx: SeedContext): Promise<void> {
  for (const [i, u] of ctx.demo.users.entries()) {
    const user = new User(
      u.email,
      u.displayName,
      await hashPassword(u.demoPassword),
      roleOf(u.role, `users[${i}]`),
    );
    ctx.em.persist(user);
    ctx.users.set(user.email, user);
  }
}

/** Creates the show (under a fixed id, see seed-demo.ts) and its memberships. */
export function seedShow(ctx: SeedContext, showId: string): void {
  ctx.show.id = showId;
  ctx.em.persist(ctx.show);
  for (const [i, email] of ctx.demo.members.entries()) {
    ctx.em.persist(new Membership(ctx.show, demoUser(ctx, email, `members[${i}]`)));
  }
}

/** The first demo user with a role: who uploads files and submits jobs in the demo. */
export function firstWithRole(users: DemoUser[], role: Role): DemoUser {
  const found = users.find((u, i) => roleOf(u.role, `users[${i}]`) === role);
  if (!found) throw new DemoDataError(`has no user with the role ${role}`, 'users');
  return found;
}
