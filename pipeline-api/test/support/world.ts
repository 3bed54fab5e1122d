// Test data made straight in the database (fast), and sign-in through the API (the real path).
import { randomBytes, randomUUID } from 'node:crypto';
import { MikroORM, type EntityManager } from '@mikro-orm/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { User } from '../../src/users/entities/user.entity';
import { Role } from '../../src/users/entities/role';
import { hashPassword } from '../../src/users/users.service';
import { Show } from '../../src/shows/entities/show.entity';
import { Membership } from '../../src/shows/entities/membership.entity';
import { PipelineToken } from '../../src/tokens/entities/pipeline-token.entity';
import type { TokenScope } from '../../src/tokens/token-scope';
import { hashSecret } from '../../src/common/crypto/secret-token';
import { SESSION_COOKIE } from '../../src/auth/session-cookie';

/** The password every test user gets. */
export const TEST_PASSWORD = 'correct horse battery';

let passwordHash: Promise<string> | undefined;

/** A short unique suffix, so tests sharing the database never collide. */
export const uniq = () => randomUUID().slice(0, 8);

/** A random client address for X-Forwarded-For, so per-address limits never carry over. */
export const randomIp = () => `10.${[...randomBytes(3)].join('.')}`;

/** A user made in the database. */
export interface TestUser {
  user: User;
  email: string;
  password: string;
}

/** Builds users, shows, memberships and tokens for a test app, and signs people in. */
export class World {
  constructor(readonly app: NestExpressApplication) {}

  /** The HTTP server for supertest. */
  get server() {
    return this.app.getHttpServer();
  }

  /** A fresh EntityManager on the app's ORM. */
  em(): EntityManager {
    return this.app.get(MikroORM).em.fork();
  }

  /** A show with a unique code. */
  async show(name = 'Test show'): Promise<Show> {
    const show = new Show(`T${uniq()}`, name);
    await this.em().persistAndFlush(show);
    return show;
  }

  /** A user with a role, a member of the given shows. */
  async user(role: Role, shows: Show[] = [], opts: { disabled?: boolean } = {}): Promise<TestUser> {
    passwordHash ??= hashPassword(TEST_PASSWORD);
    const email = `${role}.${uniq()}@example.test`;
    const user = new User(email, `Test ${role}`, await passwordHash, role);
    if (opts.disabled) user.disabledAt = new Date();
    const em = this.em();
    em.persist(user);
    for (const show of shows) em.persist(new Membership(em.getReference(Show, show.id), user));
    await em.flush();
    return { user, email, password: TEST_PASSWORD };
  }

  /** Signs in through the API; returns the Cookie header value for later requests. */
  async signIn(email: string, password = TEST_PASSWORD): Promise<string> {
    const res = await request(this.server)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', randomIp())
      .send({ email, password });
    if (res.status !== 200)
      throw new Error(`sign-in of ${email} answered ${res.status} ${JSON.stringify(res.body)}`);
    return sessionCookie(res.headers['set-cookie']);
  }

  /** A member of `shows` with `role`, signed in. */
  async member(role: Role, shows: Show[]): Promise<TestUser & { cookie: string }> {
    const u = await this.user(role, shows);
    return { ...u, cookie: await this.signIn(u.email) };
  }

  /** The first admin (made by set-up), signed in. */
  async admin(): Promise<string> {
    return this.signIn(process.env.ADMIN_EMAIL as string, process.env.ADMIN_PASSWORD as string);
  }

  /** A pipeline token of `show` made in the database; returns its bearer secret. */
  async token(
    show: Show,
    scopes: TokenScope[],
    opts: { revoked?: boolean } = {},
  ): Promise<{ secret: string; token: PipelineToken }> {
    const em = this.em();
    const creator = await em.findOneOrFail(User, {
      email: User.normaliseEmail(process.env.ADMIN_EMAIL as string),
    });
    const secret = `ovs_${randomBytes(32).toString('base64url')}`;
    const token = new PipelineToken(
      em.getReference(Show, show.id),
      `test ${uniq()}`,
      scopes,
      hashSecret(secret),
      secret.slice(0, 10),
      creator,
    );
    if (opts.revoked) token.revokedAt = new Date();
    await em.persistAndFlush(token);
    return { secret, token };
  }
}

/** The `name=value` of the session cookie from a Set-Cookie header. */
export function sessionCookie(setCookie: string | string[] | undefined): string {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const line = list.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  if (!line) throw new Error(`no ${SESSION_COOKIE} cookie in ${JSON.stringify(setCookie)}`);
  return line.split(';')[0];
}
