import { createHash } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { MikroORM, type EntityManager } from '@mikro-orm/core';
import { UnrecoverableError } from 'bullmq';
import { StorageService } from '../../storage/storage.service';
import { JobEventsPublisher } from '../../events/job-events-publisher';
import { Character } from '../../library/entities/character.entity';
import { Capture } from '../../library/entities/capture.entity';
import { Clip } from '../../library/entities/clip.entity';
import { Asset, AssetKind, AssetState, type AssetProgress } from '../entities/asset.entity';
import { BadFile, readAsset, type AssetFacts } from './read-asset';
import type { IngestResult } from './ingest-job';

/** Reports progress to the job (the asset row and the live events carry it too). */
export type ProgressSink = (p: AssetProgress) => Promise<void>;

/**
 * The ingest check, run in the worker: download while hashing, verify the declared SHA-256, read
 * the file with the solver, then record its metadata (ready) or its report (rejected, and the
 * object deleted so nothing half-stored remains).
 */
@Injectable()
export class IngestService {
  private readonly logger = new Logger('Ingest');

  constructor(
    private readonly orm: MikroORM,
    private readonly storage: StorageService,
    private readonly events: JobEventsPublisher,
  ) {}

  /**
   * Checks one asset. Bad files end in UnrecoverableError (no retry) after the rejection is
   * recorded; other faults are thrown for BullMQ to retry, and `lastAttempt` rejects instead.
   */
  async check(
    assetId: string,
    progress: ProgressSink,
    lastAttempt: boolean,
  ): Promise<IngestResult> {
    const em = this.orm.em.fork();
    const asset = await em.findOne(Asset, assetId);
    if (!asset || asset.state !== AssetState.Pending || asset.uploadId) return { state: 'skipped' };
    const capture =
      asset.kind === AssetKind.Capture
        ? await em.findOne(Capture, { asset }, { populate: ['character.asset'] })
        : null;
    if (capture?.deletedAt) return { state: 'skipped' };
    try {
      const report = async (p: AssetProgress) => {
        asset.progress = p;
        await em.nativeUpdate(Asset, { id: asset.id }, { progress: p });
        await progress(p);
        await this.publish(asset);
      };
      const bytes = await this.download(asset, report);
      await report({ stage: 'validating', percent: 60 });
      const facts = await readAsset(asset.kind, bytes, asset.originalName, async () => {
        const target = capture?.character.asset;
        if (!target || target.state !== AssetState.Ready) {
          throw new BadFile('CHARACTER_NOT_READY', 'The capture’s character is not ready.', {});
        }
        return this.readAll(target.s3Key);
      });
      await this.accept(em, asset, facts);
      return { state: 'ready' };
    } catch (e) {
      if (e instanceof BadFile) {
        await this.reject(em, asset, e);
        throw new UnrecoverableError(`${e.code}: ${e.message}`);
      }
      if (lastAttempt) {
        const why = new BadFile(
          'INGEST_FAILED',
          `The file could not be checked: ${(e as Error).message}`,
        );
        await this.reject(em, asset, why);
      }
      throw e;
    }
  }

  /** Streams the object, hashing as it goes; a digest other than the declared one is refused. */
  private async download(asset: Asset, report: ProgressSink): Promise<Uint8Array> {
    let stream;
    try {
      stream = await this.storage.stream(asset.s3Key);
    } catch (e) {
      if ((e as { name?: string }).name === 'NoSuchKey')
        throw new BadFile('FILE_MISSING', 'The uploaded file is not in the S3 store.', {});
      throw e;
    }
    const hash = createHash('sha256');
    const chunks: Buffer[] = [];
    let received = 0;
    let reported = 0;
    for await (const chunk of stream) {
      const buf = chunk as Buffer;
      hash.update(buf);
      chunks.push(buf);
      received += buf.length;
      const percent = Math.floor((50 * received) / Math.max(1, asset.size));
      if (percent >= reported + 10) {
        reported = percent;
        await report({ stage: 'downloading', percent });
      }
    }
    const actual = hash.digest('hex');
    if (actual !== asset.sha256) {
      throw new BadFile(
        'SHA256_MISMATCH',
        'The file’s SHA-256 differs from the one declared at upload: it was damaged or replaced.',
        { declared: asset.sha256, actual },
      );
    }
    return Buffer.concat(chunks, received);
  }

  /** The asset's progress and state as a live event of its show. */
  private publish(asset: Asset): Promise<void> {
    const { stage, percent } = asset.progress ?? { stage: asset.state, percent: 0 };
    return this.events.assetProgress(asset.show.id, {
      assetId: asset.id,
      kind: asset.kind,
      stage,
      percent,
      state: asset.state,
    });
  }

  private async readAll(key: string): Promise<Uint8Array> {
    const chunks: Buffer[] = [];
    for await (const chunk of await this.storage.stream(key)) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks);
  }

  private async accept(em: EntityManager, asset: Asset, facts: AssetFacts): Promise<void> {
    if (facts.kind === AssetKind.Character) {
      const character = await em.findOneOrFail(Character, { asset });
      const latest = await em.findOne(
        Character,
        { show: asset.show, name: character.name, version: { $ne: null } },
        { orderBy: { version: 'desc' } },
      );
      Object.assign(character, {
        version: (latest?.version ?? 0) + 1,
        vertexCount: facts.vertexCount,
        triangleCount: facts.triangleCount,
        joints: facts.joints,
        regions: facts.regions,
        bbox: facts.bbox,
      });
    } else if (facts.kind === AssetKind.Capture) {
      const capture = await em.findOneOrFail(Capture, { asset });
      Object.assign(capture, { frameCount: facts.frameCount, fps: facts.fps });
    } else {
      const clip = await em.findOneOrFail(Clip, { asset });
      Object.assign(clip, { frameCount: facts.frameCount, fps: facts.fps, joints: facts.joints });
    }
    asset.state = AssetState.Ready;
    asset.checkedAt = new Date();
    asset.validationReport = null;
    asset.progress = { stage: 'ready', percent: 100 };
    await em.flush();
    await this.publish(asset);
  }

  /** Deletes the object first (a retry then finds no file) and records the report. */
  private async reject(em: EntityManager, asset: Asset, bad: BadFile): Promise<void> {
    await this.storage.delete(asset.s3Key);
    asset.reject({ code: bad.code, message: bad.message, where: bad.where });
    await em.flush();
    await this.publish(asset);
    this.logger.warn(`asset ${asset.id} rejected: ${bad.code} ${bad.message}`);
  }
}
