import { Injectable, OnModuleDestroy } from '@nestjs/common';
import Redis from 'ioredis';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';
import { hashSecret } from '../common/crypto/secret-token';

/**
 * Counts failed sign-ins per e-mail and per client address in Redis (shared by every API
 * process) over a fixed window; at the limit, sign-in answers 429 until the window ends.
 */
@Injectable()
export class SignInThrottle implements OnModuleDestroy {
  private readonly redis: Redis;
  private readonly prefix: string;

  constructor(private readonly env: Env) {
    this.prefix = `${env.REDIS_PREFIX}:sign-in`;
    this.redis = new Redis({
      host: env.REDIS_HOST,
      port: env.REDIS_PORT,
      maxRetriesPerRequest: 1,
      connectTimeout: env.HEALTH_TIMEOUT_MS,
    });
    this.redis.on('error', () => undefined);
  }

  /** Throws SIGN_IN_THROTTLED when either counter is at its limit. */
  async assertAllowed(email: string, ip: string): Promise<void> {
    const [emailKey, ipKey] = this.keys(email, ip);
    const counts = await this.call(() => this.redis.mget(emailKey, ipKey));
    const over = [
      Number(counts[0] ?? 0) >= this.env.SIGN_IN_MAX_FAILURES_PER_EMAIL ? emailKey : null,
      Number(counts[1] ?? 0) >= this.env.SIGN_IN_MAX_FAILURES_PER_IP ? ipKey : null,
    ].filter((k): k is string => k !== null);
    if (over.length === 0) return;
    const ttls = await this.call(() => Promise.all(over.map((k) => this.redis.ttl(k))));
    const retryAfterSeconds = Math.max(1, ...ttls);
    throw new DomainError(
      'throttled',
      'SIGN_IN_THROTTLED',
      `Too many failed sign-ins; try again in ${Math.ceil(retryAfterSeconds / 60)} minute(s).`,
      { retryAfterSeconds },
    );
  }

  /** Counts one failure against the e-mail and the address. */
  async recordFailure(email: string, ip: string): Promise<void> {
    const window = this.env.SIGN_IN_WINDOW_SECONDS;
    const multi = this.redis.multi();
    for (const key of this.keys(email, ip)) multi.incr(key).expire(key, window, 'NX');
    await this.call(() => multi.exec());
  }

  /** Forgets the e-mail's failures after a successful sign-in. */
  async clear(email: string): Promise<void> {
    await this.call(() => this.redis.del(this.keys(email, '')[0]));
  }

  // E-mail addresses are hashed so Redis holds no personal data.
  private keys(email: string, ip: string): [string, string] {
    return [`${this.prefix}:email:${hashSecret(email)}`, `${this.prefix}:ip:${ip}`];
  }

  private async call<T>(fn: () => Promise<T>): Promise<T> {
    try {
      return await fn();
    } catch (e) {
      throw new DomainError(
        'unavailable',
        'SIGN_IN_UNAVAILABLE',
        `Sign-in cannot check its limits right now (${(e as Error).message}); try again shortly.`,
      );
    }
  }

  onModuleDestroy(): void {
    this.redis.disconnect();
  }
}
