import type { Readable } from 'node:stream';
import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { LockMode, type EntityManager as AnyEntityManager } from '@mikro-orm/core';
import { DomainError } from '../common/errors/domain-error';
import { Env } from '../config/env.validation';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { JobState } from '../jobs/job-state';
import type { RetargetJob } from '../jobs/entities/retarget-job.entity';
import { Take } from './entities/take.entity';
import { ReviewState } from './review-state';
import { takeView, type TakeView } from './take-view';
import { mailTakeRecipients, takeLabel, takeLink } from './take-mail';
import { shotNotFound } from '../shots/shots.service';
import { Shot } from '../shots/entities/shot.entity';
import { StorageService } from '../storage/storage.service';
import { storageUnavailable } from '../assets/asset-errors';

/** What a finished job produced. */
export interface TakeResult {
  controls: Record<string, unknown>;
  metrics?: Record<string, unknown>;
  /** Object keys, already written to the S3 store. */
  files: string[];
}

/** No such take in the show. */
export const takeNotFound = (id: string) =>
  new DomainError('not_found', 'TAKE_NOT_FOUND', `No take ${id} in this show.`, { takeId: id });

/** Takes: made from finished retarget jobs, listed per shot, announced by e-mail. */
@Injectable()
export class TakesService {
  constructor(
    private readonly em: EntityManager,
    private readonly outbox: MailOutboxService,
    private readonly env: Env,
    private readonly storage: StorageService,
  ) {}

  /**
   * Records the take of a job whose files are written (the job is solving or solved), as the
   * shot's next version. One take per job: a retried job gets the take it already has. The
   * caller flushes the job's own state change in the same unit of work.
   */
  async createFromJob(em: AnyEntityManager, job: RetargetJob, result: TakeResult): Promise<Take> {
    if (job.state !== JobState.Solving && job.state !== JobState.Solved) {
      throw new DomainError(
        'conflict',
        'JOB_NOT_FINISHED',
        `Job ${job.id} is ${job.state}; a take comes only from a job that solves.`,
        { jobId: job.id, state: job.state },
      );
    }
    const existing = await em.findOne(Take, { job: job.id });
    if (existing) return existing;
    // Inside the job's transaction, the shot row lock makes concurrent jobs of one shot take
    // v1, v2, … in turn instead of racing for the same number (takes_shot_id_version_unique).
    if (em.isInTransaction()) await em.lock(job.shot, LockMode.PESSIMISTIC_WRITE);
    const latest = await em.findOne(Take, { shot: job.shot }, { orderBy: { version: 'desc' } });
    const take = new Take(job, (latest?.version ?? 0) + 1, result);
    em.persist(take);
    job.shot.reviewState = ReviewState.AwaitingReview;
    job.shot.latestTakeVersion = take.version;
    await em.flush();
    return take;
  }

  /** E-mails the shot's assignees and the take's creator that a take awaits review. */
  async notifyTakeReady(given: Take, em: AnyEntityManager = this.em): Promise<number> {
    const take = await em.findOneOrFail(Take, given.id, { populate: ['shot.show'] });
    return mailTakeRecipients(em, this.outbox, take, {
      kind: 'take_ready',
      subject: `Take ready for review: ${takeLabel(take)}`,
      text: (u) =>
        `Hello ${u.displayName},\n\n${takeLabel(take)} has solved and awaits review ` +
        `(frames ${take.shot.frameStart}–${take.shot.frameEnd}).\n\nOpen it: ${takeLink(this.env, take)}\n`,
    });
  }

  /** The takes of a shot, newest first. */
  async list(showId: string, shotId: string): Promise<TakeView[]> {
    if (!(await this.em.count(Shot, { id: shotId, show: showId }))) throw shotNotFound(shotId);
    const takes = await this.em.find(
      Take,
      { shot: shotId, show: showId },
      { populate: ['job'], orderBy: { version: 'desc' } },
    );
    return takes.map(takeView);
  }

  /** One take of the show. */
  async get(showId: string, id: string): Promise<TakeView> {
    return takeView(await this.find(showId, id));
  }

  /** The take's .glb file, to stream, with a file name that says show, shot and version. */
  async file(showId: string, id: string): Promise<{ stream: Readable; fileName: string }> {
    const take = await this.em.findOne(Take, { id, show: showId }, { populate: ['shot', 'show'] });
    if (!take) throw takeNotFound(id);
    const key = take.files.find((f) => f.endsWith('.glb'));
    if (!key) throw takeNotFound(id);
    try {
      return {
        stream: await this.storage.stream(key),
        fileName: `${take.show.code}_${take.shot.code}_v${take.version}.glb`.replace(
          /[^A-Za-z0-9._-]/g,
          '_',
        ),
      };
    } catch (e) {
      if ((e as { name?: string }).name !== 'NoSuchKey') throw storageUnavailable(e);
      throw new DomainError(
        'not_found',
        'TAKE_NOT_FOUND',
        `Take ${id} has no file in the S3 store.`,
        {
          takeId: id,
        },
      );
    }
  }

  /** One take of the show, with its job and shot. */
  async find(showId: string, id: string): Promise<Take> {
    const take = await this.em.findOne(Take, { id, show: showId }, { populate: ['job', 'shot'] });
    if (!take) throw takeNotFound(id);
    return take;
  }
}
