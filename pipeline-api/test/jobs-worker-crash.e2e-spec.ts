// Workers that die or stop mid-job, with worker processes of our own (dist/worker.js) on a queue
// prefix of their own, short queue locks so a dead worker's job is found quickly, and no grace on
// shutdown: a killed worker's job runs again elsewhere and writes its result once; a worker told
// to stop hands its job back at once.
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { getQueueToken } from '@nestjs/bullmq';
import type { Queue } from 'bullmq';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readTakeGlb } from '@overshoot/solver';
import { createTestApp } from './app-factory';
import { World, uniq, type TestUser } from './support/world';
import { storedLibrary, type StoredLibrary } from './support/stored-library';
import { tubeCaptureGlb, tubeCharacterGlb, tubeClipBvh } from './support/solver-fixtures';
import { waitForJob } from './support/jobs';
import { binary } from './support/job-setup';
import { openEventStream, type EventStream } from './support/event-stream';
import { startWorker, type WorkerProcess } from './support/worker-process';
import { LEARN_SOLVER_STAGES, waitForRow as waitForJobRow } from './support/job-rows';
import { Role } from '../src/users/entities/role';
import { QUEUES } from '../src/queues/queue-names';
import { StorageService } from '../src/storage/storage.service';
import { LearnJob } from '../src/jobs/entities/learn-job.entity';
import { RetargetJob } from '../src/jobs/entities/retarget-job.entity';
import { Take } from '../src/takes/entities/take.entity';
import type { Show } from '../src/shows/entities/show.entity';

/** Big enough that learning runs long enough to interrupt, small enough to keep the test short. */
const TUBE = { rings: 12, sides: 12 };
const PREFIX = `${process.env.REDIS_PREFIX}-crash-${uniq()}`;
const WORKER_ENV = {
  REDIS_PREFIX: PREFIX,
  SOLVE_LOCK_MS: '2000',
  SOLVE_STALLED_CHECK_MS: '1000',
  SOLVE_SHUTDOWN_GRACE_SECONDS: '0',
};

