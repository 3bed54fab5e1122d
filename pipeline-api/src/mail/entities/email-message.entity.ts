import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, PrimaryKey, Property } from '@mikro-orm/core';

/** Where an e-mail is on its way out. */
export enum EmailStatus {
  Queued = 'queued',
  Sent = 'sent',
  Failed = 'failed',
}

/**
 * The record of one e-mail to one person. The body is not stored: links in it carry secrets;
 * it travels in the queue job only until the worker has sent it.
 */
@Entity({ tableName: 'email_messages' })
@Index({ properties: ['status', 'createdAt'] })
export class EmailMessage {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 254, fieldName: 'to_address' })
  to: string;

  @Property({ type: 'string', length: 255 })
  subject: string;

  /** What the message is for, e.g. `password_reset`, `invitation`. */
  @Property({ type: 'string', length: 40 })
  kind: string;

  @Enum({ items: () => EmailStatus })
  status: EmailStatus = EmailStatus.Queued;

  @Property({ type: 'integer' })
  attempts = 0;

  @Property({ type: 'text', nullable: true })
  error?: string | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  sentAt?: Date;

  constructor(to: string, subject: string, kind: string) {
    this.to = to;
    this.subject = subject;
    this.kind = kind;
  }
}
