import { Injectable, Logger } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import type { EntityManager } from '@mikro-orm/core';
import type { Queue } from 'bullmq';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';
import { QUEUES } from '../queues/queue-names';
import { EmailMessage, EmailStatus } from './entities/email-message.entity';
import type { MailJobData } from './mail-job';

/** An e-mail to one person. */
export interface MailRequest {
  to: string;
  subject: string;
  text: string;
  kind: string;
}

/** Every e-mail of the product goes out here: recorded, then queued for the worker to send. */
@Injectable()
export class MailOutboxService {
  private readonly logger = new Logger('MailOutbox');

  constructor(
    @InjectQueue(QUEUES.mail) private readonly queue: Queue<MailJobData, void, 'send'>,
    private readonly env: Env,
  ) {}

  /**
   * Records the message and queues it. Flushes `em` first (with the caller's pending changes) so
   * the worker finds the record. Throws MAIL_UNAVAILABLE when the queue cannot be reached.
   */
  async send(em: EntityManager, mail: MailRequest): Promise<EmailMessage> {
    const message = new EmailMessage(mail.to, mail.subject, mail.kind);
    em.persist(message);
    await em.flush();
    try {
      await this.queue.add(
        'send',
        { emailId: message.id, to: mail.to, subject: mail.subject, text: mail.text },
        {
          jobId: message.id,
          attempts: this.env.MAIL_MAX_ATTEMPTS,
          backoff: { type: 'exponential', delay: 2000 },
          // The body holds secrets (links): drop it once sent; keep failures a day to inspect.
          removeOnComplete: true,
          removeOnFail: { age: 86_400 },
        },
      );
    } catch (e) {
      this.logger.error(`could not queue e-mail ${message.id}: ${(e as Error).message}`);
      message.status = EmailStatus.Failed;
      message.error = `not queued: ${(e as Error).message}`;
      await em.flush();
      throw new DomainError(
        'unavailable',
        'MAIL_UNAVAILABLE',
        'The e-mail could not be queued; try again in a moment.',
      );
    }
    return message;
  }
}
