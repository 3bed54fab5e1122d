import { MikroORM } from '@mikro-orm/mariadb';
import { verify } from '@node-rs/argon2';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { validateEnv } from '../src/config/env.validation';
import { ormConfig } from '../src/database/mikro-orm.config';
import { ensureFirstAdmin } from '../src/users/users.service';
import { User } from '../src/users/entities/user.entity';
import { Role } from '../src/users/entities/role';

describe('database set-up', () => {
  let orm: MikroORM;
  beforeAll(async () => {
    orm = await MikroORM.init(ormConfig(validateEnv(process.env)));
    await orm.getMigrator().up();
  });
  afterAll(async () => {
    await orm?.close();
  });

  it('has migrations that match the entities exactly', async () => {
    const diff = await orm.getSchemaGenerator().getUpdateSchemaSQL({ wrap: false });
    expect(diff.trim()).toBe('');
  });

  it('has no pending migration after set-up', async () => {
    expect(await orm.getMigrator().getPendingMigrations()).toEqual([]);
  });

  it('creates the first admin once, with an argon2id hash of the given password', async () => {
    const em = orm.em.fork();
    // `npm test` set-up already created the admin from ADMIN_EMAIL / ADMIN_PASSWORD.
    const admin = await em.findOneOrFail(User, { email: process.env.ADMIN_EMAIL as string });
    expect(admin.role).toBe(Role.Admin);
    expect(admin.passwordHash.startsWith('$argon2id$')).toBe(true);
    expect(await verify(admin.passwordHash, process.env.ADMIN_PASSWORD as string)).toBe(true);
    expect(await verify(admin.passwordHash, 'not-the-password')).toBe(false);
    expect(await ensureFirstAdmin(em, 'second-admin@overshoot.localhost')).toBeNull();
    expect(await em.count(User, { role: Role.Admin })).toBe(1);
  });

  it('stores e-mail addresses normalised and unique', async () => {
    const em = orm.em.fork();
    const email = `Case.Test+${Date.now()}@Example.Test `;
    em.persist(new User(email, 'Case Test', 'x', Role.Animator));
    await em.flush();
    const found = await em.fork().findOne(User, { email: User.normaliseEmail(email) });
    expect(found?.email).toBe(email.trim().toLowerCase());
    const dup = orm.em.fork();
    dup.persist(new User(email.toUpperCase(), 'Dup', 'x', Role.Animator));
    await expect(dup.flush()).rejects.toThrow(/Duplicate entry/);
  });
});
