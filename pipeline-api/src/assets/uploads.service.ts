import { Injectable, Logger } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import { EntityManager } from '@mikro-orm/mariadb';
import type { Queue } from 'bullmq';
import { DomainError } from '../common/errors/domain-error';
import { Env } from '../config/env.validation';
import { QUEUES } from '../queues/queue-names';
import { AuditService } from '../audit/audit.service';
import type { UserPrincipal } from '../auth/principal';
import { StorageService, type UploadedPart } from '../storage/storage.service';
import { Show } from '../shows/entities/show.entity';
import { Character } from '../library/entities/character.entity';
import { Capture } from '../library/entities/capture.entity';
import { Clip } from '../library/entities/clip.entity';
import { Asset, AssetKind, AssetState } from './entities/asset.entity';
import { assetView, type AssetView } from './asset-view';
import type { CreateUploadDto } from './dto/create-upload.dto';
import type { IngestJobData, IngestResult } from './ingest/ingest-job';
import { assetNotFound, storageUnavailable } from './asset-errors';
import {
  assertSize,
  defaultContentType,
  fileFormat,
  requireConsent,
  todayUtc,
} from './upload-rules';

/** Where to PUT each part. */
export interface PartUrl {
  partNumber: number;
  url: string;
}

/** An open upload: the asset and how to send its file. */
export interface UploadView {
  asset: AssetView;
  partSize: number;
  partCount: number;
  parts: PartUrl[];
  expiresAt: string;
}

/** S3 allows at most this many parts per upload. */
const MAX_PARTS = 10_000;

/**
 * Presigned multipart uploads straight to the S3 store: create (with the consent record for
 * captures) → part URLs → complete (queues the ingest check) or abort.
 */
@Injectable()
export class UploadsService {
  private readonly logger = new Logger('Uploads');

  constructor(
    private readonly em: EntityManager,
    private readonly env: Env,
    private readonly storage: StorageService,
    private readonly audit: AuditService,
    @InjectQueue(QUEUES.ingest) private readonly queue: Queue<IngestJobData, IngestResult, 'check'>,
  ) {}

  /** Records the asset (and its character, capture or clip) and opens the multipart upload. */
  async create(actor: UserPrincipal, showId: string, body: CreateUploadDto): Promise<UploadView> {
    const format = fileFormat(body.kind, body.fileName);
    assertSize(this.env, body.kind, body.size);
    if (body.kind !== AssetKind.Capture && (body.consent || body.characterId)) {
      throw new DomainError(
        'invalid',
        'VALIDATION_FAILED',
        'Only captures take a consent record and a character.',
        [{ field: body.consent ? 'consent' : 'characterId', problems: ['only for captures'] }],
      );
    }
    const consent =
      body.kind === AssetKind.Capture ? requireConsent(body.consent, todayUtc()) : null;
    const character = consent ? await this.readyCharacter(showId, body.characterId) : null;

    const show = this.em.getReference(Show, showId);
    const asset = new Asset(
      show,
      body.kind,
      {
        size: body.size,
        sha256: body.sha256,
        contentType: body.contentType ?? defaultContentType(format),
        originalName: body.fileName,
      },
      actor.user,
    );
    asset.progress = { stage: 'uploading', percent: 0 };
    const name = body.name ?? body.fileName.replace(/\.[^.]+$/, '');
    this.em.persist(asset);
    if (body.kind === AssetKind.Character) this.em.persist(new Character(asset, name));
    if (body.kind === AssetKind.Clip) this.em.persist(new Clip(asset, name, format));
    if (consent && character) {
      const capture = new Capture(asset, character, consent, actor.user);
      this.em.persist(capture);
      this.audit.add(this.em, actor, {
        action: 'capture.consent_recorded',
        objectType: 'capture',
        objectId: capture.id,
        showId,
        details: { performerCode: capture.performerCode, expiresOn: capture.consentExpiresOn },
      });
    }
    try {
      asset.uploadId = await this.storage.createMultipart(asset.s3Key, asset.contentType);
    } catch (e) {
      throw storageUnavailable(e);
    }
    try {
      await this.em.flush();
    } catch (e) {
      await this.storage.abortMultipart(asset.s3Key, asset.uploadId).catch(() => undefined);
      throw e;
    }
    const partSize = this.partSize(asset.size);
    const partCount = Math.ceil(asset.size / partSize);
    const numbers = Array.from({ length: partCount }, (_, i) => i + 1);
    return {
      asset: assetView(asset),
      partSize,
      partCount,
      parts: await this.sign(asset, numbers),
      expiresAt: this.storage.urlExpiry().toISOString(),
    };
  }

  /** Fresh URLs for some parts of an open upload (to resume after they expired). */
  async partUrls(
    showId: string,
    assetId: string,
    partNumbers: number[],
  ): Promise<{ parts: PartUrl[]; expiresAt: string }> {
    const asset = await this.openUpload(showId, assetId);
    const partCount = Math.ceil(asset.size / this.partSize(asset.size));
    const outside = partNumbers.filter((n) => n > partCount);
    if (outside.length > 0) {
      throw new DomainError(
        'invalid',
        'UPLOAD_PARTS_INVALID',
        `This upload has parts 1 to ${partCount}.`,
        { partCount, outside },
      );
    }
    const parts = await this.sign(
      asset,
      [...new Set(partNumbers)].sort((a, b) => a - b),
    );
    return { parts, expiresAt: this.storage.urlExpiry().toISOString() };
  }

