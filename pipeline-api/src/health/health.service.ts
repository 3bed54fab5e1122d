import { Injectable, OnModuleDestroy } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import Redis from 'ioredis';
import { Env } from '../config/env.validation';
import { StorageService } from '../storage/storage.service';
import { MailService } from '../mail/mail.service';

/** State of one service as the health route reports it. */
export interface ServiceHealth {
  status: 'up' | 'down';
  latencyMs: number;
  error?: string;
}

/** The health route's body. */
export interface HealthReport {
  status: 'up' | 'degraded';
  checkedAt: string;
  services: { db: ServiceHealth; redis: ServiceHealth; s3: ServiceHealth; smtp: ServiceHealth };
}

/** Probes each backing service afresh on every call, each bounded by a timeout. */
@Injectable()
export class HealthService implements OnModuleDestroy {
  private readonly redis: Redis;
  private readonly timeoutMs: number;

  constructor(
    env: Env,
    private readonly em: EntityManager,
    private readonly storage: StorageService,
    private readonly mail: MailService,
  ) {
    this.timeoutMs = env.HEALTH_TIMEOUT_MS;
    // Own connection without an offline queue: a PING while Redis is away fails at once,
    // and the client keeps reconnecting in the background.
    this.redis = new Redis({
      host: env.REDIS_HOST,
      port: env.REDIS_PORT,
      enableOfflineQueue: false,
      maxRetriesPerRequest: 0,
      connectTimeout: env.HEALTH_TIMEOUT_MS,
      retryStrategy: () => 500,
    });
    this.redis.on('error', () => undefined);
  }

  /** Checks all four services in parallel. */
  async check(): Promise<HealthReport> {
    const [db, redis, s3, smtp] = await Promise.all([
      this.probe(() => this.em.getConnection().execute('select 1')),
      this.probe(() => this.redis.ping()),
      this.probe(() => this.storage.ping(this.timeoutMs)),
      this.probe(() => this.mail.ping()),
    ]);
    const services = { db, redis, s3, smtp };
    const allUp = Object.values(services).every((s) => s.status === 'up');
    return { status: allUp ? 'up' : 'degraded', checkedAt: new Date().toISOString(), services };
  }

  private async probe(fn: () => Promise<unknown>): Promise<ServiceHealth> {
    const start = performance.now();
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(
        () => reject(new Error(`no answer within ${this.timeoutMs} ms`)),
        this.timeoutMs,
      );
    });
    try {
      await Promise.race([fn(), timeout]);
      return { status: 'up', latencyMs: round(performance.now() - start) };
    } catch (e) {
      return { status: 'down', latencyMs: round(performance.now() - start), error: describe(e) };
    } finally {
      clearTimeout(timer);
    }
  }

  onModuleDestroy(): void {
    this.redis.disconnect();
  }
}

const round = (ms: number) => Math.round(ms * 10) / 10;

function describe(e: unknown): string {
  const err = e as { code?: string; message?: string; name?: string };
  let text = err?.message || err?.name || String(e);
  // ioredis says this while it is reconnecting; say it in plain words.
  if (text.includes('enableOfflineQueue')) text = 'not connected; reconnecting in the background';
  return err?.code && !text.includes(err.code) ? `${err.code}: ${text}` : text;
}
