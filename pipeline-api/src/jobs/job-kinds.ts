// What differs between learn and retarget jobs when their state moves: the row class, what a
// move must load, what else moves with it (the profile's state, the shot's solve state), and the
// ids their live events carry. Every move happens with the job row locked, so the API (cancel)
// and any worker (progress, finish, a lost worker's job) never overwrite each other.
import { LockMode, type EntityManager, type MikroORM } from '@mikro-orm/core';
import type { JobRef } from '../events/show-event';
import { LearnJob } from './entities/learn-job.entity';
import { RetargetJob } from './entities/retarget-job.entity';
import type { JobState } from './job-state';
import type { MoveInfo } from './job-move';

/** Either kind of job row. */
export type AnyJob = LearnJob | RetargetJob;

/** The per-kind part of moving a job. */
export interface JobKindOps<J extends AnyJob> {
  kind: J extends LearnJob ? 'learn' : 'retarget';
  entity: new (...args: never[]) => J;
  /** Loads what `move` changes besides the row. */
  load(tx: EntityManager, job: J): Promise<void>;
  /** Moves the job and what follows its state. */
  move(tx: EntityManager, job: J, to: JobState, info?: MoveInfo): Promise<void>;
  /** The ids its live events carry. */
  ref(job: J): JobRef;
}

/** Learn jobs: the profile's state follows. */
export const LEARN_JOBS: JobKindOps<LearnJob> = {
  kind: 'learn',
  entity: LearnJob,
  load: async (tx, job) => {
    await tx.populate(job, ['profile']);
  },
  move: async (_tx, job, to, info) => job.moveTo(to, info),
  ref: (job) => ({ jobId: job.id, kind: 'learn', shotId: null, profileId: job.profile.id }),
};

/** Retarget jobs: the shot's solve state follows, unless a newer job of the shot exists. */
export const RETARGET_JOBS: JobKindOps<RetargetJob> = {
  kind: 'retarget',
  entity: RetargetJob,
  load: async (tx, job) => {
    await tx.populate(job, ['shot']);
  },
  move: async (tx, job, to, info = {}) => {
    const newer = await tx.count(RetargetJob, {
      shot: job.shot,
      createdAt: { $gt: job.createdAt },
    });
    job.moveTo(to, { ...info, latest: newer === 0 });
  },
  ref: (job) => ({
    jobId: job.id,
    kind: 'retarget',
    shotId: job.shot.id,
    profileId: job.profile.id,
  }),
};

/**
 * Runs `fn` in a transaction with the job row locked (SELECT … FOR UPDATE) and what a move
 * needs loaded; `fn` gets null when there is no such job. Changes are flushed on commit.
 */
export function withLockedJob<J extends AnyJob, R>(
  orm: MikroORM,
  ops: JobKindOps<J>,
  id: string,
  fn: (tx: EntityManager, job: J | null) => Promise<R>,
): Promise<R> {
  return orm.em.fork().transactional(async (tx) => {
    const job = (await tx.findOne(ops.entity as never, { id } as never, {
      lockMode: LockMode.PESSIMISTIC_WRITE,
    })) as J | null;
    if (job) await ops.load(tx, job);
    return fn(tx, job);
  });
}
