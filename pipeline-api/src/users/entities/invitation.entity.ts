import { randomUUID } from 'node:crypto';
import { Entity, Enum, Index, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Role } from './role';
import { User } from './user.entity';

/** An admin's invitation to join with a role and shows; accepting it creates the user. */
@Entity({ tableName: 'invitations' })
@Index({ properties: ['email'] })
export class Invitation {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 254 })
  email: string;

  @Enum({ items: () => Role })
  role: Role;

  /** Shows the new user becomes a member of (ids; shows archived meanwhile still apply). */
  @Property({ type: 'json' })
  showIds: string[];

  @Property({ type: 'string', length: 64, hidden: true })
  @Unique()
  tokenHash: string;

  @ManyToOne(() => User)
  invitedBy: User;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime' })
  expiresAt: Date;

  @Property({ type: 'datetime', nullable: true })
  acceptedAt?: Date;

  /** Set when a newer invitation to the same address replaces this one. */
  @Property({ type: 'datetime', nullable: true })
  revokedAt?: Date;

  constructor(
    email: string,
    role: Role,
    showIds: string[],
    tokenHash: string,
    invitedBy: User,
    expiresAt: Date,
  ) {
    this.email = User.normaliseEmail(email);
    this.role = role;
    this.showIds = showIds;
    this.tokenHash = tokenHash;
    this.invitedBy = invitedBy;
    this.expiresAt = expiresAt;
  }

  /** Whether the link still works at `now`. */
  isOpen(now: Date): boolean {
    return !this.acceptedAt && !this.revokedAt && this.expiresAt > now;
  }
}
