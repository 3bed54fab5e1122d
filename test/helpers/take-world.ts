// Everything a take test needs, made through the API: a show, a technical artist, an animator
// and a supervisor (invited by the admin, invitations accepted from the local mail sink), the
// demo character, clip and capture uploaded, a tissue profile learned by the worker, a shot and a
// retarget job whose take the tests open.
import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { API_URL } from './env.ts';
import { ApiSession, pollUntil, TEST_PERSON_PASSWORD, uniq } from './take-api.ts';

const FILES = fileURLToPath(new URL('../../assets-sample/files/', import.meta.url));

/** A role the take tests sign in as. */
export type TakeRole = 'technical_artist' | 'animator' | 'supervisor';

/** The made-up world of one test file. */
export interface TakeWorld {
  showId: string;
  shotId: string;
  profileId: string;
  takeId: string;
  /** Shot frame range (inclusive) and rate. */
  frameStart: number;
  frameEnd: number;
  fps: number;
  people: Record<TakeRole, { email: string; password: string; session: ApiSession }>;
}

/** The first frame of the world's shot (the last is 599 frames later). */
export const TAKE_WORLD_FIRST_FRAME = 1001;

async function invite(admin: ApiSession, showId: string, role: TakeRole) {
  const email = `${role.replace('_', '-')}.${uniq()}@example.test`;
  await admin.call('POST', '/admin/invitations', { email, role, showIds: [showId] });
  const mail = await pollUntil(
    `invitation e-mail to ${email}`,
    () => admin.call<{ to: string[]; text: string }[]>('GET', '/admin/outbox'),
    (list) => list.some((m) => m.to.some((t) => t.includes(email))),
    { timeoutMs: 20_000 },
  );
  const text = mail.find((m) => m.to.some((t) => t.includes(email)))?.text ?? '';
  const token = /#token=([A-Za-z0-9_-]+)/.exec(text)?.[1];
  if (!token) throw new Error(`no invitation link in the e-mail to ${email}: ${text}`);
  const displayName = `Test ${role.replace('_', ' ')} ${uniq()}`;
  const anon = await fetch(`${API_URL}/api/auth/invitations/accept`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ token, displayName, password: TEST_PERSON_PASSWORD }),
  });
  if (!anon.ok)
    throw new Error(`accepting the invitation of ${email}: ${anon.status} ${await anon.text()}`);
  const session = await ApiSession.signIn(email, TEST_PERSON_PASSWORD);
  return { email, password: TEST_PERSON_PASSWORD, session };
}

async function waitReady(ta: ApiSession, showId: string, assetId: string) {
  const asset = await pollUntil(
    `ingest of ${assetId}`,
    () =>
      ta.call<{ state: string; validationReport: unknown }>(
        'GET',
        `/shows/${showId}/assets/${assetId}`,
      ),
    (a) => a.state !== 'pending',
    { timeoutMs: 60_000 },
  );
  if (asset.state !== 'ready')
    throw new Error(`asset ${assetId} was refused: ${JSON.stringify(asset)}`);
}

async function libraryId(ta: ApiSession, showId: string, list: string, assetId: string) {
  const items = await ta.call<
    { id: string; assetId: string }[] | { items: { id: string; assetId: string }[] }
  >('GET', `/shows/${showId}/${list}`);
  const found = (Array.isArray(items) ? items : items.items).find((i) => i.assetId === assetId);
  if (!found) throw new Error(`no ${list} entry for asset ${assetId}`);
  return found.id;
}

/** Waits for a retarget job to solve; returns its take id. */
export async function waitForTake(
  session: ApiSession,
  showId: string,
  jobId: string,
): Promise<string> {
  const job = await pollUntil(
    `retarget job ${jobId}`,
    () =>
      session.call<{ state: string; takeId: string | null }>(
        'GET',
        `/shows/${showId}/jobs/${jobId}`,
      ),
    (j) => ['solved', 'failed', 'canceled'].includes(j.state),
    { timeoutMs: 120_000, everyMs: 500 },
  );
  if (job.state !== 'solved' || !job.takeId)
    throw new Error(`retarget job ended ${JSON.stringify(job)}`);
  return job.takeId;
}

