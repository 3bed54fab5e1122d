import { randomUUID } from 'node:crypto';
import { Entity, Enum, PrimaryKey, Property, Unique } from '@mikro-orm/core';
import { Role } from './role';

/** A person who signs in to Overshoot. */
@Entity({ tableName: 'users' })
export class User {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'string', length: 254 })
  @Unique()
  email: string;

  @Property({ type: 'string', length: 120 })
  displayName: string;

  @Property({ type: 'string', length: 255, hidden: true })
  passwordHash: string;

  @Enum({ items: () => Role })
  role: Role;

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'datetime', onUpdate: () => new Date() })
  updatedAt: Date = new Date();

  @Property({ type: 'datetime', nullable: true })
  disabledAt?: Date | null;

  constructor(email: string, displayName: string, passwordHash: string, role: Role) {
    this.email = User.normaliseEmail(email);
    this.displayName = displayName;
    this.passwordHash = passwordHash;
    this.role = role;
  }

  /** E-mail addresses compare case-insensitively and without surrounding space. */
  static normaliseEmail(email: string): string {
    return email.trim().toLowerCase();
  }
}
