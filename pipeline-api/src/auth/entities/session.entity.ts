import { randomUUID } from 'node:crypto';
import { Entity, Index, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';

/** A signed-in browser. The secret lives only in its cookie; the row keeps its SHA-256. */
@Entity({ tableName: 'sessions' })
@Index({ properties: ['user', 'revokedAt'] })
export class Session {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 64, hidden: true })
  @Unique()
  tokenHash: string;

  @ManyToOne(() => User)
  user: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime' })
  lastSeenAt: Date = new Date();

  /** Ends the session after this long without use; moves forward on use. */
  @Property({ type: 'datetime' })
  idleExpiresAt: Date;

  /** Ends the session whatever the use. */
  @Property({ type: 'datetime' })
  absoluteExpiresAt: Date;

  @Property({ type: 'datetime', nullable: true })
  revokedAt?: Date;

  @Property({ type: 'string', length: 64, nullable: true })
  ip?: string;

  @Property({ type: 'string', length: 255, nullable: true })
  userAgent?: string;

  constructor(user: User, tokenHash: string, idleExpiresAt: Date, absoluteExpiresAt: Date) {
    this.user = user;
    this.tokenHash = tokenHash;
    this.idleExpiresAt = idleExpiresAt;
    this.absoluteExpiresAt = absoluteExpiresAt;
  }

  /** Whether the session still signs its user in at `now`. */
  isLive(now: Date): boolean {
    return !this.revokedAt && this.idleExpiresAt > now && this.absoluteExpiresAt > now;
  }
}
