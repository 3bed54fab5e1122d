import { randomUUID } from 'node:crypto';
import {
  Collection,
  Entity,
  Enum,
  Index,
  ManyToMany,
  ManyToOne,
  PrimaryKey,
  Property,
  Unique,
} from '@mikro-orm/core';
import { Show } from '../../shows/entities/show.entity';
import { User } from '../../users/entities/user.entity';
import { Character } from '../../library/entities/character.entity';
import { Clip } from '../../library/entities/clip.entity';
import { RenderState } from '../render-state';
import { JobState } from '../../jobs/job-state';
import { ReviewState } from '../../takes/review-state';

/**
 * A shot: sequence and code, frame range, fps, target character, clip, assignees, due date. The
 * latest job's solve state and the latest take's review state are kept here too, so the tracking
 * table filters, sorts and counts in one indexed query.
 */
@Entity({ tableName: 'shots' })
@Unique({ properties: ['show', 'code'] })
// The list's usual orders (sequence then code; due date then code) read straight off these.
@Index({ properties: ['show', 'sequence', 'code'] })
@Index({ properties: ['show', 'dueDate', 'code'] })
export class Shot {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @Property({ type: 'string', length: 40 })
  sequence: string;

  @Property({ type: 'string', length: 40 })
  code: string;

  @Property({ type: 'integer' })
  frameStart: number;

  @Property({ type: 'integer' })
  frameEnd: number;

  @Property({ type: 'double', runtimeType: 'number' })
  fps: number;

  @ManyToOne(() => Character, { nullable: true })
  character?: Character | null;

  @ManyToOne(() => Clip, { nullable: true })
  clip?: Clip | null;

  @ManyToMany({ entity: () => User, pivotTable: 'shot_assignees', owner: true })
  assignees = new Collection<User>(this);

  /** Last day, `YYYY-MM-DD`. */
  @Property({ type: 'date', nullable: true })
  dueDate?: string | null;

  @Enum({ items: () => RenderState })
  renderState: RenderState = RenderState.NotStarted;

  @Property({ type: 'datetime', nullable: true })
  renderStateAt?: Date | null;

  /** State of the shot's latest retarget job (null before the first). */
  @Enum({ items: () => JobState, nullable: true })
  solveState?: JobState | null;

  /** Review state of the shot's latest take (null before the first). */
  @Enum({ items: () => ReviewState, nullable: true })
  reviewState?: ReviewState | null;

  @Property({ type: 'integer', nullable: true })
  latestTakeVersion?: number | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  constructor(
    show: Show,
    fields: { sequence: string; code: string; frameStart: number; frameEnd: number; fps: number },
  ) {
    this.show = show;
    this.sequence = fields.sequence.trim();
    this.code = fields.code.trim();
    this.frameStart = fields.frameStart;
    this.frameEnd = fields.frameEnd;
    this.fps = fields.fps;
  }

  /** True when a frame is inside the shot's range. */
  hasFrame(frame: number): boolean {
    return frame >= this.frameStart && frame <= this.frameEnd;
  }
}
