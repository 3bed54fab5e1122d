import { Entity, Index, OneToOne, Property } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { ProfileState, TissueProfile } from '../../library/entities/tissue-profile.entity';
import { JobState } from '../job-state';
import { applyJobMove, type MoveInfo } from '../job-move';
import { JobColumns } from './job-columns';

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
export class LearnJob extends JobColumns {
  /** The profile this job learns (one job per profile; retries stay inside the job). */
  @OneToOne(() => TissueProfile, { owner: true })
  profile: TissueProfile;

  @Property({ type: 'json' })
  settings: LearnSettings;

  constructor(profile: TissueProfile, settings: LearnSettings, submittedBy: User | null) {
    super();
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
