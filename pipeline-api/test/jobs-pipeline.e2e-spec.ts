// The whole path over HTTP with the sample files and the stack's worker: presigned multipart
// uploads and their ingest check, learning the demo capture, the joint map onto another
// character, retargeting into takes, the take file read back with the solver, notes, decisions,
// and the e-mails the people concerned get, read back from the SMTP sink.
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readTakeGlb } from '@overshoot/solver';
import { createTestApp } from './app-factory';
import { World, type TestUser } from './support/world';
import { uploadFile } from './support/uploads';
import { waitForMail } from './support/mail-sink';
import { waitForJob } from './support/jobs';
import { binary } from './support/job-setup';
import { Role } from '../src/users/entities/role';
import { Take } from '../src/takes/entities/take.entity';
import type { Show } from '../src/shows/entities/show.entity';
import type { JobView } from '../src/jobs/job-view';

const SAMPLES = join(__dirname, '..', '..', 'assets-sample', 'files');
const sample = async (path: string) => new Uint8Array(await readFile(join(SAMPLES, path)));

/** The demo capture's drivers (named for the coach) onto the swimmer's skeleton. */
const COACH_TO_SWIMMER = {
  Hips: 'pelvis',
  Spine: 'spine_01',
  Spine1: 'spine_02',
  Spine2: 'spine_03',
  Head: 'head',
  LeftArm: 'upperarm_l',
  RightArm: 'upperarm_r',
};

