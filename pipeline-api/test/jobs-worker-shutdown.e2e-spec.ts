// Graceful shutdown with a grace period, with worker processes of our own (dist/worker.js) on a
// queue prefix of their own: told to stop (SIGTERM) mid-solve, a worker takes no new job, lets
// the running one finish within SOLVE_SHUTDOWN_GRACE_SECONDS and exits; a job still running when
// the grace ends goes back to the queue and runs again on another worker (a grace of 0 there, so
// the job cannot finish in the moments between seeing it mid-solve and the worker's stop).
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { getQueueToken } from '@nestjs/bullmq';
import type { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World, uniq, type TestUser } from './support/world';
import { storedLibrary, type StoredLibrary } from './support/stored-library';
import { tubeCaptureGlb, tubeCharacterGlb, tubeClipBvh } from './support/solver-fixtures';
import { waitForJob } from './support/jobs';
import { LEARN_SOLVER_STAGES, waitForRow } from './support/job-rows';
import { startWorker, type WorkerProcess } from './support/worker-process';
import { Role } from '../src/users/entities/role';
import { QUEUES } from '../src/queues/queue-names';
import { LearnJob } from '../src/jobs/entities/learn-job.entity';
import type { Show } from '../src/shows/entities/show.entity';

/** Big enough that learning runs for seconds, long enough to stop a worker in the middle. */
const TUBE = { rings: 12, sides: 12 };
const PREFIX = `${process.env.REDIS_PREFIX}-shutdown-${uniq()}`;
const worker = (name: string, graceSeconds: number) =>
  startWorker(name, {
    REDIS_PREFIX: PREFIX,
    SOLVE_SHUTDOWN_GRACE_SECONDS: String(graceSeconds),
  });

describe('a worker told to stop, with a grace period', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let lib: StoredLibrary;
  const workers: WorkerProcess[] = [];
  const api = (path: string) => `/api/shows/${show.id}${path}`;
  /** Asks for a profile; returns its learn job's id. */
  const learn = async (name: string) => {
    const res = await request(world.server)
      .post(api('/profiles'))
      .set('Cookie', ta.cookie)
      .send({ name, captureId: lib.captureId, characterId: lib.characterId });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    return res.body.job.id as string;
  };
  const mid = (j: LearnJob) => LEARN_SOLVER_STAGES.includes(j.stage ?? '');
  let waiting: string;

  beforeAll(async () => {
    app = await createTestApp({ env: { REDIS_PREFIX: PREFIX } });
    world = new World(app);
    show = await world.show('Shutdown show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    lib = await storedLibrary(world, show.id, ta.user, {
      character: await tubeCharacterGlb(TUBE),
      capture: await tubeCaptureGlb(TUBE, 6),
      clip: tubeClipBvh(96),
    });
  }, 120_000);
  afterAll(async () => {
    for (const w of workers) w.child.kill('SIGKILL');
    await Promise.all(workers.map((w) => w.exited));
    for (const name of [QUEUES.learn, QUEUES.retarget, QUEUES.mail]) {
      await app?.get<Queue>(getQueueToken(name)).obliterate({ force: true });
    }
    await app?.close();
  });

  it('finishes the running job within the grace, takes no new one, then exits', async () => {
    const stopping = await worker('grace-long', 120);
    workers.push(stopping);
    const running = await learn('finished while stopping');
    await waitForRow(world, LearnJob, running, mid);
    stopping.child.kill('SIGTERM');
    waiting = await learn('submitted after the stop');

    expect(await stopping.exited).toEqual({ code: null, signal: 'SIGTERM' });
    // Solved by the stopping worker itself (no other worker runs on this prefix), at the first try.
    const done = await world.em().findOneOrFail(LearnJob, running);
    expect([done.state, done.attempts, done.errorMessage]).toEqual(['solved', 1, null]);
    expect(done.worker).toContain(`:${stopping.child.pid}:`);
    const profile = await request(world.server)
      .get(api(`/profiles/${done.profile.id}`))
      .set('Cookie', ta.cookie);
    expect(profile.body.state).toBe('ready');
    // The job sent after the stop was left for another worker.
    const left = await world.em().findOneOrFail(LearnJob, waiting);
    expect([left.state, left.attempts]).toEqual(['queued', 0]);
  }, 60_000);

  it('hands a job still running when the grace ends back to the queue; it runs again elsewhere', async () => {
    const short = await worker('grace-none', 0);
    workers.push(short);
    await waitForRow(world, LearnJob, waiting, mid);
    short.child.kill('SIGTERM');
    const handedBack = await waitForRow(world, LearnJob, waiting, (j) => j.state !== 'solving');
    expect([handedBack.state, handedBack.attempts]).toEqual(['queued', 1]);
    expect(handedBack.errorMessage).toMatch(/shut down/);
    expect(await short.exited).toEqual({ code: null, signal: 'SIGTERM' });
    const queue = app.get<Queue>(getQueueToken(QUEUES.learn));
    expect(['waiting', 'delayed', 'prioritized']).toContain(await queue.getJobState(waiting));

    workers.push(await worker('after', 20));
    const job = await waitForJob(world, ta, show.id, waiting);
    expect(job).toMatchObject({ state: 'solved', attempts: 2, errorCode: null });
  }, 60_000);
});
