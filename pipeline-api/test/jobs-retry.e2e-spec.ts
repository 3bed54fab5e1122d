// Faults and bad input in the worker, with a worker process of our own (dist/worker.js) whose S3
// store sits behind a proxy the test takes down: a store that stops answering is a transient
// fault, retried with exponential backoff until it answers again, and the job then solves once;
// a file the solver cannot read is bad input, failed at once and never retried.
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { getQueueToken } from '@nestjs/bullmq';
import type { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readTakeGlb } from '@overshoot/solver';
import { createTestApp } from './app-factory';
import { uniq } from './support/world';
import { getJob, waitForJob } from './support/jobs';
import {
  binary,
  jobShow,
  learnedProfile,
  newShot,
  submitJob,
  type JobShow,
} from './support/job-setup';
import { storedLibrary } from './support/stored-library';
import { tubeFiles } from './support/job-setup';
import { startWorker, type WorkerProcess } from './support/worker-process';
import { startFlakyProxy, type FlakyProxy } from './support/flaky-proxy';
import { QUEUES } from '../src/queues/queue-names';
import { StorageService } from '../src/storage/storage.service';
import { writeObject } from '../src/jobs/solve/object-store';
import { Take } from '../src/takes/entities/take.entity';
import { Clip } from '../src/library/entities/clip.entity';
import type { JobView } from '../src/jobs/job-view';

const PREFIX = `${process.env.REDIS_PREFIX}-retry-${uniq()}`;
/** First retry delay; BullMQ doubles it for each next try (exponential backoff). */
const BACKOFF_MS = 1500;
const ATTEMPTS = 3;

describe('faults are retried with backoff, bad input is not', () => {
  let app: NestExpressApplication;
  let s: JobShow;
  let proxy: FlakyProxy;
  let worker: WorkerProcess;
  let profileId: string;
  let queue: Queue;

  beforeAll(async () => {
    proxy = await startFlakyProxy(process.env.S3_ENDPOINT as string);
    // The API queues each solve with these tries and this backoff.
    app = await createTestApp({
      env: { REDIS_PREFIX: PREFIX, SOLVE_MAX_ATTEMPTS: ATTEMPTS, SOLVE_BACKOFF_MS: BACKOFF_MS },
    });
    queue = app.get<Queue>(getQueueToken(QUEUES.retarget));
    s = await jobShow(app, 'Retry show');
    worker = await startWorker('retry', { REDIS_PREFIX: PREFIX, S3_ENDPOINT: proxy.url });
    profileId = await learnedProfile(s);
  }, 120_000);
  afterAll(async () => {
    worker?.child.kill('SIGKILL');
    await worker?.exited;
    for (const name of [QUEUES.learn, QUEUES.retarget, QUEUES.mail]) {
      await app?.get<Queue>(getQueueToken(name)).obliterate({ force: true });
    }
    await app?.close();
    await proxy?.close();
  });

  /** Waits until try `n` stopped on a fault and its retry is scheduled; returns the retry delay. */
  async function retryScheduled(
    jobId: string,
    n: number,
  ): Promise<{ view: JobView; delay: number }> {
    const said = new RegExp(`^Attempt ${n} stopped on a fault`);
    for (let i = 0; i < 600; i++) {
      const view = await getJob(s.world, s.ta, s.show.id, jobId);
      expect(view.state, JSON.stringify(view)).not.toMatch(/solved|failed|canceled/);
      const entry = await queue.getJob(jobId);
      if (said.test(view.errorMessage ?? '') && (await entry?.getState()) === 'delayed') {
        return { view, delay: Number(entry?.delay) };
      }
      await new Promise((r) => setTimeout(r, 50));
    }
    throw new Error(`try ${n} of job ${jobId} never stopped on the fault`);
  }

  it('retries while the S3 store is unreachable, backing off exponentially, then solves once', async () => {
    const shot = await newShot(s, { frameStart: 1001, frameEnd: 1040, fps: 24 });
    proxy.down();
    const res = await submitJob(s, shot.id, { profileId });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    const jobId = res.body.id as string;

    const first = await retryScheduled(jobId, 1);
    expect(first.view).toMatchObject({
      state: 'queued',
      attempts: 1,
      takeId: null,
      errorCode: null,
    });
    expect(first.delay).toBe(BACKOFF_MS);
    const second = await retryScheduled(jobId, 2);
    expect(second.view).toMatchObject({ state: 'queued', attempts: 2, takeId: null });
    expect(second.delay).toBe(2 * BACKOFF_MS);
    expect(proxy.resets).toBeGreaterThanOrEqual(2);
    expect(await s.world.em().count(Take, { job: jobId })).toBe(0);

    // The store answers again before the last try.
    proxy.up();
    const done = await waitForJob(s.world, s.ta, s.show.id, jobId);
    expect(done).toMatchObject({
      state: 'solved',
      attempts: ATTEMPTS,
      errorCode: null,
      errorMessage: null,
      takeId: expect.any(String),
    });
    // (The row commits before the queue records the completion: wait for the queue.)
    await expect.poll(() => queue.getJobState(jobId)).toBe('completed');
    expect((await queue.getJob(jobId))?.attemptsMade).toBe(ATTEMPTS);
    const takes = await s.world.em().find(Take, { shot: shot.id });
    expect(takes.map((t) => [t.version, t.job.id])).toEqual([[1, jobId]]);
    const file = await request(s.world.server)
      .get(s.api(`/takes/${done.takeId}/file`))
      .set('Cookie', s.ta.cookie)
      .buffer(true)
      .parse(binary);
    expect((await readTakeGlb(new Uint8Array(file.body as Buffer))).extras.frameCount).toBe(40);
  }, 60_000);

  it('fails a job on a file the solver cannot read at once, with one try of the three', async () => {
    const broken = await storedLibrary(s.world, s.show.id, s.ta.user, await tubeFiles());
    const clip = await s.world.em().findOneOrFail(Clip, broken.clipId, { populate: ['asset'] });
    await writeObject(
      app.get(StorageService),
      clip.asset.s3Key,
      new TextEncoder().encode('not a clip'),
      'text/plain',
    );
    const shot = await request(s.world.server)
      .post(s.api('/shots'))
      .set('Cookie', s.ta.cookie)
      .send({
        sequence: 'SQ100',
        code: `SQ100_BAD_${uniq().toUpperCase()}`,
        characterId: broken.characterId,
        clipId: broken.clipId,
        frameStart: 1001,
        frameEnd: 1040,
        fps: 24,
      });
    expect(shot.status, JSON.stringify(shot.body)).toBe(201);
    const res = await submitJob(s, shot.body.id, { profileId });
    expect(res.status).toBe(202);
    const done = await waitForJob(s.world, s.ta, s.show.id, res.body.id);
    expect(done).toMatchObject({
      state: 'failed',
      errorCode: 'BVH_SYNTAX',
      attempts: 1,
      takeId: null,
    });
    // Failed for good in the queue after its first try, though two more were allowed.
    // (The row is written before the queue records the failure: wait for the queue.)
    await expect.poll(() => queue.getJobState(res.body.id)).toBe('failed');
    const entry = await queue.getJob(res.body.id);
    expect(entry?.attemptsMade).toBe(1);
    expect(entry?.opts.attempts).toBe(ATTEMPTS);
    expect(entry?.failedReason).toMatch(/^BVH_SYNTAX: /);
  }, 60_000);
});
