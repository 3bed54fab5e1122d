import { randomUUID } from 'node:crypto';
import { Enum, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { JobState } from '../job-state';
import type { JobRecord } from '../job-move';

/**
 * The columns every solve job has, learn or retarget: show, state and progress, attempts, the
 * outcome, who asked and which worker ran it, and when. Not an entity itself: each kind of job
 * keeps its own table (its indexes are declared there).
 */
export abstract class JobColumns implements JobRecord {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show!: Show;

  @Enum({ items: () => JobState })
  state: JobState = JobState.Queued;

  @Property({ type: 'string', length: 60, nullable: true })
  stage?: string | null;

  @Property({ type: 'integer' })
  percent = 0;

  @Property({ type: 'integer' })
  attempts = 0;

  @Property({ type: 'string', length: 60, nullable: true })
  errorCode?: string | null;

  @Property({ type: 'text', nullable: true })
  errorMessage?: string | null;

  /** The person who asked for it (null when a pipeline token did). */
  @ManyToOne(() => User, { nullable: true })
  submittedBy?: User | null;

  /** Host, process and attempt that last ran it. */
  @Property({ type: 'string', length: 120, nullable: true })
  worker?: string | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  startedAt?: Date | null;

  @Property({ type: 'datetime', nullable: true })
  finishedAt?: Date | null;
}
