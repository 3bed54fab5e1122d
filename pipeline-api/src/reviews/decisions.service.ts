import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { Env } from '../config/env.validation';
import { AuditService } from '../audit/audit.service';
import type { UserPrincipal } from '../auth/principal';
import { MailOutboxService } from '../mail/mail-outbox.service';
import { JobState } from '../jobs/job-state';
import { TakesService } from '../takes/takes.service';
import { ReviewState, type Decision } from '../takes/review-state';
import { mailTakeRecipients, takeLabel, takeLink } from '../takes/take-mail';
import { ReviewDecision } from './entities/review-decision.entity';
import { decisionView, type DecisionView } from './review-views';

/** Supervisors' decisions on takes, and the e-mail that tells the people concerned. */
@Injectable()
export class DecisionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly takes: TakesService,
    private readonly outbox: MailOutboxService,
    private readonly audit: AuditService,
    private readonly env: Env,
  ) {}

  /** The take's decisions, oldest first. */
  async list(showId: string, takeId: string): Promise<DecisionView[]> {
    const take = await this.takes.find(showId, takeId);
    const rows = await this.em.find(
      ReviewDecision,
      { take },
      { populate: ['supervisor'], orderBy: { at: 'asc' } },
    );
    return rows.map(decisionView);
  }

  /**
   * Approves a take or requests changes. Only a take whose job solved and that awaits review can
   * be decided; the shot's review state follows its latest take. The assignees and the take's
   * creator are e-mailed.
   */
  async decide(
    actor: UserPrincipal,
    showId: string,
    takeId: string,
    decision: Decision,
    comment?: string,
  ): Promise<DecisionView> {
    const take = await this.takes.find(showId, takeId);
    if (take.job.state !== JobState.Solved) {
      throw new DomainError(
        'conflict',
        'TAKE_NOT_SOLVED',
        `The job of take v${take.version} is ${take.job.state}; only solved takes are reviewed.`,
        { takeId, solveState: take.job.state },
      );
    }
    if (take.reviewState !== ReviewState.AwaitingReview) {
      throw new DomainError(
        'conflict',
        'TAKE_ALREADY_DECIDED',
        `Take v${take.version} is already ${take.reviewState}.`,
        { takeId, reviewState: take.reviewState },
      );
    }
    const text = comment?.trim() || null;
    const record = new ReviewDecision(take, decision, text, actor.user);
    take.reviewState = decision;
    take.reviewedAt = record.at;
    if (take.shot.latestTakeVersion === take.version) take.shot.reviewState = decision;
    this.em.persist(record);
    this.audit.add(this.em, actor, {
      action: `take.${decision}`,
      objectType: 'take',
      objectId: take.id,
      showId,
      details: { version: take.version, shotId: take.shot.id },
    });
    await this.em.flush();
    const approved = decision === ReviewState.Approved;
    await this.em.populate(take, ['shot.show']);
    await mailTakeRecipients(this.em, this.outbox, take, {
      kind: approved ? 'take_approved' : 'take_changes_requested',
      subject: `${approved ? 'Approved' : 'Changes requested'}: ${takeLabel(take)}`,
      text: (u) =>
        `Hello ${u.displayName},\n\n${actor.user.displayName} ` +
        `${approved ? 'approved' : 'requested changes on'} ${takeLabel(take)}.` +
        `${text ? `\n\n${text}` : ''}\n\nOpen it: ${takeLink(this.env, take)}\n`,
    });
    return decisionView(record);
  }
}
