import { randomUUID } from 'node:crypto';
import { MikroORM } from '@mikro-orm/core';
import { Queue, Worker, type ConnectionOptions } from 'bullmq';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from './app-factory';
import { waitForMail } from './support/mail-sink';
import { Env } from '../src/config/env.validation';
import { MailService, type OutgoingMail } from '../src/mail/mail.service';
import { MailOutboxService } from '../src/mail/mail-outbox.service';
import { MailProcessor } from '../src/mail/mail.processor';
import { EmailMessage, EmailStatus } from '../src/mail/entities/email-message.entity';
import type { MailJob, MailJobData } from '../src/mail/mail-job';

// Each test uses its own queue (no worker process listens to it) and closes it after.
describe('e-mail through the mail queue', () => {
  let app: NestExpressApplication;
  let orm: MikroORM;
  let env: Env;
  let queue: Queue<MailJobData, void, 'send'>;
  let worker: Worker | undefined;
  const connection = (): ConnectionOptions => ({
    host: process.env.REDIS_HOST,
    port: Number(process.env.REDIS_PORT),
    maxRetriesPerRequest: null,
  });
  beforeAll(async () => {
    app = await createTestApp();
    orm = app.get(MikroORM);
    env = app.get(Env);
  });
  afterEach(async () => {
    await worker?.close();
    worker = undefined;
    await queue?.obliterate({ force: true });
    await queue?.close();
  });
  afterAll(async () => {
    await app?.close();
  });

  const newQueue = () => {
    queue = new Queue(`mail-test-${randomUUID()}`, {
      connection: connection(),
      prefix: process.env.REDIS_PREFIX,
    });
    return new MailOutboxService(queue, env);
  };
  const mail = (to: string) => ({
    to,
    subject: `Test ${randomUUID()}`,
    text: 'Take v3 is ready.',
    kind: 'test',
  });
  const fakeJob = (data: MailJobData, attemptsMade: number, attempts: number) =>
    ({ data, attemptsMade, opts: { attempts } }) as unknown as MailJob;

  it('records each message as queued and queues it with retries and backoff', async () => {
    const outbox = newQueue();
    const message = await outbox.send(orm.em.fork(), mail('queued@example.test'));
    const record = await orm.em.fork().findOneOrFail(EmailMessage, message.id);
    expect(record).toMatchObject({
      to: 'queued@example.test',
      kind: 'test',
      status: EmailStatus.Queued,
      attempts: 0,
    });
    const job = await queue.getJob(message.id);
    expect(job?.opts.attempts).toBe(env.MAIL_MAX_ATTEMPTS);
    expect(job?.opts.backoff).toEqual({ type: 'exponential', delay: 2000 });
    expect(job?.data).toMatchObject({
      emailId: message.id,
      to: 'queued@example.test',
      text: 'Take v3 is ready.',
    });
  });

  it('keeps a failed try queued with its error, and marks the last try failed', async () => {
    const outbox = newQueue();
    const message = await outbox.send(orm.em.fork(), mail('fails@example.test'));
    const smtpDown = {
      send: async () => Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:2535')),
    } as unknown as MailService;
    const processor = new MailProcessor(orm, smtpDown);
    const data = (await queue.getJob(message.id))!.data;
    await expect(processor.process(fakeJob(data, 0, 3))).rejects.toThrow(/ECONNREFUSED/);
    let record = await orm.em.fork().findOneOrFail(EmailMessage, message.id);
    expect(record).toMatchObject({
      status: EmailStatus.Queued,
      attempts: 1,
      error: expect.stringMatching(/ECONNREFUSED/),
    });
    await expect(processor.process(fakeJob(data, 2, 3))).rejects.toThrow();
    record = await orm.em.fork().findOneOrFail(EmailMessage, message.id);
    expect(record).toMatchObject({ status: EmailStatus.Failed, attempts: 2 });
  });

  it('retries after an SMTP fault and then delivers once', async () => {
    const outbox = newQueue();
    const real = app.get(MailService);
    let calls = 0;
    const flaky = {
      send: async (m: OutgoingMail) =>
        ++calls === 1 ? Promise.reject(new Error('451 try again later')) : real.send(m),
    } as unknown as MailService;
    const processor = new MailProcessor(orm, flaky);
    worker = new Worker(queue.name, (job) => processor.process(job as MailJob), {
      connection: connection(),
      prefix: process.env.REDIS_PREFIX,
    });
    const request = mail(`retry.${randomUUID().slice(0, 8)}@example.test`);
    const message = await outbox.send(orm.em.fork(), request);
    const received = await waitForMail(request.to, new RegExp(request.subject));
    expect(received.text.trim()).toBe('Take v3 is ready.');
    let record = await orm.em.fork().findOneOrFail(EmailMessage, message.id);
    for (let i = 0; i < 50 && record.status !== EmailStatus.Sent; i++) {
      await new Promise((r) => setTimeout(r, 100));
      record = await orm.em.fork().findOneOrFail(EmailMessage, message.id);
    }
    expect(record).toMatchObject({ status: EmailStatus.Sent, attempts: 2, error: null });
    expect(calls).toBe(2);
    // A job that runs again after the send went through does not send twice.
    const again = {
      emailId: message.id,
      to: request.to,
      subject: request.subject,
      text: request.text,
    };
    await processor.process(fakeJob(again, 2, 5));
    expect(calls).toBe(2);
  });
});
