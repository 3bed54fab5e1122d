import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, OneToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { ProfileState, TissueProfile } from '../../library/entities/tissue-profile.entity';
import { JobState } from '../job-state';
import { applyJobMove, type JobRecord, type MoveInfo } from '../job-move';

/** Settings of one learn that the caller may choose (the solver's defaults otherwise). */
export interface LearnSettings {
  cutoffHz?: number;
  varianceTarget?: number;
  maxModes?: number;
}

/** The profile state that goes with each job state. */
const PROFILE_STATE: Record<JobState, ProfileState> = {
  [JobState.Queued]: ProfileState.Queued,
  [JobState.Solving]: ProfileState.Learning,
  [JobState.Solved]: ProfileState.Ready,
  [JobState.Failed]: ProfileState.Failed,
  [JobState.Canceled]: ProfileState.Failed,
};

/** One learning run: a capture on its character → the tissue profile it fills. */
@Entity({ tableName: 'learn_jobs' })
@Index({ properties: ['show', 'state'] })
@Index({ properties: ['show', 'createdAt'] })
export class LearnJob implements JobRecord {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  /** The profile this job learns (one job per profile; retries stay inside the job). */
  @OneToOne(() => TissueProfile, { owner: true })
  profile: TissueProfile;

  @Property({ type: 'json' })
  settings: LearnSettings;

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

  constructor(profile: TissueProfile, settings: LearnSettings, submittedBy: User | null) {
    this.show = profile.show;
    this.profile = profile;
    this.settings = settings;
    this.submittedBy = submittedBy;
    profile.state = PROFILE_STATE[this.state];
  }

  /** Moves the job along its state machine (throws on a bad move), and its profile's state. */
  moveTo(to: JobState, info: MoveInfo = {}) {
    applyJobMove(this, to, info);
    this.profile.state = PROFILE_STATE[to];
  }
}
