import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World, type TestUser } from './support/world';
import { library, takeFor } from './support/production';
import { sinkMessages, waitForMail } from './support/mail-sink';
import { Role } from '../src/users/entities/role';
import { Note } from '../src/reviews/entities/note.entity';
import { ReviewDecision } from '../src/reviews/entities/review-decision.entity';
import { Take } from '../src/takes/entities/take.entity';
import { TakesService } from '../src/takes/takes.service';
import { RetargetJob } from '../src/jobs/entities/retarget-job.entity';
import { Shot } from '../src/shots/entities/shot.entity';
import type { Show } from '../src/shows/entities/show.entity';

describe('review: notes on frames, decisions, e-mail to the people concerned', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let supervisor: TestUser & { cookie: string };
  let animator: TestUser & { cookie: string };
  let profileId: string;

  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Review show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    supervisor = await world.member(Role.Supervisor, [show]);
    animator = await world.member(Role.Animator, [show]);
    ({ profileId } = await library(world, show.id, ta.user));
  });
  afterAll(async () => {
    await app?.close();
  });

  /** A shot (frames 1001–1100) held by the animator; its takes come from jobs the TA submits. */
  const newShot = async () => {
    const res = await request(world.server)
      .post(`/api/shows/${show.id}/shots`)
      .set('Cookie', ta.cookie)
      .send({
        sequence: 'SQ050',
        code: `SQ050_${Math.floor(Math.random() * 1e6)}`,
        frameStart: 1001,
        frameEnd: 1100,
        fps: 24,
        assigneeIds: [animator.user.id],
      });
    expect(res.status).toBe(201);
    return res.body as { id: string; code: string };
  };
  const api = (path: string) => `/api/shows/${show.id}${path}`;

  it('makes one take per job, numbered per shot, through TakesService.createFromJob', async () => {
    const shot = await newShot();
    const v1 = await takeFor(world, shot.id, profileId, ta.user);
    const v2 = await takeFor(world, shot.id, profileId, ta.user);
    expect([v1.version, v2.version]).toEqual([1, 2]);
    const em = world.em();
    const job = await em.findOneOrFail(RetargetJob, v2.job.id, { populate: ['shot'] });
    const again = await app.get(TakesService).createFromJob(em, job, { controls: {}, files: [] });
    expect(again.id).toBe(v2.id);
    expect(await world.em().count(Take, { shot: shot.id })).toBe(2);
    const takes = await request(world.server)
      .get(api(`/shots/${shot.id}/takes`))
      .set('Cookie', animator.cookie);
    expect(takes.body.map((t: { version: number }) => t.version)).toEqual([2, 1]);
  });

  it('e-mails the assignees and the take creator that a take is ready', async () => {
    const shot = await newShot();
    const take = await takeFor(world, shot.id, profileId, ta.user);
    const sent = await app.get(TakesService).notifyTakeReady(take, world.em());
    expect(sent).toBe(2);
    for (const who of [animator, ta]) {
      const mail = await waitForMail(
        who.email,
        new RegExp(`Take ready for review: .*${shot.code} v1`),
      );
      expect(mail.text).toContain(`/takes/${take.id}`);
    }
  });

  it('pins notes to frames inside the shot range only (400 otherwise, nothing written)', async () => {
    const shot = await newShot();
    const take = await takeFor(world, shot.id, profileId, ta.user);
    const post = (body: object, cookie = animator.cookie) =>
      request(world.server)
        .post(api(`/takes/${take.id}/notes`))
        .set('Cookie', cookie)
        .send(body);
    for (const frame of [1000, 1101]) {
      const res = await post({ frame, text: 'too early or late' });
      expect(res.status).toBe(400);
      expect(res.body).toMatchObject({
        code: 'NOTE_FRAME_OUT_OF_RANGE',
        details: { frameStart: 1001, frameEnd: 1100 },
      });
    }
    const badMark = await post({
      frame: 1050,
      text: 'x',
      mark: {
        strokes: [
          {
            points: [
              [0.2, 0.3],
              [1.2, 0.4],
            ],
          },
        ],
      },
    });
    expect(badMark.status).toBe(400);
    expect(badMark.body).toMatchObject({
      code: 'NOTE_MARK_INVALID',
      details: { stroke: 0, point: 1 },
    });
    expect(await world.em().count(Note, { take: take.id })).toBe(0);

    const mark = {
      strokes: [
        {
          points: [
            [0.1, 0.2],
            [0.15, 0.25],
            [1, 0],
          ],
        },
      ],
    };
    const ok = await post({ frame: 1100, text: 'belly settles too slowly', mark });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({
      frame: 1100,
      mark,
      resolved: false,
      author: { id: animator.user.id },
    });

    const edit = (cookie: string, body: object) =>
      request(world.server)
        .patch(api(`/notes/${ok.body.id}`))
        .set('Cookie', cookie)
        .send(body);
    const notAuthor = await edit(supervisor.cookie, { text: 'mine now' });
    expect(notAuthor.status).toBe(403);
    expect(notAuthor.body.code).toBe('NOTE_NOT_AUTHOR');
    const moved = await edit(animator.cookie, { frame: 1001, mark: null });
    expect(moved.body).toMatchObject({ frame: 1001, mark: null, text: 'belly settles too slowly' });
    expect((await edit(animator.cookie, { frame: 999 })).body.code).toBe('NOTE_FRAME_OUT_OF_RANGE');

    const resolve = await request(world.server)
      .post(api(`/notes/${ok.body.id}/resolve`))
      .set('Cookie', supervisor.cookie);
    expect(resolve.body).toMatchObject({ resolved: true, resolvedBy: supervisor.user.id });
    const reopen = await request(world.server)
      .post(api(`/notes/${ok.body.id}/reopen`))
      .set('Cookie', supervisor.cookie);
    expect(reopen.body).toMatchObject({ resolved: false, resolvedBy: null });
    const notes = await request(world.server)
      .get(api(`/takes/${take.id}/notes`))
      .set('Cookie', ta.cookie);
    expect(notes.body.map((n: { frame: number }) => n.frame)).toEqual([1001]);
  });

  it('lets only supervisors decide: an animator gets 403 and nothing is recorded', async () => {
    const shot = await newShot();
    const take = await takeFor(world, shot.id, profileId, ta.user);
    const res = await request(world.server)
      .post(api(`/takes/${take.id}/decisions`))
      .set('Cookie', animator.cookie)
      .send({ decision: 'approved' });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('ROLE_NOT_ALLOWED');
    expect(await world.em().count(ReviewDecision, { take: take.id })).toBe(0);
    expect((await world.em().findOneOrFail(Take, take.id)).reviewState).toBe('awaiting_review');
  });

  it('refuses a decision on a take whose job did not solve (409), recording nothing', async () => {
    const shot = await newShot();
    const take = await takeFor(world, shot.id, profileId, ta.user, { solved: false });
    const mailsBefore = (await sinkMessages()).length;
    const res = await request(world.server)
      .post(api(`/takes/${take.id}/decisions`))
      .set('Cookie', supervisor.cookie)
      .send({ decision: 'approved' });
    expect(res.status).toBe(409);
    expect(res.body).toMatchObject({ code: 'TAKE_NOT_SOLVED', details: { solveState: 'failed' } });
    expect(await world.em().count(ReviewDecision, { take: take.id })).toBe(0);
    expect((await world.em().findOneOrFail(Take, take.id)).reviewState).toBe('awaiting_review');
    expect((await sinkMessages()).length).toBe(mailsBefore);
  });

  it('requests changes, then approves the next take; each decision e-mails the people concerned', async () => {
    const shot = await newShot();
    const v1 = await takeFor(world, shot.id, profileId, ta.user);
    const decide = (takeId: string, body: object) =>
      request(world.server)
        .post(api(`/takes/${takeId}/decisions`))
        .set('Cookie', supervisor.cookie)
        .send(body);
    const changes = await decide(v1.id, {
      decision: 'changes_requested',
      comment: 'More lag on the belly at 1040.',
    });
    expect(changes.status).toBe(201);
    for (const who of [animator, ta]) {
      const mail = await waitForMail(who.email, new RegExp(`Changes requested: .*${shot.code} v1`));
      expect(mail.text).toContain('More lag on the belly at 1040.');
    }
    expect((await world.em().findOneOrFail(Shot, shot.id)).reviewState).toBe('changes_requested');
    const twice = await decide(v1.id, { decision: 'approved' });
    expect(twice.status).toBe(409);
    expect(twice.body.code).toBe('TAKE_ALREADY_DECIDED');

    const v2 = await takeFor(world, shot.id, profileId, ta.user);
    expect((await world.em().findOneOrFail(Shot, shot.id)).reviewState).toBe('awaiting_review');
    expect((await decide(v2.id, { decision: 'approved' })).status).toBe(201);
    for (const who of [animator, ta])
      await waitForMail(who.email, new RegExp(`Approved: .*${shot.code} v2`));
    const stored = await world.em().findOneOrFail(Shot, shot.id);
    expect([stored.reviewState, stored.latestTakeVersion]).toEqual(['approved', 2]);
    const decisions = await request(world.server)
      .get(api(`/takes/${v2.id}/decisions`))
      .set('Cookie', animator.cookie);
    expect(decisions.body).toEqual([
      expect.objectContaining({
        decision: 'approved',
        supervisor: expect.objectContaining({ id: supervisor.user.id }),
      }),
    ]);
  });
});
