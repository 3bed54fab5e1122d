import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World, type TestUser } from './support/world';
import { library } from './support/production';
import { Role } from '../src/users/entities/role';
import { Shot } from '../src/shots/entities/shot.entity';
import { Clip } from '../src/library/entities/clip.entity';
import { TokenScope } from '../src/tokens/token-scope';
import type { Show } from '../src/shows/entities/show.entity';

describe('shots: create and edit with checks, render state', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let producer: string;
  let animator: TestUser;
  let lib: { characterId: string; clipId: string };
  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Shot show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    producer = (await world.member(Role.Producer, [show])).cookie;
    animator = await world.user(Role.Animator, [show]);
    // 240 frames at 24 fps: the clip's last frame is at 239 / 24 s.
    lib = await library(world, show.id, ta.user, { frames: 240, fps: 24 });
  });
  afterAll(async () => {
    await app?.close();
  });

  const shots = `/api/shows/${'SHOW'}/shots`;
  const url = (path = '') => shots.replace('SHOW', show.id) + path;
  const create = (body: object, cookie = ta.cookie) =>
    request(world.server).post(url()).set('Cookie', cookie).send(body);
  const base = () => ({
    sequence: 'SQ010',
    code: `SQ010_${Math.floor(Math.random() * 1e6)}`,
    frameStart: 0,
    frameEnd: 100,
    fps: 24,
  });
  const count = () => world.em().count(Shot, { show: show.id });

  it('creates a shot with its character, clip, assignees and due date', async () => {
    const res = await create({
      ...base(),
      characterId: lib.characterId,
      clipId: lib.clipId,
      assigneeIds: [animator.user.id],
      dueDate: '2030-01-31',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      sequence: 'SQ010',
      frameStart: 0,
      frameEnd: 100,
      characterId: lib.characterId,
      clipId: lib.clipId,
      assignees: [{ id: animator.user.id }],
      dueDate: '2030-01-31',
      renderState: 'not_started',
      reviewState: null,
      late: false,
    });
    const got = await request(world.server)
      .get(url(`/${res.body.id}`))
      .set('Cookie', producer);
    // Timestamps are stored to the second; everything else reads back as created.
    const strip = ({ createdAt: _c, updatedAt: _u, ...rest }: Record<string, unknown>) => rest;
    expect(strip(got.body)).toEqual(strip(res.body));
  });

  it('refuses a second shot with the same code (409), writing nothing', async () => {
    const body = base();
    expect((await create(body)).status).toBe(201);
    const before = await count();
    const dup = await create({ ...body, sequence: 'SQ020' });
    expect(dup.status).toBe(409);
    expect(dup.body.code).toBe('SHOT_CODE_TAKEN');
    expect(await count()).toBe(before);
  });

  it('refuses a frame range outside the clip or reversed (400), writing nothing', async () => {
    const before = await count();
    // At 24 fps the clip's last frame is 239; at 48 fps the same moment is frame 478.
    const past = await create({ ...base(), clipId: lib.clipId, frameEnd: 240 });
    expect(past.status).toBe(400);
    expect(past.body).toMatchObject({
      code: 'SHOT_FRAME_RANGE_INVALID',
      details: { lastFrame: 239 },
    });
    const faster = await create({ ...base(), clipId: lib.clipId, fps: 48, frameEnd: 479 });
    expect(faster.body).toMatchObject({
      code: 'SHOT_FRAME_RANGE_INVALID',
      details: { lastFrame: 478 },
    });
    expect((await create({ ...base(), clipId: lib.clipId, fps: 48, frameEnd: 478 })).status).toBe(
      201,
    );
    const reversed = await create({ ...base(), frameStart: 50, frameEnd: 10 });
    expect(reversed.body.code).toBe('SHOT_FRAME_RANGE_INVALID');
    expect(await count()).toBe(before + 1);
  });

  it("numbers a shot from any first frame: frame 1001 is the clip's first instant", async () => {
    // 600 clip frames at 60 fps are 0 … 599: a shot at 60 fps from 1001 can reach 1001 + 599.
    const long = await library(world, show.id, ta.user, { frames: 600, fps: 60 });
    const from1001 = (frameEnd: number) =>
      create({ ...base(), clipId: long.clipId, fps: 60, frameStart: 1001, frameEnd });
    const fits = await from1001(1100);
    expect(fits.status, JSON.stringify(fits.body)).toBe(201);
    expect(fits.body).toMatchObject({ frameStart: 1001, frameEnd: 1100 });
    expect((await from1001(1600)).status).toBe(201);
    const before = await count();
    const past = await from1001(1700);
    expect(past.status).toBe(400);
    expect(past.body).toMatchObject({
      code: 'SHOT_FRAME_RANGE_INVALID',
      details: { frameStart: 1001, frameEnd: 1700, lastFrame: 1600, clipFrames: 600 },
    });
    expect(past.body.message).toContain('shot frame 1600');
    expect((await from1001(1601)).body.code).toBe('SHOT_FRAME_RANGE_INVALID');
    expect(await count()).toBe(before);
  });

  it('checks the range again only when the range, fps or clip changes, not for a due date', async () => {
    const clip = await library(world, show.id, ta.user, { frames: 600, fps: 60 });
    const shot = (
      await create({
        ...base(),
        clipId: clip.clipId,
        fps: 60,
        frameStart: 1001,
        frameEnd: 1100,
      })
    ).body;
    const patch = (body: object, cookie: string) =>
      request(world.server)
        .patch(url(`/${shot.id}`))
        .set('Cookie', cookie)
        .send(body);
    expect((await patch({ dueDate: '2031-02-01' }, producer)).status).toBe(200);
    // The clip row now says 50 frames (e.g. replaced by a shorter cut): the stored range no
    // longer fits, yet a producer still sets the due date and assignees.
    await world.em().nativeUpdate(Clip, { id: clip.clipId }, { frameCount: 50 });
    const due = await patch({ dueDate: '2031-03-01', assigneeIds: [animator.user.id] }, producer);
    expect(due.status, JSON.stringify(due.body)).toBe(200);
    expect(due.body).toMatchObject({ dueDate: '2031-03-01', frameStart: 1001, frameEnd: 1100 });
    // Touching the range checks it against the clip as it is now (50 frames: up to 1001 + 49).
    const range = await patch({ frameEnd: 1060 }, ta.cookie);
    expect(range.body).toMatchObject({
      code: 'SHOT_FRAME_RANGE_INVALID',
      details: { lastFrame: 1050 },
    });
    expect((await patch({ frameEnd: 1050 }, ta.cookie)).status).toBe(200);
  });

  it('refuses an assignee who is not a member of the show', async () => {
    const outsider = await world.user(Role.Animator, []);
    const res = await create({ ...base(), assigneeIds: [outsider.user.id] });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      code: 'SHOT_ASSIGNEE_INVALID',
      details: { userIds: [outsider.user.id] },
    });
  });

  it('lets a producer set due date and assignees, but nothing else', async () => {
    const shot = (await create(base())).body;
    const ok = await request(world.server)
      .patch(url(`/${shot.id}`))
      .set('Cookie', producer)
      .send({ dueDate: '2031-05-01', assigneeIds: [animator.user.id] });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ dueDate: '2031-05-01', assignees: [{ id: animator.user.id }] });
    const no = await request(world.server)
      .patch(url(`/${shot.id}`))
      .set('Cookie', producer)
      .send({ dueDate: '2031-06-01', frameEnd: 5 });
    expect(no.status).toBe(403);
    expect(no.body).toMatchObject({
      code: 'SHOT_FIELDS_NOT_ALLOWED',
      details: { fields: ['frameEnd'] },
    });
    const stored = await world.em().findOneOrFail(Shot, shot.id);
    expect([stored.dueDate, stored.frameEnd]).toEqual(['2031-05-01', 100]);
  });

  it('lets a technical artist edit the range, checked against the clip', async () => {
    const shot = (await create({ ...base(), clipId: lib.clipId })).body;
    const bad = await request(world.server)
      .patch(url(`/${shot.id}`))
      .set('Cookie', ta.cookie)
      .send({ frameEnd: 300 });
    expect(bad.body.code).toBe('SHOT_FRAME_RANGE_INVALID');
    const good = await request(world.server)
      .patch(url(`/${shot.id}`))
      .set('Cookie', ta.cookie)
      .send({ frameEnd: 200, clipId: null });
    expect(good.status).toBe(200);
    expect(good.body).toMatchObject({ frameEnd: 200, clipId: null });
  });

  it('moves the render state by token and by producer, and refuses a bad move with 409', async () => {
    const shot = (await create(base())).body;
    const { secret } = await world.token(show, [TokenScope.RenderWrite]);
    const put = (state: string, auth: [string, string]) =>
      request(world.server)
        .put(url(`/${shot.id}/render-state`))
        .set(...auth)
        .send({ state });
    const token: [string, string] = ['Authorization', `Bearer ${secret}`];
    const prod: [string, string] = ['Cookie', producer];
    const skip = await put('rendered', token);
    expect(skip.status).toBe(409);
    expect(skip.body).toMatchObject({
      code: 'RENDER_STATE_INVALID_TRANSITION',
      details: { from: 'not_started', to: 'rendered', allowed: ['queued'] },
    });
    expect((await world.em().findOneOrFail(Shot, shot.id)).renderState).toBe('not_started');
    expect((await put('queued', token)).body.renderState).toBe('queued');
    expect((await put('rendering', prod)).body.renderState).toBe('rendering');
    expect((await put('rendered', token)).body.renderState).toBe('rendered');
    const back = await put('rendering', prod);
    expect(back.status).toBe(409);
    expect((await world.em().findOneOrFail(Shot, shot.id)).renderState).toBe('rendered');
    const unknown = await put('exploded', prod);
    expect(unknown.status).toBe(400);
  });
});
