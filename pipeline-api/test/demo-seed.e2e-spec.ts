// The demo seeder as `npm start` runs it — the built `setup.js --demo` — against a database and a
// bucket of its own (never the shared test database: the seeder loads only into an empty one).
// Expected figures come from the demo file and the files on disk, not from the seeder.
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { MikroORM } from '@mikro-orm/mariadb';
import { CreateBucketCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { readProfile, readTakeGlb } from '@overshoot/solver';
import { ROOT, serviceEnv, stackConfig } from '../../scripts/stack/config';
import { ensureDatabase } from '../../scripts/stack/mariadb';
import { validateEnv, type Env } from '../src/config/env.validation';
import { ormConfig } from '../src/database/mikro-orm.config';
import { StorageService } from '../src/storage/storage.service';
import { readObject } from '../src/jobs/solve/object-store';
import { Asset, AssetState } from '../src/assets/entities/asset.entity';
import { Capture } from '../src/library/entities/capture.entity';
import { ProfileState, TissueProfile } from '../src/library/entities/tissue-profile.entity';
import { Shot } from '../src/shots/entities/shot.entity';
import { Take } from '../src/takes/entities/take.entity';
import { Note } from '../src/reviews/entities/note.entity';
import { ReviewDecision } from '../src/reviews/entities/review-decision.entity';
import { User } from '../src/users/entities/user.entity';
import { Membership } from '../src/shows/entities/membership.entity';
import { JobState } from '../src/jobs/job-state';
import { ReviewState } from '../src/takes/review-state';
import { demoShowId } from '../src/seed/seed-demo';
import { createTestApp } from './app-factory';
import { randomIp, sessionCookie, uniq, World } from './support/world';
import { startWorker } from './support/worker-process';
import { waitForJob } from './support/jobs';

const cfg = stackConfig('test');
const DB_NAME = `${cfg.mariadb.database}_demo`;
const BUCKET = `${cfg.s3.bucket}-demo`;
const FILES = join(ROOT, 'assets-sample', 'files');
const demo = JSON.parse(readFileSync(join(FILES, 'show', 'demo-show.json'), 'utf8'));
const REPORT = join(cfg.dataDir, 'demo-seed-spec-report.json');
const sha256 = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');
const day = (offset: number) =>
  new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

/** Runs the built set-up with the demo step on the spec's own database and bucket. */
async function setupDemo(): Promise<{ stdout: string; report: Record<string, unknown> }> {
  rmSync(REPORT, { force: true });
  const { stdout } = await promisify(execFile)(
    process.execPath,
    [join(ROOT, 'pipeline-api', 'dist', 'setup.js'), '--demo', '--report', REPORT],
    {
      env: { ...process.env, ...serviceEnv(cfg), DB_NAME, S3_BUCKET: BUCKET },
      timeout: 300_000,
      maxBuffer: 10_000_000,
    },
  );
  return { stdout, report: JSON.parse(readFileSync(REPORT, 'utf8')) };
}

/** Row counts of every table, and every object in the bucket with its size. */
async function snapshot(): Promise<{ tables: Record<string, number>; objects: string[] }> {
  const conn = orm.em.getConnection();
  const tables: { t: string }[] = await conn.execute(
    'select table_name as t from information_schema.tables where table_schema = ?',
    [DB_NAME],
  );
  const counts: Record<string, number> = {};
  for (const { t } of tables) {
    const [row] = await conn.execute(`select count(*) as n from \`${t}\``);
    counts[t] = Number(row.n);
  }
  const objects = (await storage.list('')).sort();
  const sizes = await Promise.all(objects.map(async (k) => `${k} ${await storage.size(k)}`));
  return { tables: counts, objects: sizes };
}

let env: Env;
let orm: MikroORM;
let storage: StorageService;
let first: Awaited<ReturnType<typeof setupDemo>>;
const showId = demoShowId(demo.show.code);
const leftover = `shows/${showId}/jobs/interrupted-run/take.glb`;

beforeAll(async () => {
  ensureDatabase({ ...cfg.mariadb, database: DB_NAME }, { fresh: true });
  env = Object.assign(validateEnv(process.env), { DB_NAME, S3_BUCKET: BUCKET });
  storage = new StorageService(env);
  await storage.client.send(new CreateBucketCommand({ Bucket: BUCKET })).catch(() => undefined);
  for (const key of await storage.list('')) await storage.delete(key);
  // What a run cut short before its database write leaves behind.
  await storage.client.send(
    new PutObjectCommand({ Bucket: BUCKET, Key: leftover, Body: new Uint8Array([1, 2, 3]) }),
  );
  first = await setupDemo();
  orm = await MikroORM.init(ormConfig(env));
}, 400_000);

afterAll(async () => {
  await orm?.close();
  storage?.onModuleDestroy();
});

describe('demo seeder (setup.js --demo on an empty database)', () => {
  it('loads the people, the show and its memberships as the demo file lists them', async () => {
    const em = orm.em.fork();
    const users = await em.find(User, {}, { orderBy: { email: 'asc' } });
    expect(users.map((u) => [u.email, u.role])).toEqual(
      [...demo.users]
        .sort((a, b) => a.email.localeCompare(b.email))
        .map((u: { email: string; role: string }) => [u.email, u.role.replace(' ', '_')]),
    );
    expect(await em.count(Membership, { show: showId })).toBe(demo.members.length);
    expect(first.stdout).toMatch(/learn: .* %/);
  });

  it('stores every file as a ready asset whose object in the bucket is that file', async () => {
    const em = orm.em.fork();
    const assets = await em.find(Asset, { show: showId });
    const paths = [
      ...demo.characters.map((c: { file: string }) => c.file),
      ...demo.clips.map((c: { bvh: string }) => c.bvh),
      ...demo.captures.map((c: { file: string }) => c.file),
    ];
    expect(assets).toHaveLength(paths.length);
    for (const path of paths) {
      const bytes = readFileSync(join(FILES, path));
      const asset = assets.find((a) => a.originalName === path.split('/').pop());
      expect(asset, path).toBeDefined();
      expect(asset?.state).toBe(AssetState.Ready);
      expect(asset?.sha256).toBe(sha256(bytes));
      expect(sha256(await readObject(storage, asset!.s3Key)), path).toBe(sha256(bytes));
    }
    expect(await storage.size(leftover)).toBeNull();
  });

  it('records each capture with its consent record', async () => {
    const captures = await orm.em
      .fork()
      .find(Capture, { show: showId }, { populate: ['asset', 'consentRecordedBy'] });
    expect(captures).toHaveLength(demo.captures.length);
    for (const c of demo.captures) {
      const row = captures.find((r) => r.asset.originalName === c.file.split('/').pop());
      expect(row?.consentScope).toBe(c.consent.scope);
      expect(row?.consentExpiresOn).toBe(day(c.consent.expiresInDays));
      expect(row?.consentRecordedBy.email).toBe(c.consent.recordedBy);
      expect(row?.frameCount).toBeGreaterThan(0);
    }
  });

  it('learns the profile: modes, fit report, spectra and a profile file the solver reads', async () => {
    const profiles = await orm.em.fork().find(TissueProfile, { show: showId });
    expect(profiles.map((p) => p.name)).toEqual(
      demo.profilesToLearn.map((p: { name: string }) => p.name),
    );
    const [p] = profiles;
    expect(p.state).toBe(ProfileState.Ready);
    expect(p.modes?.length).toBeGreaterThan(0);
    expect(p.spectra?.length).toBeGreaterThan(0);
    expect(typeof p.fitReport?.oneStepNrmse).toBe('number');
    const file = readProfile(await readObject(storage, p.files![0]));
    expect(file.modes.map((m) => m.frequencyHz)).toEqual(p.modes!.map((m) => m.frequencyHz));
  });

  it('creates the shots with their due dates and real take files for the shots the notes name', async () => {
    const em = orm.em.fork();
    const shots = await em.find(Shot, { show: showId }, { populate: ['assignees'] });
    expect(shots.map((s) => s.code).sort()).toEqual(
      demo.shots.map((s: { code: string }) => s.code).sort(),
    );
    for (const s of demo.shots) {
      const row = shots.find((r) => r.code === s.code)!;
      expect(row.dueDate).toBe(day(s.dueInDays));
      expect(
        row.assignees
          .getItems()
          .map((u) => u.email)
          .sort(),
      ).toEqual([...s.assignees].sort());
    }
    const takes = await em.find(Take, { show: showId }, { populate: ['job', 'shot'] });
    for (const code of new Set(demo.notes.map((n: { shot: string }) => n.shot))) {
      expect(
        takes.some((t) => t.shot.code === code),
        `a take of ${code}`,
      ).toBe(true);
    }
    for (const take of takes) {
      expect(take.job.state).toBe(JobState.Solved);
      const file = await readTakeGlb(await readObject(storage, take.files[0]));
      expect(file.extras.frameCount).toBe(take.shot.frameEnd - take.shot.frameStart + 1);
      expect(take.shot.latestTakeVersion).toBeGreaterThanOrEqual(take.version);
    }
  });

  it('pins the notes and records the decisions they imply', async () => {
    const em = orm.em.fork();
    const notes = await em.find(Note, { take: { show: showId } }, { populate: ['take.shot'] });
    expect(notes).toHaveLength(demo.notes.length);
    const resolved = demo.notes.filter((n: { state: string }) => n.state === 'resolved');
    expect(notes.filter((n) => n.resolved)).toHaveLength(resolved.length);
    const decisions = await em.find(
      ReviewDecision,
      { take: { show: showId } },
      { populate: ['take.shot'] },
    );
    // A take whose only supervisor note is resolved is approved; one with an open note is not.
    const approved = decisions.filter((d) => d.decision === ReviewState.Approved);
    expect(approved.map((d) => d.take.shot.code)).toEqual(
      resolved.map((n: { shot: string }) => n.shot),
    );
    for (const d of decisions) expect(d.take.shot.reviewState).toBe(d.decision);
  });

  it('reports the demo sign-ins, and each demo user signs in and sees the show', async () => {
    expect(first.report.demo).toBe('loaded');
    const signIns = first.report.signIns as { email: string; password: string }[];
    expect(signIns.map((s) => s.email).sort()).toEqual(
      demo.users.map((u: { email: string }) => u.email).sort(),
    );
    const app: NestExpressApplication = await createTestApp({
      env: { DB_NAME, S3_BUCKET: BUCKET },
    });
    try {
      for (const s of signIns) {
        const res = await request(app.getHttpServer())
          .post('/api/auth/sign-in')
          .set('X-Forwarded-For', randomIp())
          .send({ email: s.email, password: s.password });
        expect(res.status, s.email).toBe(200);
        const cookie = sessionCookie(res.headers['set-cookie']);
        const shows = await request(app.getHttpServer()).get('/api/shows').set('Cookie', cookie);
        expect(shows.body.map((x: { code: string }) => x.code)).toContain(demo.show.code);
        const list = await request(app.getHttpServer())
          .get(`/api/shows/${showId}/shots`)
          .set('Cookie', cookie);
        expect(list.body.total).toBe(demo.shots.length);
      }
    } finally {
      await app.close();
    }
  });

  it('changes nothing when run again', async () => {
    const before = await snapshot();
    const again = await setupDemo();
    expect(again.report.demo).toBe('present');
    expect(again.stdout).toMatch(/demo show not loaded now/);
    expect(await snapshot()).toEqual(before);
  }, 120_000);
  it("lets a producer set a demo shot's due date, and re-solves it over the shot's frames", async () => {
    // A worker of the spec's own on the demo database and bucket, on a queue prefix of its own.
    const prefix = `${process.env.REDIS_PREFIX}-demo-${uniq()}`;
    const own = { DB_NAME, S3_BUCKET: BUCKET, REDIS_PREFIX: prefix };
    const worker = await startWorker('demo-resolve', own);
    const app: NestExpressApplication = await createTestApp({ env: own });
    try {
      const signIns = first.report.signIns as { role: string; email: string; password: string }[];
      const cookieOf = async (role: string) => {
        const who = signIns.find((x) => x.role === role);
        if (!who) throw new Error(`no demo ${role}`);
        const res = await request(app.getHttpServer())
          .post('/api/auth/sign-in')
          .set('X-Forwarded-For', randomIp())
          .send({ email: who.email, password: who.password });
        return sessionCookie(res.headers['set-cookie']);
      };
      const em = orm.em.fork();
      const [profile] = await em.find(TissueProfile, { show: showId });
      const take = await em.findOneOrFail(
        Take,
        { show: showId, shot: { character: profile.character } },
        { populate: ['shot'], orderBy: { version: 'desc' } },
      );
      const shot = take.shot;
      expect(shot.frameStart).toBe(demo.shots[0].frameStart);
      const api = (path: string) => `/api/shows/${showId}/shots/${shot.id}${path}`;

      const due = await request(app.getHttpServer())
        .patch(api(''))
        .set('Cookie', await cookieOf('producer'))
        .send({ dueDate: day(30) });
      expect(due.status, JSON.stringify(due.body)).toBe(200);
      expect(due.body.dueDate).toBe(day(30));

      const artist = await cookieOf('technical artist');
      const submitted = await request(app.getHttpServer())
        .post(api('/jobs'))
        .set('Cookie', artist)
        .send({ profileId: profile.id, baseTakeId: take.id, controls: { gain: 0.8 } });
      expect(submitted.status, JSON.stringify(submitted.body)).toBe(202);
      const job = await waitForJob(new World(app), { cookie: artist }, showId, submitted.body.id);
      expect(job, JSON.stringify(job)).toMatchObject({ state: 'solved', attempts: 1 });
      const again = await em.fork().findOneOrFail(Take, job.takeId as string);
      expect(again.version).toBe(take.version + 1);
      const file = await readTakeGlb(await readObject(storage, again.files[0]));
      expect(file.extras.frameCount).toBe(shot.frameEnd - shot.frameStart + 1);
      expect(again.metrics?.frameCount).toBe(shot.frameEnd - shot.frameStart + 1);
    } finally {
      await app.close();
      worker.child.kill('SIGTERM');
      await worker.exited;
    }
  }, 120_000);
});
