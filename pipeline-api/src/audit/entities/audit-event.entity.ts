import { randomUUID } from 'node:crypto';
import { Entity, Index, PrimaryKey, Property } from '@mikro-orm/core';

/** Who acted: a person, a pipeline token, the system, or someone not signed in. */
export type ActorKind = 'user' | 'token' | 'system' | 'anonymous';

/**
 * Who did what to which object in which show. Plain ids, not foreign keys: the trail outlives
 * what it mentions and is never rewritten.
 */
@Entity({ tableName: 'audit_events' })
@Index({ properties: ['showId', 'createdAt'] })
@Index({ properties: ['objectType', 'objectId'] })
export class AuditEvent {
  @PrimaryKey({ type: 'uuid' })
  id: string = randomUUID();

  @Property({ type: 'datetime' })
  createdAt: Date = new Date();

  @Property({ type: 'string', length: 16 })
  actorKind: ActorKind;

  @Property({ type: 'string', length: 36, nullable: true })
  actorId?: string;

  /** The actor's e-mail or token name at the time. */
  @Property({ type: 'string', length: 254, nullable: true })
  actorLabel?: string;

  /** Dotted verb, e.g. `user.invited`, `token.revoked`, `auth.sign_in_failed`. */
  @Property({ type: 'string', length: 60 })
  action: string;

  @Property({ type: 'string', length: 40, nullable: true })
  objectType?: string;

  @Property({ type: 'string', length: 36, nullable: true })
  objectId?: string;

  @Property({ type: 'string', length: 36, nullable: true })
  showId?: string;

  @Property({ type: 'json', nullable: true })
  details?: Record<string, unknown>;

  @Property({ type: 'string', length: 64, nullable: true })
  ip?: string;

  constructor(actorKind: ActorKind, action: string) {
    this.actorKind = actorKind;
    this.action = action;
  }
}
