import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { Take } from '../../takes/entities/take.entity';
import { ReviewState, type Decision } from '../../takes/review-state';

/** A supervisor's decision on a take. */
@Entity({ tableName: 'review_decisions' })
@Index({ properties: ['decision', 'at'] })
export class ReviewDecision {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Take)
  take: Take;

  @Enum({ items: [ReviewState.Approved, ReviewState.ChangesRequested] })
  decision: Decision;

  @Property({ type: 'text', nullable: true })
  comment?: string | null;

  @ManyToOne(() => User)
  supervisor: User;

  @Property({ type: 'datetime' })
  at: Date = new Date();

  constructor(take: Take, decision: Decision, comment: string | null, supervisor: User) {
    this.take = take;
    this.decision = decision;
    this.comment = comment;
    this.supervisor = supervisor;
  }
}
