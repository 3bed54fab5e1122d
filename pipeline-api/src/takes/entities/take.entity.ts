import { randomUUID } from 'node:crypto';
import { Entity, Enum, ManyToOne, OneToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { Shot } from '../../shots/entities/shot.entity';
import { RetargetJob } from '../../jobs/entities/retarget-job.entity';
import { ReviewState } from '../review-state';

/** The versioned result of a retarget job: controls used, metrics, files, review state. */
@Entity({ tableName: 'takes' })
@Unique({ properties: ['shot', 'version'] })
export class Take {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @ManyToOne(() => Shot)
  shot: Shot;

  /** v1, v2, … per shot. */
  @Property({ type: 'integer' })
  version: number;

  /** One take per job, even when the job is retried. */
  @OneToOne(() => RetargetJob, { owner: true })
  job: RetargetJob;

  @Property({ type: 'json' })
  controls: Record<string, unknown>;

  @Property({ type: 'json', nullable: true })
  metrics?: Record<string, unknown> | null;

  /** Object keys of the take's files in the bucket. */
  @Property({ type: 'json' })
  files: string[];

  @Enum({ items: () => ReviewState })
  reviewState: ReviewState = ReviewState.AwaitingReview;

  /** Who submitted the job that made it (null for a pipeline token). */
  @ManyToOne(() => User, { nullable: true })
  createdBy?: User | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  reviewedAt?: Date | null;

  constructor(
    job: RetargetJob,
    version: number,
    result: {
      controls: Record<string, unknown>;
      metrics?: Record<string, unknown>;
      files: string[];
    },
  ) {
    this.show = job.show;
    this.shot = job.shot;
    this.job = job;
    this.version = version;
    this.controls = result.controls;
    this.metrics = result.metrics ?? null;
    this.files = result.files;
    this.createdBy = job.submittedBy ?? null;
  }
}
