// Learn and retarget jobs through the API and the stack's worker, on small invented inputs:
// progress and results of learning, the joint map, takes numbered per shot from one job each,
// take and profile files that read, the job list.
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readTakeGlb } from '@overshoot/solver';
import { createTestApp } from './app-factory';
import { waitForJob } from './support/jobs';
import { openEventStream } from './support/event-stream';
import {
  binary,
  jobShow,
  newShot,
  requestProfile,
  submitJob,
  type JobShow,
} from './support/job-setup';
import { TokenScope } from '../src/tokens/token-scope';
import { Take } from '../src/takes/entities/take.entity';
import { Shot } from '../src/shots/entities/shot.entity';
import type { JobView } from '../src/jobs/job-view';

describe('learn and retarget jobs', () => {
  let app: NestExpressApplication;
  let s: JobShow;
  let profileId: string;
  let learnJob: JobView;
  const learnEvents: { event: string; data: Record<string, unknown> }[] = [];

  beforeAll(async () => {
    app = await createTestApp();
    s = await jobShow(app, 'Jobs show');
    await app.listen(0, '127.0.0.1');
    const port = (app.getHttpServer().address() as { port: number }).port;
    const stream = await openEventStream(`http://127.0.0.1:${port}${s.api('/events')}`, {
      Cookie: s.ta.cookie,
    });
    const asked = await requestProfile(s);
    profileId = asked.id;
    learnJob = await waitForJob(s.world, s.ta, s.show.id, asked.job.id);
    for (;;) {
      const item = await stream.next((i) => i.kind === 'event', 5000);
      if (item.kind !== 'event' || item.data.jobId !== learnJob.id) continue;
      learnEvents.push(item);
      if (item.event === 'job.state' && item.data.state === 'solved') break;
    }
    stream.close();
  }, 180_000);
  afterAll(async () => {
    await app?.close();
  });

  it('learns a profile in the worker: progress, then modes, fit report, spectra and file', async () => {
    expect(learnJob).toMatchObject({ kind: 'learn', state: 'solved', percent: 100, attempts: 1 });
    expect(learnJob).toMatchObject({ profileId, shotId: null, takeId: null, errorCode: null });
    const progress = learnEvents.filter((e) => e.event === 'job.progress');
    const percents = progress.map((e) => e.data.percent as number);
    expect(percents.length).toBeGreaterThan(3);
    expect(percents).toEqual([...percents].sort((a, b) => a - b));
    expect(progress.map((e) => e.data.stage)).toEqual(
      expect.arrayContaining(['download', 'separate', 'report', 'upload']),
    );
    const states = learnEvents.filter((e) => e.event === 'job.state').map((e) => e.data.state);
    expect(states).toEqual(['queued', 'solving', 'solved']);

    const res = await request(s.world.server)
      .get(s.api(`/profiles/${profileId}`))
      .set('Cookie', s.ta.cookie);
    expect(res.body).toMatchObject({
      state: 'ready',
      captureDeleted: false,
      job: { id: learnJob.id },
    });
    expect(res.body.modes.length).toBeGreaterThan(0);
    expect(res.body.modes.length).toBeLessThanOrEqual(8);
    for (const m of res.body.modes) {
      expect(m.frequencyHz).toBeGreaterThan(0);
      expect(typeof m.region).toBe('string');
    }
    expect(res.body.fitReport).toMatchObject({
      oneStepNrmse: expect.any(Number),
      freeRunNrmse: expect.any(Number),
      varianceExplained: expect.any(Number),
      stabilityMargin: expect.any(Number),
    });
    const spectrum = res.body.spectra[0];
    expect(spectrum.frequencyHz.length).toBe(spectrum.power.length);
    expect(spectrum.peaks.length).toBeGreaterThan(0);

    const file = await request(s.world.server)
      .get(s.api(`/profiles/${profileId}/file`))
      .set('Cookie', s.animator.cookie)
      .buffer(true)
      .parse(binary);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('application/octet-stream');
    // The solver's profile format starts with its magic, "OVSP".
    expect(
      Buffer.from(file.body as Buffer)
        .subarray(0, 4)
        .toString('latin1'),
    ).toBe('OVSP');
  });

  it('maps the profile drivers onto the shot character for review', async () => {
    const shot = await newShot(s, { frameStart: 0, frameEnd: 40, fps: 24 });
    const res = await request(s.world.server)
      .get(s.api(`/shots/${shot.id}/joint-map?profileId=${profileId}`))
      .set('Cookie', s.animator.cookie);
    expect(res.status).toBe(200);
    expect(res.body.unmapped).toEqual([]);
    expect(res.body.essentialUnmapped).toEqual([]);
    expect(res.body.mapped.length).toBeGreaterThan(0);
    for (const m of res.body.mapped) expect(m.target).toBe(m.source);
  });

  it('retargets a shot numbered from 1001 at another rate into take v1, then v2: one take per job, files that read', async () => {
    // The clip runs at 24 fps; the shot at 30 from frame 1001: shot frame f is at (f − 1001) / 30
    // s in the clip, so 1001–1046 is 46 frames from the clip's start.
    const shot = await newShot(s, { frameStart: 1001, frameEnd: 1046, fps: 30 });
    const res = await submitJob(s, shot.id, { profileId, controls: { gain: 1.5 } });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    expect(res.body).toMatchObject({
      kind: 'retarget',
      state: 'queued',
      shotId: shot.id,
      profileId,
    });
    // Every control is filled in: those not given take the solver's defaults.
    expect(res.body.controls).toMatchObject({
      gain: 1.5,
      stiffness: 1,
      damping: 1,
      prerollSeconds: 1,
    });
    const job = await waitForJob(s.world, s.ta, s.show.id, res.body.id);
    expect(job).toMatchObject({
      state: 'solved',
      percent: 100,
      attempts: 1,
      takeId: expect.any(String),
    });

    const take = await request(s.world.server)
      .get(s.api(`/takes/${job.takeId}`))
      .set('Cookie', s.ta.cookie);
    expect(take.body).toMatchObject({ version: 1, jobId: job.id, solveState: 'solved' });
    expect(take.body.metrics).toMatchObject({ frameCount: 1046 - 1001 + 1, fps: 30 });
    const file = await request(s.world.server)
      .get(s.api(`/takes/${job.takeId}/file`))
      .set('Cookie', s.animator.cookie)
      .buffer(true)
      .parse(binary);
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('model/gltf-binary');
    const read = await readTakeGlb(new Uint8Array(file.body as Buffer));
    expect(read.extras.frameCount).toBe(1046 - 1001 + 1);
    expect(read.extras.fps).toBe(30);
    expect(read.extras.controls.gain).toBe(1.5);

    // A pipeline token with jobs:submit re-solves the shot: the next version.
    const { secret } = await s.world.token(s.show, [TokenScope.JobsSubmit]);
    const second = await request(s.world.server)
      .post(s.api(`/shots/${shot.id}/jobs`))
      .set('Authorization', `Bearer ${secret}`)
      .send({ profileId, baseTakeId: job.takeId, controls: { gain: 0.5 } });
    expect(second.status, JSON.stringify(second.body)).toBe(202);
    expect(second.body.submittedBy).toBeNull();
    const job2 = await waitForJob(s.world, { token: secret }, s.show.id, second.body.id);
    expect(job2.state).toBe('solved');
    const takes = await s.world.em().find(Take, { shot: shot.id }, { orderBy: { version: 'asc' } });
    expect(takes.map((t) => [t.version, t.job.id])).toEqual([
      [1, job.id],
      [2, job2.id],
    ]);
    const row = await s.world.em().findOneOrFail(Shot, shot.id);
    expect([row.latestTakeVersion, row.solveState, row.reviewState]).toEqual([
      2,
      'solved',
      'awaiting_review',
    ]);
  }, 120_000);

  it('lists the show jobs newest first, by kind, shot and state', async () => {
    const all = await request(s.world.server).get(s.api('/jobs')).set('Cookie', s.animator.cookie);
    expect(all.status).toBe(200);
    const items = all.body.items as JobView[];
    expect(items.map((j) => j.createdAt)).toEqual(
      [...items.map((j) => j.createdAt)].sort().reverse(),
    );
    expect(items.some((j) => j.id === learnJob.id)).toBe(true);
    const learn = await request(s.world.server)
      .get(s.api('/jobs?kind=learn'))
      .set('Cookie', s.animator.cookie);
    expect(learn.body.items.every((j: JobView) => j.kind === 'learn')).toBe(true);
    const retarget = items.find((j) => j.kind === 'retarget') as JobView;
    const byShot = await request(s.world.server)
      .get(s.api(`/jobs?shotId=${retarget.shotId}&state=solved`))
      .set('Cookie', s.animator.cookie);
    expect(byShot.body.items.length).toBeGreaterThan(0);
    for (const j of byShot.body.items)
      expect([j.shotId, j.state]).toEqual([retarget.shotId, 'solved']);
    const bad = await request(s.world.server)
      .get(s.api('/jobs?state=done'))
      .set('Cookie', s.animator.cookie);
    expect([bad.status, bad.body.code]).toEqual([400, 'VALIDATION_FAILED']);
  });
});
