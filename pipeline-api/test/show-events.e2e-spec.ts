import type { AddressInfo } from 'node:net';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { World } from './support/world';
import { tinyCharacterGlb, tinyClipBvh } from './support/tiny-assets';
import { uploadFile, waitForCheck } from './support/uploads';
import { isEvent, openEventStream, type StreamItem } from './support/event-stream';
import { Role } from '../src/users/entities/role';
import { TokenScope } from '../src/tokens/token-scope';
import { JobState } from '../src/jobs/job-state';
import { JobEventsPublisherModule } from '../src/events/job-events-publisher.module';
import { JobEventsPublisher } from '../src/events/job-events-publisher';
import { ShowEventsHub } from '../src/events/show-events-hub';
import type { Show } from '../src/shows/entities/show.entity';

/** Starts an in-process API on a loopback port; returns its base URL. */
async function listening(app: NestExpressApplication): Promise<string> {
  await app.listen(0, '127.0.0.1');
  return `http://127.0.0.1:${(app.getHttpServer().address() as AddressInfo).port}`;
}

const eventsOf = (showId: string) => `/api/shows/${showId}/events`;
const assetEvents = (items: StreamItem[]) =>
  items.filter((i): i is Extract<StreamItem, { kind: 'event' }> => i.kind === 'event');

