import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/core';
import type { Principal } from '../auth/principal';
import { AuditEvent } from './entities/audit-event.entity';

/** One thing to record. */
export interface AuditInput {
  action: string;
  objectType?: string;
  objectId?: string;
  showId?: string;
  details?: Record<string, unknown>;
  ip?: string;
  /** For actions without a principal (failed sign-in, accepted invitation): who it was about. */
  actorLabel?: string;
}

/** Records who did what to which object in which show. */
@Injectable()
export class AuditService {
  /**
   * Adds an event to `em`'s unit of work, so it commits with the change it describes in the
   * caller's next flush (or neither does).
   */
  add(em: EntityManager, actor: Principal | undefined, input: AuditInput): AuditEvent {
    const event = new AuditEvent(actor?.kind ?? 'anonymous', input.action);
    if (actor?.kind === 'user') {
      event.actorId = actor.user.id;
      event.actorLabel = actor.user.email;
    } else if (actor?.kind === 'token') {
      event.actorId = actor.token.id;
      event.actorLabel = actor.token.name;
    } else {
      event.actorLabel = input.actorLabel;
    }
    event.objectType = input.objectType;
    event.objectId = input.objectId;
    event.showId = input.showId;
    event.details = input.details;
    event.ip = input.ip;
    em.persist(event);
    return event;
  }
}
