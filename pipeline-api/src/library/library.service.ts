import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { StorageService } from '../storage/storage.service';
import { AssetState, type Asset } from '../assets/entities/asset.entity';
import { Character } from './entities/character.entity';
import { Clip } from './entities/clip.entity';
import { TissueProfile } from './entities/tissue-profile.entity';
import {
  characterView,
  clipView,
  profileView,
  type CharacterView,
  type ClipView,
  type ProfileView,
} from './library-views';
import { characterNotFound, clipNotFound, profileNotFound } from './library-errors';
import { LearnJob } from '../jobs/entities/learn-job.entity';
import { learnJobView } from '../jobs/job-view';

/** A presigned download of an asset's file. */
export interface FileLink {
  url: string;
  expiresAt: string;
  fileName: string;
  size: number;
  sha256: string;
}

/** Characters, clips and profiles of a show, and download links for their files. */
@Injectable()
export class LibraryService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: StorageService,
  ) {}

  /** The show's characters, by name and version (rejected uploads only when asked). */
  async characters(showId: string, includeRejected = false): Promise<CharacterView[]> {
    const rows = await this.em.find(
      Character,
      {
        show: showId,
        ...(includeRejected ? {} : { asset: { state: { $ne: AssetState.Rejected } } }),
      },
      { populate: ['asset'], orderBy: { name: 'asc', version: 'desc', createdAt: 'desc' } },
    );
    return rows.map(characterView);
  }

  /** One character of the show. */
  async character(showId: string, id: string): Promise<CharacterView> {
    return characterView(await this.findCharacter(showId, id));
  }

  /** The show's clips, by name. */
  async clips(showId: string, includeRejected = false): Promise<ClipView[]> {
    const rows = await this.em.find(
      Clip,
      {
        show: showId,
        ...(includeRejected ? {} : { asset: { state: { $ne: AssetState.Rejected } } }),
      },
      { populate: ['asset'], orderBy: { name: 'asc', createdAt: 'desc' } },
    );
    return rows.map(clipView);
  }

  /** One clip of the show. */
  async clip(showId: string, id: string): Promise<ClipView> {
    return clipView(await this.findClip(showId, id));
  }

  /** The show's tissue profiles, newest first, each with its learn job. */
  async profiles(showId: string): Promise<ProfileView[]> {
    const rows = await this.em.find(
      TissueProfile,
      { show: showId },
      { orderBy: { createdAt: 'desc' } },
    );
    const jobs = await this.em.find(LearnJob, { profile: { $in: rows.map((p) => p.id) } });
    const byProfile = new Map(jobs.map((j) => [j.profile.id, learnJobView(j)]));
    return rows.map((p) => profileView(p, byProfile.get(p.id) ?? null));
  }

  /** One profile of the show, with its learn job. */
  async profile(showId: string, id: string): Promise<ProfileView> {
    const p = await this.em.findOne(TissueProfile, { id, show: showId });
    if (!p) throw profileNotFound(id);
    const job = await this.em.findOne(LearnJob, { profile: p });
    return profileView(p, job ? learnJobView(job) : null);
  }

  /** A download link for a character's file. */
  async characterFile(showId: string, id: string): Promise<FileLink> {
    return this.link((await this.findCharacter(showId, id)).asset);
  }

  /** A download link for a clip's file. */
  async clipFile(showId: string, id: string): Promise<FileLink> {
    return this.link((await this.findClip(showId, id)).asset);
  }

  /** A presigned GET for a ready asset's file. */
  async link(asset: Asset): Promise<FileLink> {
    if (asset.state !== AssetState.Ready) {
      throw new DomainError(
        'conflict',
        'ASSET_NOT_READY',
        `The file has not passed its check (${asset.state}).`,
        { assetId: asset.id, state: asset.state },
      );
    }
    return {
      url: await this.storage.presignDownload(asset.s3Key, asset.originalName),
      expiresAt: this.storage.urlExpiry().toISOString(),
      fileName: asset.originalName,
      size: asset.size,
      sha256: asset.sha256,
    };
  }

  private async findCharacter(showId: string, id: string): Promise<Character> {
    const c = await this.em.findOne(Character, { id, show: showId }, { populate: ['asset'] });
    if (!c) throw characterNotFound(id);
    return c;
  }

  private async findClip(showId: string, id: string): Promise<Clip> {
    const c = await this.em.findOne(Clip, { id, show: showId }, { populate: ['asset'] });
    if (!c) throw clipNotFound(id);
    return c;
  }
}
