import { Injectable } from '@nestjs/common';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';

/** One message as the local mail sink received it. */
export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string | null;
  text: string;
}

/** Reads the local mail sink's inbox, for the admin screen in development. */
@Injectable()
export class OutboxService {
  constructor(private readonly env: Env) {}

  /** The most recent messages the sink received, newest first. */
  async list(limit = 100): Promise<OutboxMessage[]> {
    if (this.env.NODE_ENV === 'production') {
      throw new DomainError(
        'not_found',
        'OUTBOX_DISABLED',
        'The mail outbox exists in development only.',
      );
    }
    if (!this.env.MAIL_SINK_URL) {
      throw new DomainError(
        'unavailable',
        'OUTBOX_UNAVAILABLE',
        'MAIL_SINK_URL is not set, so there is no outbox to read.',
      );
    }
    let messages: OutboxMessage[];
    try {
      const res = await fetch(`${this.env.MAIL_SINK_URL}/messages`, {
        signal: AbortSignal.timeout(this.env.HEALTH_TIMEOUT_MS),
      });
      if (!res.ok) throw new Error(`answered ${res.status}`);
      messages = (await res.json()) as OutboxMessage[];
    } catch (e) {
      throw new DomainError(
        'unavailable',
        'OUTBOX_UNAVAILABLE',
        `The local mail sink cannot be read: ${(e as Error).message}`,
      );
    }
    return messages
      .map(({ id, from, to, subject, date, text }) => ({ id, from, to, subject, date, text }))
      .reverse()
      .slice(0, limit);
  }
}
