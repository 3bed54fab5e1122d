import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { randomIp, sessionCookie, World } from './support/world';
import { Role } from '../src/users/entities/role';
import { Session } from '../src/auth/entities/session.entity';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { hashSecret } from '../src/common/crypto/secret-token';

describe('sign-in, sessions and sign-out', () => {
  let app: NestExpressApplication;
  let world: World;
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
  });
  afterAll(async () => {
    await app?.close();
  });

  const signIn = (email: string, password: string) =>
    request(world.server)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', randomIp())
      .send({ email, password });

  it('signs in with e-mail and password and answers who is signed in', async () => {
    const { email, password, user } = await world.user(Role.Supervisor);
    const res = await signIn(` ${email.toUpperCase()} `, password);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      kind: 'user',
      user: expect.objectContaining({ id: user.id, email, role: 'supervisor' }),
    });
    expect(JSON.stringify(res.body)).not.toContain('argon2');
    const me = await request(world.server)
      .get('/api/auth/me')
      .set('Cookie', sessionCookie(res.headers['set-cookie']));
    expect(me.status).toBe(200);
    expect(me.body.user.id).toBe(user.id);
  });

  it('sets an httpOnly, SameSite=Strict cookie on /api, not Secure unless configured', async () => {
    const { email, password } = await world.user(Role.Animator);
    const res = await signIn(email, password);
    const line = (res.headers['set-cookie'] as unknown as string[])[0];
    expect(line).toMatch(/^overshoot_session=[A-Za-z0-9_-]{43};/);
    expect(line).toMatch(/; HttpOnly/);
    expect(line).toMatch(/; SameSite=Strict/);
    expect(line).toMatch(/; Path=\/api/);
    expect(line).not.toMatch(/; Secure/);
  });

  it('marks the cookie Secure when COOKIE_SECURE is set', async () => {
    const secureApp = await createTestApp({ env: { COOKIE_SECURE: true } });
    try {
      const { email, password } = await new World(secureApp).user(Role.Animator);
      const res = await request(secureApp.getHttpServer())
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', randomIp())
        .send({ email, password });
      expect(res.status).toBe(200);
      expect((res.headers['set-cookie'] as unknown as string[])[0]).toMatch(/; Secure/);
    } finally {
      await secureApp.close();
    }
  });

  it('stores only the SHA-256 of the session secret', async () => {
    const { email, user } = await world.user(Role.Producer);
    const cookie = await world.signIn(email);
    const secret = cookie.split('=')[1];
    const sessions = await world.em().find(Session, { user: user.id });
    expect(sessions).toHaveLength(1);
    expect(sessions[0].tokenHash).toBe(hashSecret(secret));
    expect(sessions[0].tokenHash).not.toContain(secret);
    expect(sessions[0].absoluteExpiresAt.getTime()).toBeGreaterThan(
      sessions[0].idleExpiresAt.getTime() - 1000,
    );
  });

  it('answers a wrong password and an unknown e-mail alike, and audits both', async () => {
    const { email, user } = await world.user(Role.Animator);
    const wrong = await signIn(email, 'not the password at all');
    const unknown = await signIn(`nobody.${user.id}@example.test`, 'not the password at all');
    expect(wrong.status).toBe(401);
    expect(wrong.body).toEqual({
      code: 'INVALID_CREDENTIALS',
      message: 'Wrong e-mail or password.',
    });
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.headers['set-cookie']).toBeUndefined();
    const events = await world
      .em()
      .find(AuditEvent, { action: 'auth.sign_in_failed', actorLabel: email });
    expect(events.map((e) => e.details)).toEqual([{ reason: 'wrong_password' }]);
  });

  it('signs out: the session ends and the cookie is cleared', async () => {
    const { email, user } = await world.user(Role.TechnicalArtist);
    const cookie = await world.signIn(email);
    const out = await request(world.server).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(
      /overshoot_session=;.*Expires=Thu, 01 Jan 1970/,
    );
    const me = await request(world.server).get('/api/auth/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
    expect(me.body.code).toBe('NOT_SIGNED_IN');
    const [session] = await world.em().find(Session, { user: user.id });
    expect(session.revokedAt).toBeInstanceOf(Date);
  });

  it('refuses a session past its idle expiry', async () => {
    const { email, user } = await world.user(Role.Animator);
    const cookie = await world.signIn(email);
    await world
      .em()
      .nativeUpdate(Session, { user: user.id }, { idleExpiresAt: new Date(Date.now() - 1000) });
    expect((await request(world.server).get('/api/auth/me').set('Cookie', cookie)).status).toBe(
      401,
    );
  });

  it('refuses a disabled user at sign-in', async () => {
    const { email, password } = await world.user(Role.Animator, [], { disabled: true });
    const res = await signIn(email, password);
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('ACCOUNT_DISABLED');
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('ends the sessions of a user an admin disables, and lets them back after enabling', async () => {
    const { email, user } = await world.user(Role.Supervisor);
    const cookie = await world.signIn(email);
    const admin = await world.admin();
    const off = await request(world.server)
      .patch(`/api/admin/users/${user.id}`)
      .set('Cookie', admin)
      .send({ disabled: true });
    expect(off.status).toBe(200);
    expect(off.body.disabled).toBe(true);
    expect((await request(world.server).get('/api/auth/me').set('Cookie', cookie)).status).toBe(
      401,
    );
    expect((await signIn(email, 'correct horse battery')).status).toBe(403);
    const on = await request(world.server)
      .patch(`/api/admin/users/${user.id}`)
      .set('Cookie', admin)
      .send({ disabled: false });
    expect(on.body.disabled).toBe(false);
    expect((await signIn(email, 'correct horse battery')).status).toBe(200);
    const actions = (
      await world.em().find(AuditEvent, { objectId: user.id }, { orderBy: { createdAt: 'asc' } })
    ).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(['user.disabled', 'user.enabled']));
  });

  it('rejects a malformed sign-in body with the fields named', async () => {
    const res = await signIn('not-an-email', '');
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('VALIDATION_FAILED');
    expect(res.body.details.map((d: { field: string }) => d.field).sort()).toEqual([
      'email',
      'password',
    ]);
  });
});
