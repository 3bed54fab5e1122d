import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { MikroORM, RequestContext } from '@mikro-orm/core';
import type { Response } from 'express';
import { Redis } from 'ioredis';
import { Env } from '../config/env.validation';
import { DomainError } from '../common/errors/domain-error';
import { Authenticator } from '../auth/authenticator.service';
import type { AuthedRequest, Principal } from '../auth/principal';
import { ShowAccessService } from '../shows/show-access.service';
import { mayReceive } from './event-audience';
import { parseShowEvent, showEventsChannel } from './show-event';

/** How long a browser waits before reconnecting a dropped stream. */
const RETRY_MS = 3000;
/** A watcher this far behind is too slow to keep; it reconnects and polls the current state. */
const MAX_BUFFERED_BYTES = 1024 * 1024;

/** One open event stream. */
interface Watcher {
  showId: string;
  principal: Principal;
  req: AuthedRequest;
  res: Response;
  heartbeat: NodeJS.Timeout;
}

/** One `text/event-stream` frame. */
export const sseFrame = (type: string, data: unknown) =>
  `event: ${type}\ndata: ${JSON.stringify(data)}\n\n`;

/**
 * The API side of live events: one Redis subscription per API process, fanned out to the open
 * streams of each show. A heartbeat comment keeps proxies from closing idle streams and re-checks
 * that the watcher may still see the show (a revoked session or membership ends the stream).
 */
@Injectable()
export class ShowEventsHub implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('ShowEvents');
  private readonly byShow = new Map<string, Set<Watcher>>();
  private subscriber?: Redis;

  constructor(
    private readonly env: Env,
    private readonly orm: MikroORM,
    private readonly authenticator: Authenticator,
    private readonly showAccess: ShowAccessService,
  ) {}

  async onModuleInit(): Promise<void> {
    // Commands wait for Redis rather than fail, and ioredis subscribes again after a reconnect.
    const sub = new Redis({
      host: this.env.REDIS_HOST,
      port: this.env.REDIS_PORT,
      maxRetriesPerRequest: null,
    });
    this.subscriber = sub;
    sub.on('error', (e: Error) => this.logger.warn(`Redis for live events: ${e.message}`));
    sub.on('message', (_channel: string, message: string) => this.dispatch(message));
    const subscribed = sub.subscribe(showEventsChannel(this.env.REDIS_PREFIX));
    subscribed.catch((e: Error) => this.logger.warn(`no live events: ${e.message}`));
    // Start without live events rather than not at all when Redis is slow to answer.
    await Promise.race([subscribed, new Promise((r) => setTimeout(r, 3000).unref())]);
  }

  /** Ends every stream (so the HTTP server can close), then the subscription. */
  async onModuleDestroy(): Promise<void> {
    for (const watchers of this.byShow.values()) for (const w of watchers) this.close(w);
    await this.subscriber?.quit().catch(() => this.subscriber?.disconnect());
  }

  /** Number of open streams (all shows). */
  get openStreams(): number {
    let n = 0;
    for (const watchers of this.byShow.values()) n += watchers.size;
    return n;
  }

  /** Turns the response into the show's event stream until the client or the server ends it. */
  open(showId: string, principal: Principal, req: AuthedRequest, res: Response): void {
    res.status(200);
    res.setHeader('Content-Type', 'text/event-stream; charset=utf-8');
    res.setHeader('Cache-Control', 'no-cache, no-transform');
    res.setHeader('Connection', 'keep-alive');
    // Tells a buffering reverse proxy to pass each event on at once.
    res.setHeader('X-Accel-Buffering', 'no');
    res.flushHeaders();
    req.socket.setNoDelay(true);
    const watcher: Watcher = {
      showId,
      principal,
      req,
      res,
      heartbeat: setInterval(
        () => void this.beat(watcher),
        this.env.EVENTS_HEARTBEAT_SECONDS * 1000,
      ),
    };
    const watchers = this.byShow.get(showId) ?? new Set<Watcher>();
    watchers.add(watcher);
    this.byShow.set(showId, watchers);
    res.on('close', () => this.close(watcher));
    res.write(`retry: ${RETRY_MS}\n\n`);
  }

  private dispatch(message: string): void {
    const event = parseShowEvent(message);
    if (!event) return;
    const watchers = this.byShow.get(event.showId);
    if (!watchers) return;
    const frame = sseFrame(event.type, event.data);
    for (const w of watchers) if (mayReceive(w.principal, event.type)) this.write(w, frame);
  }

  private write(w: Watcher, frame: string): void {
    if (w.res.writableLength > MAX_BUFFERED_BYTES) return this.close(w);
    w.res.write(frame);
  }

  private async beat(w: Watcher): Promise<void> {
    if (!(await this.stillAllowed(w))) return this.close(w);
    this.write(w, ': heartbeat\n\n');
  }

  /** Authenticates the stream's request again and checks the show, in a fresh ORM context. */
  private async stillAllowed(w: Watcher): Promise<boolean> {
    try {
      return await RequestContext.create(this.orm.em, async () => {
        const principal = await this.authenticator.authenticate(w.req);
        if (!principal) return false;
        await this.showAccess.assertReachable(principal, w.showId);
        w.principal = principal;
        return true;
      });
    } catch (e) {
      if (e instanceof DomainError) return false;
      // The database being briefly away is no reason to drop everyone's stream.
      this.logger.warn(`could not re-check a stream of show ${w.showId}: ${(e as Error).message}`);
      return true;
    }
  }

  private close(w: Watcher): void {
    clearInterval(w.heartbeat);
    const watchers = this.byShow.get(w.showId);
    watchers?.delete(w);
    if (watchers?.size === 0) this.byShow.delete(w.showId);
    if (!w.res.writableEnded) w.res.end();
  }
}
