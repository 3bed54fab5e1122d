import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import type { EntityManager as AnyEntityManager } from '@mikro-orm/core';
import { DomainError } from '../common/errors/domain-error';
import { AuditService } from '../audit/audit.service';
import type { UserPrincipal } from '../auth/principal';
import { StorageService } from '../storage/storage.service';
import { storageUnavailable } from '../assets/asset-errors';
import { todayUtc } from '../assets/upload-rules';
import { Capture } from './entities/capture.entity';
import { TissueProfile } from './entities/tissue-profile.entity';
import { captureView, type CaptureView } from './library-views';
import { captureNotFound } from './library-errors';
import { LibraryService, type FileLink } from './library.service';

/** Captures: biometric data with a consent record; listing, download, deletion, use for learning. */
@Injectable()
export class CapturesService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: StorageService,
    private readonly audit: AuditService,
    private readonly library: LibraryService,
  ) {}

  /** The show's captures with their consent records (deleted ones only when asked). */
  async list(showId: string, includeDeleted = false): Promise<CaptureView[]> {
    const rows = await this.em.find(
      Capture,
      { show: showId, ...(includeDeleted ? {} : { deletedAt: null }) },
      { populate: ['asset'], orderBy: { consentRecordedAt: 'desc' } },
    );
    return rows.map(captureView);
  }

  /** One capture of the show (also once deleted: its record remains). */
  async get(showId: string, id: string): Promise<CaptureView> {
    return captureView(await this.find(this.em, showId, id));
  }

  /** A download link for a capture's file. */
  async file(showId: string, id: string): Promise<FileLink> {
    const capture = await this.find(this.em, showId, id);
    if (capture.deletedAt) throw deleted(capture);
    return this.library.link(capture.asset);
  }

  /**
   * Deletes a capture's files from the S3 store first (so a failure never leaves marked-deleted
   * data behind), then marks it deleted with the reason, marks the profiles learned from it,
   * and audits it. Deleting again is refused.
   */
  async delete(
    actor: UserPrincipal,
    showId: string,
    id: string,
    reason: string,
  ): Promise<CaptureView> {
    const capture = await this.find(this.em, showId, id);
    if (capture.deletedAt) throw deleted(capture);
    const asset = capture.asset;
    try {
      if (asset.uploadId) await this.storage.abortMultipart(asset.s3Key, asset.uploadId);
      await this.storage.delete(asset.s3Key);
    } catch (e) {
      throw storageUnavailable(e);
    }
    const now = new Date();
    asset.uploadId = null;
    capture.deletedAt = now;
    capture.deletionReason = reason.trim();
    capture.deletedBy = actor.user;
    const profiles = await this.em.find(TissueProfile, { capture, captureDeletedAt: null });
    for (const p of profiles) p.captureDeletedAt = now;
    this.audit.add(this.em, actor, {
      action: 'capture.deleted',
      objectType: 'capture',
      objectId: capture.id,
      showId,
      details: {
        reason: capture.deletionReason,
        performerCode: capture.performerCode,
        objects: [asset.s3Key],
        profilesMarked: profiles.map((p) => p.id),
      },
    });
    await this.em.flush();
    return captureView(capture);
  }

  /**
   * The capture, if new learning from it is allowed: not deleted, file ready, consent not
   * expired on `today`. The learn job calls this before it starts (with its own EntityManager).
   */
  async assertUsableForLearning(
    em: AnyEntityManager,
    showId: string,
    id: string,
    today = todayUtc(),
  ): Promise<Capture> {
    const capture = await this.find(em, showId, id);
    if (capture.deletedAt) throw deleted(capture);
    if (capture.consentExpired(today)) {
      throw new DomainError(
        'invalid',
        'CONSENT_EXPIRED',
        `The performer's consent expired on ${capture.consentExpiresOn}: no new learning from this capture. Record a renewed consent by uploading the capture again.`,
        { captureId: id, expiresOn: capture.consentExpiresOn },
      );
    }
    if (capture.asset.state !== 'ready') {
      throw new DomainError(
        'conflict',
        'ASSET_NOT_READY',
        'The capture has not passed its check.',
        {
          captureId: id,
          state: capture.asset.state,
        },
      );
    }
    return capture;
  }

  private async find(em: AnyEntityManager, showId: string, id: string): Promise<Capture> {
    const c = await em.findOne(Capture, { id, show: showId }, { populate: ['asset'] });
    if (!c) throw captureNotFound(id);
    return c;
  }
}

const deleted = (c: Capture) =>
  new DomainError(
    'conflict',
    'CAPTURE_DELETED',
    `Capture ${c.id} was deleted; only its record remains.`,
    {
      captureId: c.id,
      deletedAt: c.deletedAt?.toISOString(),
    },
  );
