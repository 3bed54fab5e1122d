// Sessions a process looked up a moment ago are reused for a few seconds (auth/session-cache.ts),
// and so are show checks that passed (shows/show-access-cache.ts); ending a session or removing a
// member must still take effect at once in that process.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { Role } from '../src/users/entities/role';

describe('session lookups reused for a few seconds', () => {
  let app: NestExpressApplication;
  let world: World;
  const me = (cookie: string) => request(world.server).get('/api/auth/me').set('Cookie', cookie);

  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
  });
  afterAll(async () => {
    await app.close();
  });

  it('ends a session at sign-out even when it was used a moment before', async () => {
    const { email } = await world.user(Role.Animator);
    const cookie = await world.signIn(email);
    expect((await me(cookie)).status).toBe(200);
    expect((await me(cookie)).status).toBe(200);
    const out = await request(world.server).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect((await me(cookie)).status).toBe(401);
  });

  it('ends the sessions of a user an admin disables, used a moment before', async () => {
    const { email, user } = await world.user(Role.Producer);
    const cookie = await world.signIn(email);
    expect((await me(cookie)).body.user.email).toBe(email);
    const admin = await world.admin();
    const off = await request(world.server)
      .patch(`/api/admin/users/${user.id}`)
      .set('Cookie', admin)
      .send({ disabled: true });
    expect(off.status).toBe(200);
    expect((await me(cookie)).status).toBe(401);
  });

  it('drops a removed member’s show access at once, though session and show check were reused', async () => {
    const show = await world.show();
    const { email, user } = await world.user(Role.Animator, [show]);
    const cookie = await world.signIn(email);
    const shots = () =>
      request(world.server).get(`/api/shows/${show.id}/shots`).set('Cookie', cookie);
    expect((await shots()).status).toBe(200);
    // Reused: the same session and the same show check, both cached a moment ago.
    expect((await shots()).status).toBe(200);
    const admin = await world.admin();
    const removed = await request(world.server)
      .delete(`/api/admin/shows/${show.id}/members/${user.id}`)
      .set('Cookie', admin);
    expect(removed.status).toBe(204);
    expect((await shots()).status).toBe(404);
  });
});
