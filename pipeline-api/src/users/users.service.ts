import { randomBytes } from 'node:crypto';
import { EntityManager } from '@mikro-orm/core';
import { hash } from '@node-rs/argon2';
import { User } from './entities/user.entity';
import { Role } from './entities/role';

/** Argon2id settings (the library's defaults are argon2id; memory in KiB). */
export const PASSWORD_HASH_OPTIONS = { memoryCost: 19_456, timeCost: 2, parallelism: 1 };

/** Hashes a password with argon2id. */
export const hashPassword = (password: string) => hash(password, PASSWORD_HASH_OPTIONS);

/**
 * Creates the first admin when there is no admin yet. Returns the created user and the password
 * to print once (generated unless one was given), or null when an admin exists.
 */
export async function ensureFirstAdmin(
  em: EntityManager,
  email: string,
  password?: string,
): Promise<{ user: User; password: string } | null> {
  if ((await em.count(User, { role: Role.Admin })) > 0) return null;
  const pw = password ?? randomBytes(15).toString('base64url');
  const user = new User(email, 'Administrator', await hashPassword(pw), Role.Admin);
  await em.persistAndFlush(user);
  return { user, password: pw };
}
