import { Logger } from '@nestjs/common';
import { Processor, WorkerHost } from '@nestjs/bullmq';
import { MikroORM } from '@mikro-orm/core';
import { UnrecoverableError } from 'bullmq';
import { QUEUES } from '../queues/queue-names';
import { MailService } from './mail.service';
import { EmailMessage, EmailStatus } from './entities/email-message.entity';
import type { MailJob } from './mail-job';

/** Sends queued e-mail in the worker process and keeps each message's record up to date. */
@Processor(QUEUES.mail)
export class MailProcessor extends WorkerHost {
  private readonly logger = new Logger('MailProcessor');

  constructor(
    private readonly orm: MikroORM,
    private readonly mail: MailService,
  ) {
    super();
  }

  async process(job: MailJob): Promise<void> {
    const em = this.orm.em.fork();
    const message = await em.findOne(EmailMessage, job.data.emailId);
    if (!message) throw new UnrecoverableError(`no e-mail record ${job.data.emailId}`);
    // A retried job whose send already went through must not send twice.
    if (message.status === EmailStatus.Sent) return;
    message.attempts += 1;
    try {
      await this.mail.send({ to: job.data.to, subject: job.data.subject, text: job.data.text });
      message.status = EmailStatus.Sent;
      message.sentAt = new Date();
      message.error = null;
      await em.flush();
    } catch (e) {
      // SMTP faults are worth retrying (BullMQ backs off); the last try marks the message failed.
      const last = job.attemptsMade + 1 >= (job.opts.attempts ?? 1);
      message.error = (e as Error).message.slice(0, 2000);
      if (last) message.status = EmailStatus.Failed;
      await em.flush();
      this.logger.warn(`e-mail ${message.id} attempt ${message.attempts} failed: ${message.error}`);
      throw e;
    }
  }
}
