import { randomUUID } from 'node:crypto';
import { Entity, ManyToOne, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { User } from '../../users/entities/user.entity';

/** A single-use password reset link; the row keeps only the SHA-256 of its secret. */
@Entity({ tableName: 'password_resets' })
export class PasswordReset {
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
  expiresAt: Date;

  @Property({ type: 'datetime', nullable: true })
  usedAt?: Date;

  constructor(user: User, tokenHash: string, expiresAt: Date) {
    this.user = user;
    this.tokenHash = tokenHash;
    this.expiresAt = expiresAt;
  }
}