describe('a worker that dies or stops mid-job', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let lib: StoredLibrary;
  let events: EventStream;
  let profileId: string;
  const workers: WorkerProcess[] = [];
  const api = (path: string) => `/api/shows/${show.id}${path}`;
  const worker = async (name: string) => {
    const w = await startWorker(name, WORKER_ENV);
    workers.push(w);
    return w;
  };

  /** Polls the row until `done`, quickly: the moment to interrupt is short. */
  const waitForRow = <T extends LearnJob | RetargetJob>(
    entity: new (...a: never[]) => T,
    id: string,
    done: (row: T) => boolean,
  ) => waitForJobRow(world, entity, id, done);

  /** The job's states, in the order the event stream told them. */
  async function statesUntilSolved(jobId: string): Promise<string[]> {
    const states: string[] = [];
    while (states.at(-1) !== 'solved') {
      const item = await events.next(
        (i) => i.kind === 'event' && i.event === 'job.state' && i.data.jobId === jobId,
        60_000,
      );
      if (item.kind === 'event') states.push(item.data.state as string);
    }
    return states;
  }

  beforeAll(async () => {
    app = await createTestApp({ env: { REDIS_PREFIX: PREFIX } });
    await app.listen(0, '127.0.0.1');
    world = new World(app);
    show = await world.show('Crash show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    lib = await storedLibrary(world, show.id, ta.user, {
      character: await tubeCharacterGlb(TUBE),
      capture: await tubeCaptureGlb(TUBE, 4),
      clip: tubeClipBvh(720),
    });
    const port = (app.getHttpServer().address() as { port: number }).port;
    events = await openEventStream(`http://127.0.0.1:${port}${api('/events')}`, {
      Cookie: ta.cookie,
    });
  }, 120_000);
  afterAll(async () => {
    events?.close();
    for (const w of workers) w.child.kill('SIGKILL');
    await Promise.all(workers.map((w) => w.exited));
    for (const name of [QUEUES.learn, QUEUES.retarget, QUEUES.mail]) {
      await app?.get<Queue>(getQueueToken(name)).obliterate({ force: true });
    }
    await app?.close();
  });

  it('a killed worker’s learn job runs again on another worker and fills the profile once', async () => {
    const first = await worker('crash-a');
    const res = await request(world.server)
      .post(api('/profiles'))
      .set('Cookie', ta.cookie)
      .send({ name: 'tube, interrupted', captureId: lib.captureId, characterId: lib.characterId });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    profileId = res.body.id;
    const jobId = res.body.job.id as string;
    // Killed while the solver thread learns.
    const solving = await waitForRow(LearnJob, jobId, (j) =>
      LEARN_SOLVER_STAGES.includes(j.stage ?? ''),
    );
    first.child.kill('SIGKILL');
    await first.exited;
    expect(solving.state).toBe('solving');

    await worker('crash-b');
    const job = await waitForJob(world, ta, show.id, jobId);
    expect(job).toMatchObject({ state: 'solved', attempts: 2, errorCode: null });
    expect(await statesUntilSolved(jobId)).toEqual([
      'queued',
      'solving',
      'queued',
      'solving',
      'solved',
    ]);
    const profile = await request(world.server)
      .get(api(`/profiles/${profileId}`))
      .set('Cookie', ta.cookie);
    expect(profile.body.state).toBe('ready');
    expect(profile.body.modes.length).toBeGreaterThan(0);
    expect(await app.get(StorageService).list(`shows/${show.id}/jobs/${jobId}/`)).toEqual([
      `shows/${show.id}/jobs/${jobId}/profile.ovsp`,
    ]);
  }, 240_000);

  it('a killed worker’s retarget job runs again and makes exactly one take', async () => {
    const shot = await request(world.server).post(api('/shots')).set('Cookie', ta.cookie).send({
      sequence: 'SQ300',
      code: 'SQ300_0010',
      frameStart: 0,
      frameEnd: 719,
      fps: 24,
      characterId: lib.characterId,
      clipId: lib.clipId,
    });
    expect(shot.status, JSON.stringify(shot.body)).toBe(201);
    const res = await request(world.server)
      .post(api(`/shots/${shot.body.id}/jobs`))
      .set('Cookie', ta.cookie)
      .send({ profileId });
    expect(res.status, JSON.stringify(res.body)).toBe(202);
    const jobId = res.body.id as string;
    await waitForRow(RetargetJob, jobId, (j) => j.state === 'solving');
    const running = workers.at(-1) as WorkerProcess;
    running.child.kill('SIGKILL');
    await running.exited;
    expect(await world.em().count(Take, { job: jobId })).toBe(0);

    await worker('crash-c');
    const job = await waitForJob(world, ta, show.id, jobId);
    expect(job).toMatchObject({ state: 'solved', attempts: 2, takeId: expect.any(String) });
    const takes = await world.em().find(Take, { shot: shot.body.id });
    expect(takes.map((t) => [t.version, t.job.id])).toEqual([[1, jobId]]);
    expect(await app.get(StorageService).list(`shows/${show.id}/jobs/${jobId}/`)).toEqual([
      `shows/${show.id}/jobs/${jobId}/take.glb`,
    ]);
    const file = await request(world.server)
      .get(api(`/takes/${job.takeId}/file`))
      .set('Cookie', ta.cookie)
      .buffer(true)
      .parse(binary);
    expect((await readTakeGlb(new Uint8Array(file.body as Buffer))).extras.frameCount).toBe(720);

    // Told to stop (SIGTERM), a worker hands its running job straight back to the queue.
    const again = await request(world.server)
      .post(api(`/shots/${shot.body.id}/jobs`))
      .set('Cookie', ta.cookie)
      .send({ profileId, controls: { gain: 2 } });
    expect(again.status).toBe(202);
    await waitForRow(RetargetJob, again.body.id, (j) => j.state === 'solving');
    const stopping = workers.at(-1) as WorkerProcess;
    stopping.child.kill('SIGTERM');
    // Handed back at once (no grace here), while the rest of the worker shuts down.
    const handedBack = await waitForRow(RetargetJob, again.body.id, (j) => j.state !== 'solving');
    expect([handedBack.state, handedBack.attempts]).toEqual(['queued', 1]);
    expect(handedBack.errorMessage).toMatch(/shut down/);
    const queue = app.get<Queue>(getQueueToken(QUEUES.retarget));
    for (let i = 0; i < 100 && (await queue.getJobState(again.body.id)) === 'active'; i++)
      await new Promise((r) => setTimeout(r, 50));
    expect(['waiting', 'delayed', 'prioritized']).toContain(await queue.getJobState(again.body.id));

    await worker('crash-d');
    const second = await waitForJob(world, ta, show.id, again.body.id);
    expect(second).toMatchObject({ state: 'solved', attempts: 2 });
    expect(await stopping.exited).toEqual({ code: null, signal: 'SIGTERM' });
    const all = await world
      .em()
      .find(Take, { shot: shot.body.id }, { orderBy: { version: 'asc' } });
    expect(all.map((t) => [t.version, t.job.id])).toEqual([
      [1, jobId],
      [2, again.body.id],
    ]);
  }, 300_000);
});