/** Builds the world (about a minute: the worker learns a profile and solves a take). */
export async function makeTakeWorld(): Promise<TakeWorld> {
  const admin = await ApiSession.admin();
  const show = await admin.call<{ id: string }>('POST', '/admin/shows', {
    code: `TK${uniq()}`.toUpperCase().slice(0, 16),
    name: 'Take player tests (invented data)',
  });
  const people = {
    technical_artist: await invite(admin, show.id, 'technical_artist'),
    animator: await invite(admin, show.id, 'animator'),
    supervisor: await invite(admin, show.id, 'supervisor'),
  };
  const ta = people.technical_artist.session;
  const read = async (p: string) => new Uint8Array(await readFile(`${FILES}${p}`));
  const characterAsset = await ta.upload(show.id, {
    kind: 'character',
    fileName: 'coach-madge.glb',
    bytes: await read('characters/coach-madge.glb'),
    extra: { name: 'coach-madge' },
  });
  const clipAsset = await ta.upload(show.id, {
    kind: 'clip',
    fileName: 'coach-poolside-drill.glb',
    bytes: await read('clips/coach-poolside-drill.glb'),
    extra: { name: 'coach-poolside-drill' },
  });
  await waitReady(ta, show.id, characterAsset);
  await waitReady(ta, show.id, clipAsset);
  const characterId = await libraryId(ta, show.id, 'characters', characterAsset);
  const clipId = await libraryId(ta, show.id, 'clips', clipAsset);
  const captureAsset = await ta.upload(show.id, {
    kind: 'capture',
    fileName: 'coach-whistle-and-bounce.glb',
    bytes: await read('captures/coach-whistle-and-bounce.glb'),
    extra: {
      characterId,
      consent: { performerCode: 'PRF-TEST-1', scope: 'Take player tests', expiresOn: '2099-12-31' },
    },
  });
  await waitReady(ta, show.id, captureAsset);
  const captureId = await libraryId(ta, show.id, 'captures', captureAsset);
  const profile = await ta.call<{ id: string }>('POST', `/shows/${show.id}/profiles`, {
    name: 'Coach whistle and bounce (test)',
    captureId,
    characterId,
  });
  await pollUntil(
    `learning profile ${profile.id}`,
    () =>
      ta.call<{ state: string; job: unknown }>('GET', `/shows/${show.id}/profiles/${profile.id}`),
    (p) => p.state === 'ready' || p.state === 'failed',
    { timeoutMs: 180_000, everyMs: 1000 },
  ).then((p) => {
    if (p.state !== 'ready') throw new Error(`learning failed: ${JSON.stringify(p)}`);
  });
  // The whole 600-frame demo clip at its own 60 fps, numbered as shots commonly are (from 1001),
  // so the browser tests also prove the player counts in shot frames.
  const [frameStart, frameEnd] = [TAKE_WORLD_FIRST_FRAME, TAKE_WORLD_FIRST_FRAME + 599];
  const shot = await ta.call<{ id: string }>('POST', `/shows/${show.id}/shots`, {
    sequence: 'SQ010',
    code: `SQ010_${uniq().toUpperCase()}`,
    frameStart,
    frameEnd,
    fps: 60,
    characterId,
    clipId,
  });
  const job = await ta.call<{ id: string }>('POST', `/shows/${show.id}/shots/${shot.id}/jobs`, {
    profileId: profile.id,
  });
  const takeId = await waitForTake(ta, show.id, job.id);
  return {
    showId: show.id,
    shotId: shot.id,
    profileId: profile.id,
    takeId,
    frameStart,
    frameEnd,
    fps: 60,
    people,
  };
}
