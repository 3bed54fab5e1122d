import { Injectable, Logger } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import { MikroORM } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { JobEventsPublisher } from '../events/job-events-publisher';
import { QUEUES } from '../queues/queue-names';
import { Take } from '../takes/entities/take.entity';
import { LearnJob } from './entities/learn-job.entity';
import { RetargetJob } from './entities/retarget-job.entity';
import { isFinished, JobState } from './job-state';
import { learnJobView, retargetJobView, type JobView } from './job-view';
import { cannotCancel, jobNotFound } from './job-errors';
import {
  LEARN_JOBS,
  RETARGET_JOBS,
  withLockedJob,
  type AnyJob,
  type JobKindOps,
} from './job-kinds';
import type { LearnQueue, RetargetQueue } from './solve-queue';
import type { ListJobsQuery } from './dto/list-jobs.query';

/** Most jobs a list answers with. */
const LIST_LIMIT = 100;

/** Learn and retarget jobs of a show: listing, reading, canceling. */
@Injectable()
export class JobsService {
  private readonly logger = new Logger('Jobs');

  constructor(
    private readonly em: EntityManager,
    private readonly orm: MikroORM,
    private readonly events: JobEventsPublisher,
    @InjectQueue(QUEUES.learn) private readonly learnQueue: LearnQueue,
    @InjectQueue(QUEUES.retarget) private readonly retargetQueue: RetargetQueue,
  ) {}

  /** The show's jobs, newest first (at most 100), by shot, kind and state. */
  async list(showId: string, q: ListJobsQuery): Promise<JobView[]> {
    const state = q.state ? { state: q.state } : {};
    const order = { orderBy: { createdAt: 'desc', id: 'desc' }, limit: LIST_LIMIT } as const;
    const learn =
      q.kind === 'retarget' || q.shotId
        ? []
        : await this.em.find(LearnJob, { show: showId, ...state }, order);
    const retarget =
      q.kind === 'learn'
        ? []
        : await this.em.find(
            RetargetJob,
            { show: showId, ...state, ...(q.shotId ? { shot: q.shotId } : {}) },
            order,
          );
    const takes = await this.takeIds(retarget.map((j) => j.id));
    const all = [
      ...learn.map((j) => ({ at: j.createdAt, view: learnJobView(j) })),
      ...retarget.map((j) => ({
        at: j.createdAt,
        view: retargetJobView(j, takes.get(j.id) ?? null),
      })),
    ];
    all.sort((a, b) => b.at.getTime() - a.at.getTime() || (a.view.id < b.view.id ? 1 : -1));
    return all.slice(0, LIST_LIMIT).map((x) => x.view);
  }

  /** One job of the show. */
  async get(showId: string, id: string): Promise<JobView> {
    const retarget = await this.em.findOne(RetargetJob, { id, show: showId });
    if (retarget) return this.retargetView(retarget);
    const learn = await this.em.findOne(LearnJob, { id, show: showId });
    if (learn) return learnJobView(learn);
    throw jobNotFound(id);
  }

  /**
   * Cancels a queued or solving job: admins, technical artists and its submitter may. The row
   * turns canceled at once (a queued entry is removed from the queue; a solving one stops at its
   * next stage and writes nothing). A finished job answers INVALID_STATE_CHANGE.
   */
  async cancel(principal: Principal, showId: string, id: string): Promise<JobView> {
    const retarget = await this.em.findOne(RetargetJob, { id, show: showId });
    const learn = retarget ? null : await this.em.findOne(LearnJob, { id, show: showId });
    const found = retarget ?? learn;
    if (!found) throw jobNotFound(id);
    assertMayCancel(principal, found);
    if (retarget) {
      await this.cancelRow(showId, RETARGET_JOBS, id, this.retargetQueue);
      return this.retargetView(await this.em.refreshOrFail(retarget));
    }
    await this.cancelRow(showId, LEARN_JOBS, id, this.learnQueue);
    return learnJobView(await this.em.refreshOrFail(learn as LearnJob));
  }

  private async cancelRow<J extends AnyJob>(
    showId: string,
    ops: JobKindOps<J>,
    id: string,
    queue: LearnQueue | RetargetQueue,
  ): Promise<void> {
    const ref = await withLockedJob(this.orm, ops, id, async (tx, job) => {
      if (!job) throw jobNotFound(id);
      if (isFinished(job.state)) throw cannotCancel(id, job.state);
      await ops.move(tx, job, JobState.Canceled);
      return ops.ref(job);
    });
    // A waiting entry goes; an active one is left to its worker, which sees the row canceled.
    await queue.remove(id).catch((e: Error) => {
      this.logger.warn(
        `canceled job ${id} stays in the queue until a worker skips it: ${e.message}`,
      );
    });
    await this.events.state(showId, {
      ...ref,
      state: JobState.Canceled,
      errorCode: null,
      errorMessage: null,
    });
  }

  private async retargetView(job: RetargetJob): Promise<JobView> {
    const takes = await this.takeIds([job.id]);
    return retargetJobView(job, takes.get(job.id) ?? null);
  }

  /** Take id per retarget job id, for the jobs that have one. */
  private async takeIds(jobIds: string[]): Promise<Map<string, string>> {
    if (jobIds.length === 0) return new Map();
    const takes = await this.em.find(Take, { job: { $in: jobIds } }, { fields: ['id', 'job'] });
    return new Map(takes.map((t) => [t.job.id, t.id]));
  }
}

/** Admins, technical artists and the job's submitter may cancel it. */
function assertMayCancel(principal: Principal, job: AnyJob): void {
  if (principal.kind !== 'user') return;
  const role = principal.user.role;
  if (role === Role.Admin || role === Role.TechnicalArtist) return;
  if (job.submittedBy?.id === principal.user.id) return;
  throw new DomainError(
    'forbidden',
    'JOB_NOT_SUBMITTER',
    'Only admins, technical artists and the person who submitted a job may cancel it.',
    { jobId: job.id },
  );
}
