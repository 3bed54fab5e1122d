// Set-up shared by the job tests: a show with a technical artist and an animator, a stored tube
// library, a profile learned from it through the API and the stack's worker, and shots on it.
import request from 'supertest';
import { expect } from 'vitest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { World, type TestUser } from './world';
import { storedLibrary, type StoredLibrary } from './stored-library';
import { tubeCaptureGlb, tubeCharacterGlb, tubeClipBvh, type TubeSize } from './solver-fixtures';
import { waitForJob } from './jobs';
import { Role } from '../../src/users/entities/role';
import type { Show } from '../../src/shows/entities/show.entity';
import type { JobView } from '../../src/jobs/job-view';

/** The small tube every quick job test uses: learning and retargeting take moments. */
export const SMALL_TUBE: TubeSize = { rings: 4, sides: 6 };

/** A show ready for jobs. */
export interface JobShow {
  world: World;
  show: Show;
  ta: TestUser & { cookie: string };
  animator: TestUser & { cookie: string };
  lib: StoredLibrary;
  api: (path: string) => string;
}

/** A show with its people and a stored tube library (3 s capture, 2 s clip at 24 fps). */
export async function jobShow(app: NestExpressApplication, name: string): Promise<JobShow> {
  const world = new World(app);
  const show = await world.show(name);
  const ta = await world.member(Role.TechnicalArtist, [show]);
  const animator = await world.member(Role.Animator, [show]);
  const lib = await storedLibrary(world, show.id, ta.user, await tubeFiles());
  return { world, show, ta, animator, lib, api: (path) => `/api/shows/${show.id}${path}` };
}

/** The small tube's files. */
export const tubeFiles = async (consentExpiresOn?: string) => ({
  character: await tubeCharacterGlb(SMALL_TUBE),
  capture: await tubeCaptureGlb(SMALL_TUBE, 3),
  clip: tubeClipBvh(48),
  consentExpiresOn,
});

/** Asks for a profile of the library's capture; returns the 202 answer's body. */
export async function requestProfile(s: JobShow): Promise<{ id: string; job: JobView }> {
  const res = await request(s.world.server)
    .post(s.api('/profiles'))
    .set('Cookie', s.ta.cookie)
    .send({
      name: 'tube wobble',
      captureId: s.lib.captureId,
      characterId: s.lib.characterId,
      options: { maxModes: 8 },
    });
  expect(res.status, JSON.stringify(res.body)).toBe(202);
  return res.body;
}

/** Learns a profile through the worker; returns its id once ready. */
export async function learnedProfile(s: JobShow): Promise<string> {
  const asked = await requestProfile(s);
  const job = await waitForJob(s.world, s.ta, s.show.id, asked.job.id);
  expect(job.state, JSON.stringify(job)).toBe('solved');
  return asked.id;
}

/** A shot on the library's character and clip, assigned to the animator. */
export async function newShot(
  s: JobShow,
  fields: { frameStart: number; frameEnd: number; fps: number },
): Promise<{ id: string }> {
  const res = await request(s.world.server)
    .post(s.api('/shots'))
    .set('Cookie', s.ta.cookie)
    .send({
      sequence: 'SQ100',
      code: `SQ100_${Math.floor(Math.random() * 1e6)}`,
      characterId: s.lib.characterId,
      clipId: s.lib.clipId,
      assigneeIds: [s.animator.user.id],
      ...fields,
    });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body;
}

/** Submits a retarget job of the shot; returns the raw answer. */
export const submitJob = (s: JobShow, shotId: string, body: object, cookie = s.ta.cookie) =>
  request(s.world.server)
    .post(s.api(`/shots/${shotId}/jobs`))
    .set('Cookie', cookie)
    .send(body);

/** Collects a binary body (files). */
export function binary(res: request.Response, done: (err: Error | null, body: Buffer) => void) {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}
