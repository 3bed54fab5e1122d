// What the job routes refuse, with stable codes and nothing half-written (rows and bucket
// objects checked): expired consent, unknown ids, a shot shorter than its pre-roll, bad controls
// and joint maps, profiles not ready, bad input found by the worker; and cancellation.
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { getQueueToken } from '@nestjs/bullmq';
import type { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { storedLibrary } from './support/stored-library';
import { takeFor } from './support/production';
import { waitForJob } from './support/jobs';
import {
  jobShow,
  learnedProfile,
  newShot,
  submitJob,
  tubeFiles,
  type JobShow,
} from './support/job-setup';
import { Role } from '../src/users/entities/role';
import { StorageService } from '../src/storage/storage.service';
import { QUEUES } from '../src/queues/queue-names';
import { LearnJob } from '../src/jobs/entities/learn-job.entity';
import { RetargetJob } from '../src/jobs/entities/retarget-job.entity';
import { Take } from '../src/takes/entities/take.entity';
import { Shot } from '../src/shots/entities/shot.entity';
import { Capture } from '../src/library/entities/capture.entity';
import { Character } from '../src/library/entities/character.entity';
import { Clip } from '../src/library/entities/clip.entity';
import { TissueProfile } from '../src/library/entities/tissue-profile.entity';
import { writeObject } from '../src/jobs/solve/object-store';

describe('job refusals and cancellation', () => {
  let app: NestExpressApplication;
  let s: JobShow;
  let profileId: string;
  const jobObjects = () => app.get(StorageService).list(`shows/${s.show.id}/jobs/`);

  beforeAll(async () => {
    app = await createTestApp();
    s = await jobShow(app, 'Refusals show');
    profileId = await learnedProfile(s);
  }, 180_000);
  afterAll(async () => {
    await app?.close();
  });

  it('refuses to learn from a capture whose consent has expired, writing nothing', async () => {
    const expired = await storedLibrary(
      s.world,
      s.show.id,
      s.ta.user,
      await tubeFiles('2020-01-31'),
    );
    const before = await counts();
    const res = await request(s.world.server)
      .post(s.api('/profiles'))
      .set('Cookie', s.ta.cookie)
      .send({ name: 'too late', captureId: expired.captureId, characterId: expired.characterId });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      code: 'CONSENT_EXPIRED',
      details: { captureId: expired.captureId, expiresOn: '2020-01-31' },
    });
    expect(await counts()).toEqual(before);
  });

  it('answers unknown ids with 404 and a stable code', async () => {
    const nobody = '00000000-0000-4000-8000-000000000000';
    const shot = await newShot(s, { frameStart: 0, frameEnd: 40, fps: 24 });
    const cases: [request.Test, string][] = [
      [
        request(s.world.server)
          .post(s.api('/profiles'))
          .send({ name: 'x', captureId: nobody, characterId: s.lib.characterId }),
        'CAPTURE_NOT_FOUND',
      ],
      [
        request(s.world.server)
          .post(s.api('/profiles'))
          .send({ name: 'x', captureId: s.lib.captureId, characterId: nobody }),
        'CHARACTER_NOT_FOUND',
      ],
      [
        request(s.world.server)
          .post(s.api(`/shots/${nobody}/jobs`))
          .send({ profileId }),
        'SHOT_NOT_FOUND',
      ],
      [
        request(s.world.server)
          .post(s.api(`/shots/${shot.id}/jobs`))
          .send({ profileId: nobody }),
        'PROFILE_NOT_FOUND',
      ],
      [
        request(s.world.server)
          .post(s.api(`/shots/${shot.id}/jobs`))
          .send({ profileId, baseTakeId: nobody }),
        'TAKE_NOT_FOUND',
      ],
      [request(s.world.server).get(s.api(`/jobs/${nobody}`)), 'JOB_NOT_FOUND'],
      [request(s.world.server).post(s.api(`/jobs/${nobody}/cancel`)), 'JOB_NOT_FOUND'],
      [request(s.world.server).get(s.api(`/takes/${nobody}/file`)), 'TAKE_NOT_FOUND'],
      [request(s.world.server).get(s.api(`/profiles/${nobody}/file`)), 'PROFILE_NOT_FOUND'],
    ];
    const before = await counts();
    for (const [req, code] of cases) {
      const res = await req.set('Cookie', s.ta.cookie);
      expect([res.status, res.body.code]).toEqual([404, code]);
    }
    expect(await counts()).toEqual(before);
    // A take whose file is not in the bucket is not found either, and says so.
    const take = await takeFor(s.world, shot.id, profileId, s.ta.user);
    const file = await request(s.world.server)
      .get(s.api(`/takes/${take.id}/file`))
      .set('Cookie', s.ta.cookie);
    expect([file.status, file.body.code]).toEqual([404, 'TAKE_NOT_FOUND']);
    expect(file.body.message).toMatch(/no file/);
  });

  it('refuses a shot shorter than the pre-roll with CLIP_TOO_SHORT, queuing nothing', async () => {
    // Frames 0–12 at 24 fps last 0.5 s; the default pre-roll is 1 s.
    const shot = await newShot(s, { frameStart: 0, frameEnd: 12, fps: 24 });
    const before = await counts();
    const res = await submitJob(s, shot.id, { profileId });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      code: 'CLIP_TOO_SHORT',
      details: { shotSeconds: 0.5, prerollSeconds: 1 },
    });
    expect(await counts()).toEqual(before);
    expect((await s.world.em().findOneOrFail(Shot, shot.id)).solveState).toBeNull();
    // A shorter pre-roll fits, and the solve agrees.
    const fits = await submitJob(s, shot.id, { profileId, controls: { prerollSeconds: 0.25 } });
    expect(fits.status).toBe(202);
    expect((await waitForJob(s.world, s.ta, s.show.id, fits.body.id)).state).toBe('solved');
  }, 60_000);

  it('checks controls and joint maps against the profile and the shot character', async () => {
    const shot = await newShot(s, { frameStart: 0, frameEnd: 40, fps: 24 });
    const bad: [object, string][] = [
      [{ controls: { gain: 'loud' } }, 'controls.gain'],
      [{ controls: { regionGains: { belly: 2 } } }, 'controls.regionGains'],
      [{ controls: { mutedModes: [99] } }, 'controls.mutedModes'],
      [{ jointMap: { shoulder: 'mid' } }, 'jointMap.shoulder'],
      [{ jointMap: { mid: 'elbow' } }, 'jointMap.mid'],
    ];
    for (const [body, field] of bad) {
      const res = await submitJob(s, shot.id, { profileId, ...body });
      expect([res.status, res.body.code], JSON.stringify(res.body)).toEqual([
        400,
        'VALIDATION_FAILED',
      ]);
      expect(res.body.details.map((d: { field: string }) => d.field)).toContain(field);
    }
    expect(await s.world.em().count(RetargetJob, { shot: shot.id })).toBe(0);
  });

  it('answers PROFILE_NOT_READY for a profile still learning', async () => {
    const em = s.world.em();
    const waiting = new TissueProfile(
      await em.findOneOrFail(Capture, s.lib.captureId),
      em.getReference(Character, s.lib.characterId),
      'not yet',
    );
    await em.persistAndFlush(waiting);
    const shot = await newShot(s, { frameStart: 0, frameEnd: 40, fps: 24 });
    const res = await submitJob(s, shot.id, { profileId: waiting.id });
    expect([res.status, res.body.code]).toEqual([409, 'PROFILE_NOT_READY']);
    const file = await request(s.world.server)
      .get(s.api(`/profiles/${waiting.id}/file`))
      .set('Cookie', s.ta.cookie);
    expect([file.status, file.body.code]).toEqual([409, 'PROFILE_NOT_READY']);
  });

  it('fails a job on bad input in the worker at once, with its code and what to do, and no take', async () => {
    const broken = await storedLibrary(s.world, s.show.id, s.ta.user, await tubeFiles());
    // The clip's file is damaged in the bucket after its check.
    const clip = await s.world.em().findOneOrFail(Clip, broken.clipId, { populate: ['asset'] });
    const damaged = new TextEncoder().encode('not a clip');
    await writeObject(app.get(StorageService), clip.asset.s3Key, damaged, 'text/plain');
    const res = await request(s.world.server)
      .post(s.api('/shots'))
      .set('Cookie', s.ta.cookie)
      .send({
        sequence: 'SQ100',
        code: `SQ100_bad_${Math.floor(Math.random() * 1e6)}`,
        characterId: broken.characterId,
        clipId: broken.clipId,
        frameStart: 0,
        frameEnd: 40,
        fps: 24,
      });
    const job = await submitJob(s, res.body.id, { profileId });
    expect(job.status).toBe(202);
    const done = await waitForJob(s.world, s.ta, s.show.id, job.body.id);
    expect(done).toMatchObject({
      state: 'failed',
      errorCode: 'BVH_SYNTAX',
      attempts: 1,
      takeId: null,
    });
    expect(done.errorMessage).toMatch(/MOTION/);
    expect(done.errorMessage).toMatch(/Fix|Upload|upload/);
    expect(await s.world.em().count(Take, { job: job.body.id })).toBe(0);
    expect(await jobObjects()).not.toContain(`shows/${s.show.id}/jobs/${job.body.id}/take.glb`);
  }, 60_000);

  it('cancels queued or solving jobs (writing nothing) but not finished ones; only submitters and leads may', async () => {
    const shot = await newShot(s, { frameStart: 0, frameEnd: 40, fps: 24 });
    const done = await submitJob(s, shot.id, { profileId });
    await waitForJob(s.world, s.ta, s.show.id, done.body.id);
    const late = await request(s.world.server)
      .post(s.api(`/jobs/${done.body.id}/cancel`))
      .set('Cookie', s.ta.cookie);
    expect(late.status).toBe(409);
    expect(late.body).toMatchObject({ code: 'INVALID_STATE_CHANGE', details: { state: 'solved' } });

    const own = await submitJob(s, shot.id, { profileId }, s.animator.cookie);
    expect(own.status).toBe(202);
    const other = await s.world.member(Role.Animator, [s.show]);
    const refused = await request(s.world.server)
      .post(s.api(`/jobs/${own.body.id}/cancel`))
      .set('Cookie', other.cookie);
    expect([refused.status, refused.body.code]).toEqual([403, 'JOB_NOT_SUBMITTER']);
    const canceled = await request(s.world.server)
      .post(s.api(`/jobs/${own.body.id}/cancel`))
      .set('Cookie', s.animator.cookie);
    expect(canceled.status).toBe(200);
    expect(canceled.body).toMatchObject({ state: 'canceled', takeId: null });
    // Whether the worker had it yet or not, it ends without a take or a file.
    const queue = app.get<Queue>(getQueueToken(QUEUES.retarget));
    for (
      let i = 0;
      i < 200 && ['active', 'waiting'].includes(await queue.getJobState(own.body.id));
      i++
    )
      await new Promise((r) => setTimeout(r, 100));
    expect(['completed', 'unknown']).toContain(await queue.getJobState(own.body.id));
    const after = await request(s.world.server)
      .get(s.api(`/jobs/${own.body.id}`))
      .set('Cookie', s.ta.cookie);
    expect(after.body).toMatchObject({ state: 'canceled', takeId: null });
    expect(await s.world.em().count(Take, { job: own.body.id })).toBe(0);
    expect(await jobObjects()).not.toContain(`shows/${s.show.id}/jobs/${own.body.id}/take.glb`);
    expect((await s.world.em().findOneOrFail(Shot, shot.id)).solveState).toBe('canceled');
  }, 60_000);

  /** Rows and job files of the show, to prove a refusal wrote nothing. */
  async function counts() {
    const em = s.world.em();
    return {
      profiles: await em.count(TissueProfile, { show: s.show.id }),
      learnJobs: await em.count(LearnJob, { show: s.show.id }),
      retargetJobs: await em.count(RetargetJob, { show: s.show.id }),
      takes: await em.count(Take, { show: s.show.id }),
      objects: (await jobObjects()).length,
    };
  }
});
