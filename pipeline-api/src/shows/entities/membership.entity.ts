import { randomUUID } from 'node:crypto';
import { Entity, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { Show } from './show.entity';

/** A user's membership of a show: what lets them see it and everything in it. */
@Entity({ tableName: 'memberships' })
@Unique({ properties: ['show', 'user'] })
export class Membership {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Show)
  show: Show;

  @ManyToOne(() => User)
  user: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  constructor(show: Show, user: User) {
    this.show = show;
    this.user = user;
  }
}