  /**
   * Joins the parts, checks the stored size, and queues the ingest check. A file of the wrong
   * size is deleted and the asset rejected with its report.
   */
  async complete(
    actor: UserPrincipal,
    showId: string,
    assetId: string,
    parts: UploadedPart[],
  ): Promise<AssetView> {
    const asset = await this.findAsset(showId, assetId);
    // Completed before but not queued (the queue was down): queue again, harmlessly.
    if (asset.state === AssetState.Pending && !asset.uploadId && asset.uploadedAt) {
      await this.enqueue(asset);
      return assetView(asset);
    }
    if (asset.state !== AssetState.Pending || !asset.uploadId) throw notOpen(asset);
    const partCount = Math.ceil(asset.size / this.partSize(asset.size));
    const listed = parts.map((p) => p.partNumber).sort((a, b) => a - b);
    if (listed.length !== partCount || listed.some((n, i) => n !== i + 1)) {
      throw new DomainError(
        'invalid',
        'UPLOAD_PARTS_INVALID',
        `List each of the parts 1 to ${partCount} once, with its ETag.`,
        { partCount, listed },
      );
    }
    try {
      await this.storage.completeMultipart(asset.s3Key, asset.uploadId, parts);
    } catch (e) {
      const name = (e as { name?: string }).name ?? '';
      if (/InvalidPart|EntityTooSmall|NoSuchUpload|MalformedXML/.test(name)) {
        throw new DomainError(
          'invalid',
          'UPLOAD_PARTS_INVALID',
          `The S3 store refused the parts: ${(e as Error).message}`,
          { reason: name },
        );
      }
      throw storageUnavailable(e);
    }
    const stored = await this.storage.size(asset.s3Key).catch((e) => {
      throw storageUnavailable(e);
    });
    asset.uploadId = null;
    asset.uploadedAt = new Date();
    if (stored !== asset.size) {
      await this.storage.delete(asset.s3Key);
      asset.reject({
        code: 'SIZE_MISMATCH',
        message: `The stored file has ${stored} bytes; ${asset.size} were declared.`,
        where: { declared: asset.size, stored },
      });
      await this.em.flush();
      throw new DomainError(
        'invalid',
        'UPLOAD_SIZE_MISMATCH',
        `The stored file has ${stored} bytes, not the declared ${asset.size}; it was deleted.`,
        { declared: asset.size, stored },
      );
    }
    asset.progress = { stage: 'queued', percent: 0 };
    this.audit.add(this.em, actor, {
      action: 'asset.uploaded',
      objectType: 'asset',
      objectId: asset.id,
      showId,
      details: { kind: asset.kind, size: asset.size },
    });
    await this.em.flush();
    await this.enqueue(asset);
    return assetView(asset);
  }

  /** Drops an open upload: its parts in the S3 store and its rows. */
  async abort(showId: string, assetId: string): Promise<void> {
    const asset = await this.openUpload(showId, assetId);
    try {
      await this.storage.abortMultipart(asset.s3Key, asset.uploadId as string);
    } catch (e) {
      throw storageUnavailable(e);
    }
    for (const type of [Character, Capture, Clip] as const) {
      await this.em.nativeDelete(type, { asset: asset.id });
    }
    this.em.remove(asset);
    await this.em.flush();
  }

  private async enqueue(asset: Asset): Promise<void> {
    try {
      await this.queue.add(
        'check',
        { assetId: asset.id },
        {
          jobId: asset.id,
          attempts: this.env.INGEST_MAX_ATTEMPTS,
          backoff: { type: 'exponential', delay: 2000 },
          removeOnComplete: { age: 3600, count: 1000 },
          removeOnFail: { age: 7 * 86_400 },
        },
      );
    } catch (e) {
      this.logger.error(`could not queue the check of ${asset.id}: ${(e as Error).message}`);
      throw new DomainError(
        'unavailable',
        'INGEST_UNAVAILABLE',
        'The file is stored but its check could not be queued; complete the upload again.',
      );
    }
  }

  private partSize(size: number): number {
    return Math.max(this.env.UPLOAD_PART_BYTES, Math.ceil(size / MAX_PARTS));
  }

  private async sign(asset: Asset, numbers: number[]): Promise<PartUrl[]> {
    return Promise.all(
      numbers.map(async (partNumber) => ({
        partNumber,
        url: await this.storage.presignPart(asset.s3Key, asset.uploadId as string, partNumber),
      })),
    );
  }

  private async readyCharacter(showId: string, characterId?: string): Promise<Character> {
    if (!characterId) {
      throw new DomainError(
        'invalid',
        'VALIDATION_FAILED',
        'A capture upload needs the character it is registered to.',
        [{ field: 'characterId', problems: ['characterId is required for a capture'] }],
      );
    }
    const character = await this.em.findOne(
      Character,
      { id: characterId, show: showId },
      { populate: ['asset'] },
    );
    if (!character) {
      throw new DomainError('not_found', 'CHARACTER_NOT_FOUND', `No character ${characterId}.`, {
        characterId,
      });
    }
    if (character.asset.state !== AssetState.Ready) {
      throw new DomainError(
        'conflict',
        'CHARACTER_NOT_READY',
        `Character ${character.name} has not passed its check (${character.asset.state}).`,
        { characterId, state: character.asset.state },
      );
    }
    return character;
  }

  private async findAsset(showId: string, assetId: string): Promise<Asset> {
    const asset = await this.em.findOne(Asset, { id: assetId, show: showId });
    if (!asset) throw assetNotFound(assetId);
    return asset;
  }

  private async openUpload(showId: string, assetId: string): Promise<Asset> {
    const asset = await this.findAsset(showId, assetId);
    if (asset.state !== AssetState.Pending || !asset.uploadId) throw notOpen(asset);
    return asset;
  }
}

const notOpen = (asset: Asset) =>
  new DomainError(
    'conflict',
    'UPLOAD_NOT_OPEN',
    `The upload of asset ${asset.id} is not waiting for parts (state ${asset.state}).`,
    { assetId: asset.id, state: asset.state },
  );
