import { Controller, Get, Module, Param } from '@nestjs/common';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { Public } from '../src/common/decorators/public.decorator';
import { Allow, AllowToken } from '../src/common/decorators/access.decorators';
import { Role } from '../src/users/entities/role';
import { TokenScope } from '../src/tokens/token-scope';
import type { Show } from '../src/shows/entities/show.entity';

// Probe routes mounted beside the real app, to exercise each kind of rule through the real guard.
@Controller('probe')
class ProbeController {
  @Get('closed')
  closed() {
    return { ok: true };
  }

  @Public()
  @Get('open')
  open() {
    return { ok: true };
  }

  @Allow(Role.Producer)
  @Get('producers')
  producers() {
    return { ok: true };
  }

  @Allow(Role.Supervisor)
  @AllowToken(TokenScope.RenderWrite)
  @Get('shows/:showId/render')
  render(@Param('showId') showId: string) {
    return { showId };
  }
}

@Module({ controllers: [ProbeController] })
class ProbeModule {}

describe('access guard', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  beforeAll(async () => {
    app = await createTestApp({ imports: [ProbeModule] });
    world = new World(app);
    show = await world.show();
  });
  afterAll(async () => {
    await app?.close();
  });

  const get = (path: string, auth?: { cookie?: string; bearer?: string }) => {
    const r = request(world.server).get(path);
    if (auth?.cookie) r.set('Cookie', auth.cookie);
    if (auth?.bearer) r.set('Authorization', `Bearer ${auth.bearer}`);
    return r;
  };

  it('denies a route that no rule allows, to the anonymous (401) and even to an admin (403)', async () => {
    const anonymous = await get('/api/probe/closed');
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.code).toBe('NOT_SIGNED_IN');
    const admin = await get('/api/probe/closed', { cookie: await world.admin() });
    expect(admin.status).toBe(403);
    expect(admin.body.code).toBe('NO_ACCESS_RULE');
  });

  it('lets a route marked public through', async () => {
    const res = await get('/api/probe/open');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('lets the allowed role and admins through, and answers 403 to other roles', async () => {
    const producer = await world.member(Role.Producer, []);
    const animator = await world.member(Role.Animator, []);
    expect((await get('/api/probe/producers', { cookie: producer.cookie })).status).toBe(200);
    expect((await get('/api/probe/producers', { cookie: await world.admin() })).status).toBe(200);
    const denied = await get('/api/probe/producers', { cookie: animator.cookie });
    expect(denied.status).toBe(403);
    expect(denied.body.code).toBe('ROLE_NOT_ALLOWED');
  });

  it('lets a token with the scope through in its own show only', async () => {
    const { secret } = await world.token(show, [TokenScope.RenderWrite]);
    const ok = await get(`/api/probe/shows/${show.id}/render`, { bearer: secret });
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ showId: show.id });
    const other = await world.show();
    const elsewhere = await get(`/api/probe/shows/${other.id}/render`, { bearer: secret });
    expect(elsewhere.status).toBe(404);
    expect(elsewhere.body.code).toBe('SHOW_NOT_FOUND');
  });

  it('answers 403 to a token of the show without the scope', async () => {
    const { secret } = await world.token(show, [TokenScope.TakesRead, TokenScope.JobsSubmit]);
    const res = await get(`/api/probe/shows/${show.id}/render`, { bearer: secret });
    expect(res.status).toBe(403);
    expect(res.body).toMatchObject({
      code: 'TOKEN_SCOPE_MISSING',
      details: { scope: 'render:write' },
    });
  });

  it('answers 403 to a token on a route for people only', async () => {
    const { secret } = await world.token(show, [TokenScope.RenderWrite]);
    const res = await get('/api/probe/producers', { bearer: secret });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('TOKEN_NOT_ALLOWED');
  });

  it('checks show membership before the role: a non-member learns nothing', async () => {
    const outsider = await world.member(Role.Supervisor, [await world.show()]);
    const member = await world.member(Role.Supervisor, [show]);
    expect(
      (await get(`/api/probe/shows/${show.id}/render`, { cookie: member.cookie })).status,
    ).toBe(200);
    const hidden = await get(`/api/probe/shows/${show.id}/render`, { cookie: outsider.cookie });
    const missing = await get('/api/probe/shows/00000000-0000-4000-8000-000000000000/render', {
      cookie: outsider.cookie,
    });
    expect(hidden.status).toBe(404);
    expect(missing.status).toBe(404);
    expect(hidden.body).toEqual({
      ...missing.body,
      message: missing.body.message.replace('00000000-0000-4000-8000-000000000000', show.id),
      details: { showId: show.id },
    });
  });
});
