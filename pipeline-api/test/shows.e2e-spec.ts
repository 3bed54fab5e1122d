import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { uniq, World } from './support/world';
import { Role } from '../src/users/entities/role';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';

describe('shows and memberships', () => {
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

  const get = (path: string, cookie: string) =>
    request(world.server).get(path).set('Cookie', cookie);

  it("lists only the caller's shows; admins see every show", async () => {
    const [a, b, c] = [await world.show('A'), await world.show('B'), await world.show('C')];
    const member = await world.member(Role.Animator, [a, b]);
    const mine = await get('/api/shows', member.cookie);
    expect(mine.status).toBe(200);
    expect(mine.body.map((s: { id: string }) => s.id).sort()).toEqual([a.id, b.id].sort());
    const all = (await get('/api/shows', admin)).body.map((s: { id: string }) => s.id);
    expect(all).toEqual(expect.arrayContaining([a.id, b.id, c.id]));
  });

  it('answers 404 to a non-member exactly as for a show that does not exist', async () => {
    const [mine, theirs] = [await world.show(), await world.show()];
    const member = await world.member(Role.Producer, [mine]);
    const hidden = await get(`/api/shows/${theirs.id}`, member.cookie);
    const missing = await get('/api/shows/00000000-0000-4000-8000-000000000000', member.cookie);
    expect(hidden.status).toBe(404);
    expect(missing.status).toBe(404);
    const strip = (b: { message: string }, id: string) => ({
      ...b,
      message: b.message.replace(id, '<id>'),
      details: undefined,
    });
    expect(strip(hidden.body, theirs.id)).toEqual(
      strip(missing.body, '00000000-0000-4000-8000-000000000000'),
    );
    expect((await get(`/api/shows/${theirs.id}/members`, member.cookie)).status).toBe(404);
    expect((await get(`/api/shows/${mine.id}`, member.cookie)).status).toBe(200);
  });

  it('creates shows with unique codes, renames and archives them', async () => {
    const code = `c${uniq()}`;
    const created = await request(world.server)
      .post('/api/admin/shows')
      .set('Cookie', admin)
      .send({ code, name: 'Night Market' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      code: code.toUpperCase(),
      name: 'Night Market',
      archived: false,
    });
    const dup = await request(world.server)
      .post('/api/admin/shows')
      .set('Cookie', admin)
      .send({ code: code.toUpperCase(), name: 'Again' });
    expect(dup.status).toBe(409);
    expect(dup.body.code).toBe('SHOW_CODE_TAKEN');
    const id = created.body.id as string;
    const member = await world.user(Role.Animator);
    await request(world.server)
      .post(`/api/admin/shows/${id}/members`)
      .set('Cookie', admin)
      .send({ userId: member.user.id })
      .expect(204);
    const cookie = await world.signIn(member.email);
    const renamed = await request(world.server)
      .patch(`/api/admin/shows/${id}`)
      .set('Cookie', admin)
      .send({ name: 'Night Market II', archived: true });
    expect(renamed.body).toMatchObject({ name: 'Night Market II', archived: true });
    expect((await get('/api/shows', cookie)).body).toEqual([]);
    expect(
      (await get('/api/shows?archived=true', cookie)).body.map((s: { id: string }) => s.id),
    ).toEqual([id]);
    const actions = (await world.em().find(AuditEvent, { showId: id })).map((e) => e.action).sort();
    expect(actions).toEqual(['membership.added', 'show.archived', 'show.created', 'show.renamed']);
  });

  it('adds and removes members; removal takes the show away at once', async () => {
    const show = await world.show('Members');
    const person = await world.user(Role.Supervisor);
    const cookie = await world.signIn(person.email);
    const add = () =>
      request(world.server)
        .post(`/api/admin/shows/${show.id}/members`)
        .set('Cookie', admin)
        .send({ userId: person.user.id });
    expect((await add()).status).toBe(204);
    expect((await add()).body.code).toBe('MEMBERSHIP_EXISTS');
    const members = await get(`/api/shows/${show.id}/members`, cookie);
    expect(members.body).toEqual([
      expect.objectContaining({ userId: person.user.id, role: 'supervisor' }),
    ]);
    const removed = await request(world.server)
      .delete(`/api/admin/shows/${show.id}/members/${person.user.id}`)
      .set('Cookie', admin);
    expect(removed.status).toBe(204);
    expect((await get(`/api/shows/${show.id}`, cookie)).status).toBe(404);
    const again = await request(world.server)
      .delete(`/api/admin/shows/${show.id}/members/${person.user.id}`)
      .set('Cookie', admin);
    expect(again.body.code).toBe('MEMBERSHIP_NOT_FOUND');
    expect(
      await world.em().count(AuditEvent, {
        showId: show.id,
        action: 'membership.removed',
        objectId: person.user.id,
      }),
    ).toBe(1);
  });

  it('changes a role and audits it; refuses to demote the last admin', async () => {
    const person = await world.user(Role.Animator);
    const res = await request(world.server)
      .patch(`/api/admin/users/${person.user.id}`)
      .set('Cookie', admin)
      .send({ role: 'producer' });
    expect(res.body.role).toBe('producer');
    const [event] = await world
      .em()
      .find(AuditEvent, { action: 'user.role_changed', objectId: person.user.id });
    expect(event.details).toEqual({ from: 'animator', to: 'producer' });
    const users = await get('/api/admin/users', admin);
    const self = users.body.find((u: { email: string }) => u.email === process.env.ADMIN_EMAIL);
    expect(JSON.stringify(users.body)).not.toMatch(/argon2|passwordHash/);
    const demote = await request(world.server)
      .patch(`/api/admin/users/${self.id}`)
      .set('Cookie', admin)
      .send({ role: 'animator' });
    expect(demote.status).toBe(409);
    expect(demote.body.code).toBe('LAST_ADMIN');
  });
});
