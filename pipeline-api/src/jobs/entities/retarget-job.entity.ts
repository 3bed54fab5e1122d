import { Entity, Index, ManyToOne, Property } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { Shot } from '../../shots/entities/shot.entity';
import { TissueProfile } from '../../library/entities/tissue-profile.entity';
import { Take } from '../../takes/entities/take.entity';
import { JobState } from '../job-state';
import { applyJobMove, type MoveInfo } from '../job-move';
import { JobColumns } from './job-columns';

/** One solver run for a shot with a profile and the artist's controls. */
@Entity({ tableName: 'retarget_jobs' })
@Index({ properties: ['show', 'state'] })
@Index({ properties: ['show', 'createdAt'] })
export class RetargetJob extends JobColumns {
  @ManyToOne(() => Shot)
  shot: Shot;

  @ManyToOne(() => TissueProfile)
  profile: TissueProfile;

  /** The controls the solve uses, every field filled (solver defaults for those not given). */
  @Property({ type: 'json' })
  controls: Record<string, unknown>;

  /** Source → target joint names that override name matching. */
  @Property({ type: 'json', nullable: true })
  jointMap?: Record<string, string> | null;

  /** The take whose tuned controls this job re-solves ("save as new take"). */
  @ManyToOne(() => Take, { nullable: true })
  baseTake?: Take | null;

  constructor(
    shot: Shot,
    profile: TissueProfile,
    controls: Record<string, unknown>,
    submittedBy: User | null,
  ) {
    super();
    this.show = shot.show;
    this.shot = shot;
    this.profile = profile;
    this.controls = controls;
    this.submittedBy = submittedBy;
    shot.solveState = this.state;
  }

  /**
   * Moves the job along its state machine (throws on a bad move) and, unless a newer job of the
   * shot exists (`latest: false`), the shot's solve state with it.
   */
  moveTo(to: JobState, info: MoveInfo & { latest?: boolean } = {}) {
    applyJobMove(this, to, info);
    if (info.latest !== false) this.shot.solveState = to;
  }
}
