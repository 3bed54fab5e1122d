import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { randomIp, sessionCookie, uniq, World } from './support/world';
import { linkToken, waitForMail } from './support/mail-sink';
import { Role } from '../src/users/entities/role';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { EmailMessage, EmailStatus } from '../src/mail/entities/email-message.entity';

describe('admin invitations by e-mail', () => {
  let app: NestExpressApplication;
  let world: World;
  let admin: string;
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    admin = await world.admin();
  });
  afterAll(async () => {
    await app?.close();
  });

  const post = (path: string, body: object) =>
    request(world.server).post(path).set('X-Forwarded-For', randomIp()).send(body);

  it('invites with a role and shows; the e-mailed link creates the user, signed in', async () => {
    const show = await world.show('Invited show');
    const email = `new.${uniq()}@example.test`;
    const invited = await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email, role: 'supervisor', showIds: [show.id] });
    expect(invited.status).toBe(201);
    expect(invited.body).toMatchObject({ email, role: 'supervisor', shows: [{ id: show.id }] });
    expect(JSON.stringify(invited.body)).not.toMatch(/token/i);

    const mail = await waitForMail(email, /invited to Overshoot/);
    expect(mail.text).toContain('as supervisor on Invited show');
    const token = linkToken(mail.text, '/accept-invitation');

    const looked = await post('/api/auth/invitations/lookup', { token });
    expect(looked.status).toBe(200);
    expect(looked.body).toMatchObject({ email, role: 'supervisor' });

    const accepted = await post('/api/auth/invitations/accept', {
      token,
      displayName: 'Robin Vale',
      password: 'a good long password',
    });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({
      email,
      role: 'supervisor',
      displayName: 'Robin Vale',
    });
    const cookie = sessionCookie(accepted.headers['set-cookie']);
    const shows = await request(world.server).get('/api/shows').set('Cookie', cookie);
    expect(shows.body.map((s: { id: string }) => s.id)).toEqual([show.id]);
    expect(
      (await post('/api/auth/sign-in', { email, password: 'a good long password' })).status,
    ).toBe(200);

    const reused = await post('/api/auth/invitations/accept', {
      token,
      displayName: 'Someone',
      password: 'another long password',
    });
    expect(reused.status).toBe(400);
    expect(reused.body.code).toBe('LINK_INVALID');

    const em = world.em();
    const invitedEvent = await em.findOneOrFail(AuditEvent, {
      action: 'user.invited',
      objectId: invited.body.id,
    });
    expect(invitedEvent).toMatchObject({
      actorLabel: process.env.ADMIN_EMAIL,
      details: { email, role: 'supervisor', showIds: [show.id] },
    });
    const joined = await em.findOneOrFail(AuditEvent, {
      action: 'user.joined',
      objectId: accepted.body.user.id,
    });
    expect(joined.actorLabel).toBe(email);
    const record = await em.findOneOrFail(EmailMessage, { to: email, kind: 'invitation' });
    expect(record.status).toBe(EmailStatus.Sent);
    expect(record.attempts).toBe(1);
    expect(record.sentAt).toBeInstanceOf(Date);
  });

  it('replaces an open invitation when the same address is invited again', async () => {
    const email = `again.${uniq()}@example.test`;
    await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email, role: 'animator', showIds: [] });
    const first = linkToken((await waitForMail(email, /invited/)).text, '/accept-invitation');
    await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email, role: 'producer', showIds: [] });
    expect((await post('/api/auth/invitations/lookup', { token: first })).body.code).toBe(
      'LINK_INVALID',
    );
    const open = await request(world.server).get('/api/admin/invitations').set('Cookie', admin);
    expect(
      open.body
        .filter((i: { email: string }) => i.email === email)
        .map((i: { role: string }) => i.role),
    ).toEqual(['producer']);
  });

  it('refuses to invite an address that has an account, or to an unknown show', async () => {
    const { email } = await world.user(Role.Animator);
    const dup = await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email, role: 'animator', showIds: [] });
    expect(dup.status).toBe(409);
    expect(dup.body.code).toBe('USER_EXISTS');
    const missing = '00000000-0000-4000-8000-000000000000';
    const bad = await request(world.server)
      .post('/api/admin/invitations')
      .set('Cookie', admin)
      .send({ email: `x.${uniq()}@example.test`, role: 'animator', showIds: [missing] });
    expect(bad.status).toBe(404);
    expect(bad.body).toMatchObject({ code: 'SHOW_NOT_FOUND', details: { showIds: [missing] } });
  });
});
