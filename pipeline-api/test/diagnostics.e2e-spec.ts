import request from 'supertest';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { QueueEvents } from 'bullmq';
import { createTestApp } from './app-factory';
import { QUEUES } from '../src/queues/queue-names';

// Needs the worker process that `npm test` starts: the API only enqueues.
describe('diagnostic ping through the worker', () => {
  let app: NestExpressApplication;
  let events: QueueEvents;
  beforeAll(async () => {
    app = await createTestApp();
    events = new QueueEvents(QUEUES.diagnostics, {
      connection: {
        host: process.env.REDIS_HOST,
        port: Number(process.env.REDIS_PORT),
        maxRetriesPerRequest: null,
      },
      prefix: process.env.REDIS_PREFIX,
    });
    await events.waitUntilReady();
  });
  afterAll(async () => {
    await events?.close();
    await app?.close();
  });

  it('is queued, reports progress, and completes in another process', async () => {
    const server = app.getHttpServer();
    const percents: number[] = [];
    events.on('progress', ({ data }) => percents.push((data as { percent: number }).percent));
    const created = await request(server).post('/api/diagnostics/pings').send({ steps: 4 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      state: 'waiting',
      progress: { stage: 'queued', percent: 0 },
    });

    let view = created.body;
    for (let i = 0; i < 200 && view.state !== 'completed' && view.state !== 'failed'; i++) {
      await new Promise((r) => setTimeout(r, 50));
      view = (await request(server).get(`/api/diagnostics/pings/${created.body.id}`)).body;
    }
    expect(view.state).toBe('completed');
    expect(view.progress).toEqual({ stage: 'step 4 of 4', percent: 100 });
    expect(view.result.steps).toBe(4);
    // The worker names its own pid: not this test process, which runs the API module.
    expect(view.result.worker).not.toMatch(new RegExp(`:${process.pid}$`));
    // Every step was reported as it happened, not only the end.
    await new Promise((r) => setTimeout(r, 100));
    expect(percents).toEqual([25, 50, 75, 100]);
  });
});
