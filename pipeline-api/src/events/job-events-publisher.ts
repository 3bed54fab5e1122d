import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { Redis } from 'ioredis';
import { Env } from '../config/env.validation';
import {
  showEventsChannel,
  type AssetProgressEvent,
  type JobProgressEvent,
  type JobStateEvent,
  type ShowEventData,
  type ShowEventType,
  type TakeReadyEvent,
} from './show-event';

/**
 * Reports progress of a show's long work (ingest, learn, retarget) on Redis pub/sub, where every
 * API process hears it and streams it to the show's watchers. Live events are a convenience on
 * top of the database, which stays the record (polling routes read it): a failed publish is
 * logged and never fails the job.
 */
@Injectable()
export class JobEventsPublisher implements OnModuleDestroy {
  private readonly logger = new Logger('JobEvents');
  private readonly redis: Redis;
  private readonly channel: string;
  private failing = false;

  constructor(env: Env) {
    this.channel = showEventsChannel(env.REDIS_PREFIX);
    // One retry per command: a Redis outage must not hold a job up waiting to report progress.
    this.redis = new Redis({ host: env.REDIS_HOST, port: env.REDIS_PORT, maxRetriesPerRequest: 1 });
    this.redis.on('error', (e: Error) => this.warnOnce(`Redis for live events: ${e.message}`));
    this.redis.on('ready', () => (this.failing = false));
  }

  /** A job's stage and percent (learn and retarget processors call this as they run). */
  progress(showId: string, event: JobProgressEvent): Promise<void> {
    return this.publish(showId, 'job.progress', event);
  }

  /** A job's new state. */
  state(showId: string, event: JobStateEvent): Promise<void> {
    return this.publish(showId, 'job.state', event);
  }

  /** A take is written and ready to play. */
  takeReady(showId: string, event: TakeReadyEvent): Promise<void> {
    return this.publish(showId, 'take.ready', event);
  }

  /** Ingest progress of an uploaded file. */
  assetProgress(showId: string, event: AssetProgressEvent): Promise<void> {
    return this.publish(showId, 'asset.progress', event);
  }

  async onModuleDestroy(): Promise<void> {
    await this.redis.quit().catch(() => this.redis.disconnect());
  }

  private async publish<T extends ShowEventType>(
    showId: string,
    type: T,
    data: ShowEventData[T],
  ): Promise<void> {
    const message = JSON.stringify({
      showId,
      type,
      data: { ...data, at: new Date().toISOString() },
    });
    try {
      await this.redis.publish(this.channel, message);
    } catch (e) {
      this.warnOnce(`a ${type} event of show ${showId} was not published: ${(e as Error).message}`);
    }
  }

  /** One warning per outage, not one per progress step. */
  private warnOnce(message: string): void {
    if (this.failing) return;
    this.failing = true;
    this.logger.warn(message);
  }
}