describe('live show events (server-sent events fed by the worker through Redis)', () => {
  // Two API processes' worth of apps on the same Redis, as a scaled-out deployment has; the first
  // beats every second so heartbeats and access re-checks show up quickly.
  let app: NestExpressApplication;
  let second: NestExpressApplication;
  let url: string;
  let secondUrl: string;
  let world: World;
  let show: Show;
  let ta: string;
  beforeAll(async () => {
    app = await createTestApp({
      env: { EVENTS_HEARTBEAT_SECONDS: 1 },
      imports: [JobEventsPublisherModule],
    });
    second = await createTestApp();
    [url, secondUrl] = [await listening(app), await listening(second)];
    world = new World(app);
    show = await world.show('Events show');
    ta = (await world.member(Role.TechnicalArtist, [show])).cookie;
  });
  afterAll(async () => {
    await app?.close();
    await second?.close();
  });

  const publisher = () => app.get(JobEventsPublisher);

  it('streams the ingest progress of a real upload, from download to ready', async () => {
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: ta });
    expect(stream.status).toBe(200);
    expect(stream.contentType).toMatch(/^text\/event-stream/);
    const assetId = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'tube.glb',
      bytes: await tinyCharacterGlb(),
    });
    const seen: StreamItem[] = [];
    for (;;) {
      const item = await stream.next(isEvent('asset.progress', { assetId }));
      seen.push(item);
      if (item.kind === 'event' && item.data.state !== 'pending') break;
    }
    stream.close();
    const events = assetEvents(seen).map((e) => e.data);
    expect(events.map((e) => e.stage)).toEqual(['downloading', 'validating', 'ready']);
    const percents = events.map((e) => e.percent as number);
    expect(percents).toEqual([...percents].sort((a, b) => a - b));
    expect(events.at(-1)).toMatchObject({ kind: 'character', percent: 100, state: 'ready' });
    // The polling route tells the same story.
    expect((await waitForCheck(world, ta, show.id, assetId)).state).toBe('ready');
  });

  it('ends an upload’s events with its rejection when the file is bad', async () => {
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: ta });
    const assetId = await uploadFile(world, ta, show.id, {
      kind: 'character',
      fileName: 'not-a-character.glb',
      bytes: tinyClipBvh(),
    });
    const last = await stream.next(
      (i) =>
        isEvent('asset.progress', { assetId })(i) &&
        i.kind === 'event' &&
        i.data.state !== 'pending',
    );
    stream.close();
    expect(last).toMatchObject({ data: { state: 'rejected', stage: 'rejected' } });
  });

  it('reaches every API process; upload progress only those who may read the upload list', async () => {
    const animator = (await world.member(Role.Animator, [show])).cookie;
    const token = (await world.token(show, [TokenScope.TakesRead])).secret;
    const onFirst = await openEventStream(url + eventsOf(show.id), { cookie: animator });
    const onSecond = await openEventStream(secondUrl + eventsOf(show.id), { cookie: ta });
    const byToken = await openEventStream(secondUrl + eventsOf(show.id), {
      authorization: `Bearer ${token}`,
    });
    const assetId = randomUUID();
    const jobId = randomUUID();
    // Redis delivers one publisher's messages in order, so the asset event comes first.
    await publisher().assetProgress(show.id, {
      assetId,
      kind: 'capture' as never,
      stage: 'downloading',
      percent: 10,
      state: 'pending' as never,
    });
    await publisher().progress(show.id, { jobId, kind: 'retarget', stage: 'solving', percent: 40 });
    const isEventItem = (i: StreamItem) => i.kind === 'event';
    expect(await onSecond.next(isEventItem)).toMatchObject({
      event: 'asset.progress',
      data: { assetId, stage: 'downloading', percent: 10 },
    });
    expect(await onSecond.next(isEventItem)).toMatchObject({
      event: 'job.progress',
      data: { jobId, kind: 'retarget', stage: 'solving', percent: 40 },
    });
    for (const stream of [onFirst, byToken]) {
      expect(await stream.next(isEventItem)).toMatchObject({
        event: 'job.progress',
        data: { jobId },
      });
    }
    for (const stream of [onFirst, onSecond, byToken]) stream.close();
  });

  it('keeps other shows’ events off the stream', async () => {
    const other = await world.show('Other events show');
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: ta });
    await publisher().state(other.id, {
      jobId: randomUUID(),
      kind: 'learn',
      state: JobState.Solving,
    });
    const mine = randomUUID();
    await publisher().state(show.id, { jobId: mine, kind: 'learn', state: JobState.Solved });
    const first = await stream.next((i) => i.kind === 'event');
    stream.close();
    expect(first).toMatchObject({ event: 'job.state', data: { jobId: mine, state: 'solved' } });
  });

  it('sends a heartbeat comment between events', async () => {
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: ta });
    expect(await stream.next((i) => i.kind === 'comment')).toEqual({
      kind: 'comment',
      text: 'heartbeat',
    });
    stream.close();
  });

  it('ends the stream at the next heartbeat once the session is signed out', async () => {
    const member = await world.member(Role.Supervisor, [show]);
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: member.cookie });
    expect(stream.status).toBe(200);
    await request(world.server).post('/api/auth/sign-out').set('Cookie', member.cookie).send({});
    await stream.ended();
  });

  it('lets go of a stream when the client disconnects', async () => {
    const hub = app.get(ShowEventsHub);
    const before = hub.openStreams;
    const stream = await openEventStream(url + eventsOf(show.id), { cookie: ta });
    expect(hub.openStreams).toBe(before + 1);
    stream.close();
    for (let i = 0; i < 200 && hub.openStreams > before; i++)
      await new Promise((r) => setTimeout(r, 25));
    expect(hub.openStreams).toBe(before);
  });

  it('answers 404 to a member of another show and 401 to anonymous callers, as JSON', async () => {
    const other = await world.show('Not yours');
    const outsider = (await world.member(Role.TechnicalArtist, [other])).cookie;
    const hidden = await openEventStream(url + eventsOf(show.id), { cookie: outsider });
    expect(hidden.status).toBe(404);
    expect(hidden.body?.code).toBe('SHOW_NOT_FOUND');
    const anonymous = await openEventStream(url + eventsOf(show.id));
    expect(anonymous.status).toBe(401);
    expect(anonymous.body?.code).toBe('NOT_SIGNED_IN');
  });
});

describe('live show events at shutdown', () => {
  it('closes open streams when the API shuts down', async () => {
    const app = await createTestApp();
    const url = await listening(app);
    const world = new World(app);
    const show = await world.show('Shutdown show');
    const cookie = (await world.member(Role.Producer, [show])).cookie;
    const stream = await openEventStream(url + eventsOf(show.id), { cookie });
    expect(stream.status).toBe(200);
    await app.close();
    await stream.ended();
  });
});
