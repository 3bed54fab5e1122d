import { randomUUID } from 'node:crypto';
import { Collection, Entity, OneToMany, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Membership } from './membership.entity';

/** One production; owns everything below it. */
@Entity({ tableName: 'shows' })
export class Show {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  /** Short code used in file names and mail subjects, unique, upper case. */
  @Property({ type: 'string', length: 16 })
  @Unique()
  code: string;

  @Property({ type: 'string', length: 120 })
  name: string;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  archivedAt?: Date | null;

  @OneToMany(() => Membership, (m) => m.show)
  memberships = new Collection<Membership>(this);

  constructor(code: string, name: string) {
    this.code = Show.normaliseCode(code);
    this.name = name.trim();
  }

  /** Show codes compare upper case without surrounding space. */
  static normaliseCode(code: string): string {
    return code.trim().toUpperCase();
  }
}