describe('from upload to approval, over HTTP', () => {
  let app: NestExpressApplication;
  let world: World;
  let show: Show;
  let ta: TestUser & { cookie: string };
  let animator: TestUser & { cookie: string };
  let supervisor: TestUser & { cookie: string };
  const api = (path: string) => `/api/shows/${show.id}${path}`;
  const get = (path: string, cookie = ta.cookie) =>
    request(world.server).get(api(path)).set('Cookie', cookie);
  const post = (path: string, body: object, cookie = ta.cookie) =>
    request(world.server).post(api(path)).set('Cookie', cookie).send(body);

  /** Uploads a sample file and waits for its check; returns the library row's id. */
  async function upload(kind: string, path: string, list: string, extra: object = {}) {
    const assetId = await uploadFile(world, ta.cookie, show.id, {
      kind,
      fileName: path.split('/').pop() as string,
      bytes: await sample(path),
      extra,
    });
    const until = Date.now() + 120_000;
    for (;;) {
      const asset = await get(`/assets/${assetId}`);
      if (asset.body.state === 'ready') break;
      expect(asset.body.state, JSON.stringify(asset.body.validationReport)).toBe('pending');
      if (Date.now() > until) throw new Error(`${path} still unchecked`);
      await new Promise((r) => setTimeout(r, 200));
    }
    const rows = await get(`/${list}`);
    return (rows.body as { id: string; assetId: string }[]).find((r) => r.assetId === assetId)
      ?.id as string;
  }

  beforeAll(async () => {
    app = await createTestApp();
    world = new World(app);
    show = await world.show('Pipeline show');
    ta = await world.member(Role.TechnicalArtist, [show]);
    animator = await world.member(Role.Animator, [show]);
    supervisor = await world.member(Role.Supervisor, [show]);
  });
  afterAll(async () => {
    await app?.close();
  });

  it('uploads, learns, retargets, reviews and approves, e-mailing the people concerned', async () => {
    const t0 = Date.now();
    const characters: Record<string, string> = {};
    for (const name of ['coach-madge', 'swimmer-otto', 'creature-grumbletusk']) {
      characters[name] = await upload('character', `characters/${name}.glb`, 'characters');
    }
    const clipId = await upload('clip', 'clips/swimmer-run.glb', 'clips');
    const captureId = await upload('capture', 'captures/coach-poolside-drill.glb', 'captures', {
      characterId: characters['coach-madge'],
      consent: {
        performerCode: 'PRF-0042',
        scope: 'Tests of the pipeline',
        expiresOn: '2099-06-30',
      },
    });
    const uploaded = Date.now();

    // Learn the demo capture on the coach.
    const learn = await post('/profiles', {
      name: 'Coach poolside drill',
      captureId,
      characterId: characters['coach-madge'],
    });
    expect(learn.status, JSON.stringify(learn.body)).toBe(202);
    expect(learn.body).toMatchObject({ state: 'queued', job: { kind: 'learn', state: 'queued' } });
    const seen = new Set<number>();
    const learned = await waitForJob(
      world,
      ta,
      show.id,
      learn.body.job.id,
      (j) => {
        seen.add(j.percent);
        return ['solved', 'failed', 'canceled'].includes(j.state);
      },
      300_000,
    );
    expect(learned, JSON.stringify(learned)).toMatchObject({ state: 'solved', percent: 100 });
    // Polling saw it part-way, not only queued and done.
    expect([...seen].some((p) => p > 0 && p < 100)).toBe(true);
    const profile = (await get(`/profiles/${learn.body.id}`, animator.cookie)).body;
    expect(profile.state).toBe('ready');
    // The sample capture carries seven tissue modes (assets-sample manifest).
    expect(profile.modes.length).toBeGreaterThanOrEqual(5);
    expect(profile.modes.map((m: { region: string }) => m.region)).toContain('belly');
    expect(profile.fitReport.varianceExplained).toBeGreaterThan(0);
    const learnedAt = Date.now();

    // A shot of the swimmer running; the coach's drivers need a joint map there.
    const shot = await post('/shots', {
      sequence: 'SQ200',
      code: 'SQ200_0010',
      frameStart: 0,
      frameEnd: 95,
      fps: 24,
      characterId: characters['swimmer-otto'],
      clipId,
      assigneeIds: [animator.user.id],
    });
    expect(shot.status, JSON.stringify(shot.body)).toBe(201);
    const auto = await get(
      `/shots/${shot.body.id}/joint-map?profileId=${profile.id}`,
      animator.cookie,
    );
    expect(auto.status).toBe(200);
    expect(auto.body.essentialUnmapped).toEqual(expect.arrayContaining(['Hips', 'LeftArm']));
    const refused = await post(`/shots/${shot.body.id}/jobs`, { profileId: profile.id });
    expect(refused.status).toBe(400);
    expect(refused.body.code).toBe('UNMAPPED_DRIVERS');
    expect(refused.body.details.drivers.map((d: { joint: string }) => d.joint).sort()).toEqual(
      [...auto.body.essentialUnmapped].sort(),
    );

    const submitted = await post(`/shots/${shot.body.id}/jobs`, {
      profileId: profile.id,
      jointMap: COACH_TO_SWIMMER,
    });
    expect(submitted.status, JSON.stringify(submitted.body)).toBe(202);
    const v1job = await waitForJob(world, ta, show.id, submitted.body.id, undefined, 180_000);
    expect(v1job, JSON.stringify(v1job)).toMatchObject({
      state: 'solved',
      takeId: expect.any(String),
    });
    const retargetedAt = Date.now();

    const file = await get(`/takes/${v1job.takeId}/file`, animator.cookie)
      .buffer(true)
      .parse(binary);
    expect(file.status).toBe(200);
    const take = await readTakeGlb(new Uint8Array(file.body as Buffer));
    expect(take.extras.frameCount).toBe(96);
    expect(take.extras.fps).toBe(24);
    expect(take.extras.modes.length).toBe(profile.modes.length);
    const creatorMail = await waitForMail(ta.email, /^Take ready for review: .* SQ200_0010 v1$/);
    const assigneeMail = await waitForMail(
      animator.email,
      /^Take ready for review: .* SQ200_0010 v1$/,
    );
    expect(assigneeMail.text).toContain(`/takes/${v1job.takeId}`);
    expect(creatorMail.subject).toBe(assigneeMail.subject);

    // Review: a note on a frame, changes requested, a re-solve by the animator, approval.
    const note = await post(
      `/takes/${v1job.takeId}/notes`,
      { frame: 40, text: 'Belly settles too slowly after the footfall.' },
      supervisor.cookie,
    );
    expect(note.status, JSON.stringify(note.body)).toBe(201);
    const changes = await post(
      `/takes/${v1job.takeId}/decisions`,
      { decision: 'changes_requested', comment: 'Less gain on the belly.' },
      supervisor.cookie,
    );
    expect(changes.status, JSON.stringify(changes.body)).toBe(201);
    const changesMail = await waitForMail(animator.email, /^Changes requested: .* SQ200_0010 v1$/);
    expect(changesMail.text).toContain('Less gain on the belly.');

    const resolve = await post(
      `/shots/${shot.body.id}/jobs`,
      {
        profileId: profile.id,
        jointMap: COACH_TO_SWIMMER,
        baseTakeId: v1job.takeId,
        controls: { gain: 0.7, regionGains: { belly: 0.6 } },
      },
      animator.cookie,
    );
    expect(resolve.status, JSON.stringify(resolve.body)).toBe(202);
    const v2job: JobView = await waitForJob(
      world,
      animator,
      show.id,
      resolve.body.id,
      undefined,
      180_000,
    );
    expect(v2job.state).toBe('solved');
    const v2 = (await get(`/takes/${v2job.takeId}`, supervisor.cookie)).body;
    expect(v2).toMatchObject({
      version: 2,
      reviewState: 'awaiting_review',
      createdBy: animator.user.id,
    });
    expect(v2.controls).toMatchObject({ gain: 0.7, regionGains: { belly: 0.6 } });
    await waitForMail(animator.email, /^Take ready for review: .* SQ200_0010 v2$/);
    const approved = await post(
      `/takes/${v2job.takeId}/decisions`,
      { decision: 'approved' },
      supervisor.cookie,
    );
    expect(approved.status, JSON.stringify(approved.body)).toBe(201);
    await waitForMail(animator.email, /^Approved: .* SQ200_0010 v2$/);

    const final = (await get(`/shots/${shot.body.id}`, supervisor.cookie)).body;
    expect(final).toMatchObject({
      solveState: 'solved',
      reviewState: 'approved',
      latestTakeVersion: 2,
    });
    expect(await world.em().count(Take, { shot: shot.body.id })).toBe(2);
    // Figures for the report (not asserted: speed belongs in benchmarks).
    console.log(
      `pipeline: uploads+ingest ${((uploaded - t0) / 1000).toFixed(1)} s, learn ${((learnedAt - uploaded) / 1000).toFixed(1)} s, ` +
        `retarget v1 ${((retargetedAt - learnedAt) / 1000).toFixed(1)} s (worker: learn job ${seconds(learned)} s, ` +
        `retarget job ${seconds(v1job)} s, re-solve ${seconds(v2job)} s)`,
    );
  }, 900_000);
});

/** Wall time of a job from its start to its end. */
const seconds = (j: JobView) =>
  ((Date.parse(j.finishedAt as string) - Date.parse(j.startedAt as string)) / 1000).toFixed(0);
