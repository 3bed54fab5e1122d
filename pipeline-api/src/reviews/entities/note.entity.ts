import { randomUUID } from 'node:crypto';
import { Entity, Index, ManyToOne, PrimaryKey, Property } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';
import { Take } from '../../takes/entities/take.entity';

/** A drawn mark: strokes of points in normalised view coordinates, each in [0, 1]. */
export interface NoteMark {
  strokes: { points: [number, number][] }[];
}

/** A review remark pinned to a take and a frame, optionally with a drawn mark. */
@Entity({ tableName: 'notes' })
@Index({ properties: ['take', 'frame'] })
export class Note {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @ManyToOne(() => Take)
  take: Take;

  @Property({ type: 'integer' })
  frame: number;

  @Property({ type: 'text' })
  text: string;

  @Property({ type: 'json', nullable: true })
  mark?: NoteMark | null;

  @ManyToOne(() => User)
  author: User;

  @Property({ type: 'boolean' })
  resolved = false;

  @ManyToOne(() => User, { nullable: true })
  resolvedBy?: User | null;

  @Property({ type: 'datetime', nullable: true })
  resolvedAt?: Date | null;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  constructor(take: Take, frame: number, text: string, mark: NoteMark | null, author: User) {
    this.take = take;
    this.frame = frame;
    this.text = text;
    this.mark = mark;
    this.author = author;
  }
}
