import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { Shot } from '../../shots/entities/shot.entity';
import { TissueProfile } from '../../library/entities/tissue-profile.entity';
import { assertJobTransition, JobState } from '../job-state';

/** One solver run for a shot with a profile and the artist's controls. */
@Entity({ tableName: 'retarget_jobs' })
@Index({ properties: ['show', 'state'] })
export class RetargetJob {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @ManyToOne(() => Shot)
  shot: Shot;

  @ManyToOne(() => TissueProfile)
  profile: TissueProfile;

  @Property({ type: 'json' })
  controls: Record<string, unknown>;

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

  /** The person who submitted it (null when a pipeline token did). */
  @ManyToOne(() => User, { nullable: true })
  submittedBy?: User | null;

  /** Host and process that last ran it. */
  @Property({ type: 'string', length: 120, nullable: true })
  worker?: string | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  startedAt?: Date | null;

  @Property({ type: 'datetime', nullable: true })
  finishedAt?: Date | null;

  constructor(
    shot: Shot,
    profile: TissueProfile,
    controls: Record<string, unknown>,
    submittedBy: User | null,
  ) {
    this.show = shot.show;
    this.shot = shot;
    this.profile = profile;
    this.controls = controls;
    this.submittedBy = submittedBy;
    shot.solveState = this.state;
  }

  /** Moves the job (and the shot's solve state) along the state machine; throws on a bad move. */
  moveTo(to: JobState, info: { worker?: string; errorCode?: string; message?: string } = {}) {
    assertJobTransition(this.state, to);
    const now = new Date();
    this.state = to;
    if (to === JobState.Solving) {
      this.attempts += 1;
      this.startedAt = now;
      this.worker = info.worker ?? this.worker;
    }
    if (to === JobState.Solved || to === JobState.Failed || to === JobState.Canceled) {
      this.finishedAt = now;
      this.percent = to === JobState.Solved ? 100 : this.percent;
    }
    if (to === JobState.Failed) {
      this.errorCode = info.errorCode ?? 'SOLVE_FAILED';
      this.errorMessage = info.message ?? null;
    }
    this.shot.solveState = to;
  }
}
