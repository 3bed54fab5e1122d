import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { PipelineToken } from '../src/tokens/entities/pipeline-token.entity';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { hashSecret } from '../src/common/crypto/secret-token';
import type { Show } from '../src/shows/entities/show.entity';

describe('pipeline tokens', () => {
  let app: NestExpressApplication;
  let world: World;
  let admin: string;
  let show: Show;
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    admin = await world.admin();
    show = await world.show('Token show');
  });
  afterAll(async () => {
    await app?.close();
  });

  const bearer = (path: string, secret: string) =>
    request(world.server).get(path).set('Authorization', `Bearer ${secret}`);

  const create = async (scopes: string[]) => {
    const res = await request(world.server)
      .post(`/api/admin/shows/${show.id}/tokens`)
      .set('Cookie', admin)
      .send({ name: 'render farm', scopes });
    expect(res.status).toBe(201);
    return res.body as { id: string; secret: string; hint: string; scopes: string[] };
  };

  it('shows the secret once at creation and stores only its hash', async () => {
    const created = await create(['render:write', 'takes:read']);
    expect(created.secret).toMatch(/^ovs_[A-Za-z0-9_-]{43}$/);
    expect(created.scopes).toEqual(['render:write', 'takes:read']);
    expect(created.secret.startsWith(created.hint)).toBe(true);
    const listed = await request(world.server)
      .get(`/api/admin/shows/${show.id}/tokens`)
      .set('Cookie', admin);
    const row = listed.body.find((t: { id: string }) => t.id === created.id);
    expect(row).toMatchObject({ name: 'render farm', hint: created.hint, lastUsedAt: null });
    expect(JSON.stringify(listed.body)).not.toContain(created.secret);
    const stored = await world.em().findOneOrFail(PipelineToken, created.id);
    expect(stored.tokenHash).toBe(hashSecret(created.secret));
    const audit = await world
      .em()
      .find(AuditEvent, { action: 'token.created', objectId: created.id });
    expect(audit).toHaveLength(1);
    expect(audit[0].showId).toBe(show.id);
  });

  it('authenticates a script by bearer token in its show and records its use', async () => {
    const created = await create(['takes:read']);
    const res = await bearer(`/api/shows/${show.id}`, created.secret);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: show.id, name: 'Token show' });
    const list = await bearer('/api/shows', created.secret);
    expect(list.body.map((s: { id: string }) => s.id)).toEqual([show.id]);
    const me = await bearer('/api/auth/me', created.secret);
    expect(me.body).toEqual({
      kind: 'token',
      token: { id: created.id, name: 'render farm', showId: show.id, scopes: ['takes:read'] },
    });
    expect((await world.em().findOneOrFail(PipelineToken, created.id)).lastUsedAt).toBeInstanceOf(
      Date,
    );
  });

  it('answers 404 for another show, with the body of a show that does not exist', async () => {
    const created = await create(['takes:read']);
    const other = await world.show('Other show');
    const foreign = await bearer(`/api/shows/${other.id}`, created.secret);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual({
      code: 'SHOW_NOT_FOUND',
      message: `No show ${other.id}, or you are not a member of it.`,
      details: { showId: other.id },
    });
    const unknownId = '00000000-0000-4000-8000-000000000000';
    const missing = await bearer(`/api/shows/${unknownId}`, created.secret);
    expect(missing.body).toEqual({
      ...foreign.body,
      message: foreign.body.message.replace(other.id, unknownId),
      details: { showId: unknownId },
    });
  });

  it('answers 401 once revoked, and the revocation is audited', async () => {
    const created = await create(['jobs:submit']);
    expect((await bearer(`/api/shows/${show.id}`, created.secret)).status).toBe(200);
    const revoked = await request(world.server)
      .delete(`/api/admin/shows/${show.id}/tokens/${created.id}`)
      .set('Cookie', admin);
    expect(revoked.status).toBe(204);
    const res = await bearer(`/api/shows/${show.id}`, created.secret);
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('TOKEN_INVALID');
    expect(
      await world.em().count(AuditEvent, { action: 'token.revoked', objectId: created.id }),
    ).toBe(1);
  });

  it('answers 401 to a made-up or malformed token, never treating it as anonymous', async () => {
    expect((await bearer(`/api/shows/${show.id}`, 'ovs_made-up-secret')).body.code).toBe(
      'TOKEN_INVALID',
    );
    const malformed = await request(world.server)
      .get('/api/shows')
      .set('Authorization', 'Basic abc');
    expect(malformed.status).toBe(401);
    expect(malformed.body.code).toBe('TOKEN_INVALID');
  });

  it('keeps tokens off admin routes', async () => {
    const created = await create(['jobs:submit', 'render:write', 'takes:read']);
    const res = await bearer(`/api/admin/shows/${show.id}/tokens`, created.secret);
    expect(res.status).toBe(403);
  });

  it('rejects an unknown scope and an empty scope list', async () => {
    for (const scopes of [['delete:everything'], []]) {
      const res = await request(world.server)
        .post(`/api/admin/shows/${show.id}/tokens`)
        .set('Cookie', admin)
        .send({ name: 'x', scopes });
      expect(res.status).toBe(400);
      expect(res.body.details[0].field).toBe('scopes');
    }
  });
});
