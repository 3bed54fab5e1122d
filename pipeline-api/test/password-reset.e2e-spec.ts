import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { randomIp, TEST_PASSWORD, uniq, World } from './support/world';
import { linkToken, sinkMessages, waitForMail } from './support/mail-sink';
import { Role } from '../src/users/entities/role';
import { PasswordReset } from '../src/auth/entities/password-reset.entity';
import { EmailMessage } from '../src/mail/entities/email-message.entity';
import { hashSecret } from '../src/common/crypto/secret-token';

describe('password reset by e-mailed link', () => {
  let app: NestExpressApplication;
  let world: World;
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
  });
  afterAll(async () => {
    await app?.close();
  });

  const ask = (email: string) =>
    request(world.server)
      .post('/api/auth/password-reset')
      .set('X-Forwarded-For', randomIp())
      .send({ email });
  const confirm = (token: string, password: string) =>
    request(world.server)
      .post('/api/auth/password-reset/confirm')
      .set('X-Forwarded-For', randomIp())
      .send({ token, password });
  const signIn = (email: string, password: string) =>
    request(world.server)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', randomIp())
      .send({ email, password });

  it('e-mails a single-use link that sets a new password and ends old sessions', async () => {
    const { email, user } = await world.user(Role.Animator);
    const oldSession = await world.signIn(email);
    const asked = await ask(email);
    expect(asked.status).toBe(202);
    const mail = await waitForMail(email, /Reset your Overshoot password/);
    expect(mail.text).toContain(
      `${process.env.PUBLIC_URL ?? 'http://127.0.0.1:3000'}/reset-password#token=`,
    );
    const token = linkToken(mail.text, '/reset-password');
    // Stored hashed with a one-hour expiry.
    const [row] = await world.em().find(PasswordReset, { user: user.id });
    expect(row.tokenHash).toBe(hashSecret(token));
    expect(Math.round((row.expiresAt.getTime() - row.createdAt.getTime()) / 60_000)).toBe(60);

    expect((await confirm(token, 'a brand new password')).status).toBe(204);
    expect((await signIn(email, TEST_PASSWORD)).status).toBe(401);
    expect((await signIn(email, 'a brand new password')).status).toBe(200);
    expect((await request(world.server).get('/api/auth/me').set('Cookie', oldSession)).status).toBe(
      401,
    );

    const again = await confirm(token, 'yet another password');
    expect(again.status).toBe(400);
    expect(again.body.code).toBe('LINK_INVALID');
  });

  it('answers an unknown address exactly like a known one, and sends nothing', async () => {
    const { email } = await world.user(Role.Producer);
    const nobody = `nobody.${uniq()}@example.test`;
    const known = await ask(email);
    const unknown = await ask(nobody);
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await waitForMail(email, /Reset your Overshoot password/);
    expect((await sinkMessages()).some((m) => m.to.includes(nobody))).toBe(false);
    expect(await world.em().count(EmailMessage, { to: nobody })).toBe(0);
  });

  it('refuses an expired link', async () => {
    const { email, user } = await world.user(Role.Supervisor);
    await ask(email);
    const token = linkToken((await waitForMail(email, /Reset your/)).text, '/reset-password');
    await world
      .em()
      .nativeUpdate(PasswordReset, { user: user.id }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await confirm(token, 'a brand new password');
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('LINK_INVALID');
    expect((await signIn(email, TEST_PASSWORD)).status).toBe(200);
  });

  it('refuses a made-up link and a short password', async () => {
    expect((await confirm('x'.repeat(43), 'a brand new password')).body.code).toBe('LINK_INVALID');
    const short = await confirm('x'.repeat(43), 'short');
    expect(short.status).toBe(400);
    expect(short.body.details[0].field).toBe('password');
  });
});
