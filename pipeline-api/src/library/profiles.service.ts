import type { Readable } from 'node:stream';
import { Injectable, Logger } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import { EntityManager } from '@mikro-orm/mariadb';
import { DomainError } from '../common/errors/domain-error';
import { Env } from '../config/env.validation';
import type { Principal } from '../auth/principal';
import { StorageService } from '../storage/storage.service';
import { storageUnavailable } from '../assets/asset-errors';
import { AssetState } from '../assets/entities/asset.entity';
import { JobEventsPublisher } from '../events/job-events-publisher';
import { QUEUES } from '../queues/queue-names';
import { LearnJob } from '../jobs/entities/learn-job.entity';
import { learnJobView } from '../jobs/job-view';
import { jobsUnavailable } from '../jobs/job-errors';
import { solveJobOptions, type LearnQueue } from '../jobs/solve-queue';
import { Character } from './entities/character.entity';
import { ProfileState, TissueProfile } from './entities/tissue-profile.entity';
import { CapturesService } from './captures.service';
import { characterNotFound, characterNotReady, profileNotFound } from './library-errors';
import { profileView, type ProfileView } from './library-views';
import type { CreateProfileDto } from './dto/create-profile.dto';

/** A profile's file, ready to stream. */
export interface ProfileFile {
  stream: Readable;
  fileName: string;
}

/** No such profile, or not learned yet. */
export const profileNotReady = (p: TissueProfile) =>
  new DomainError(
    'conflict',
    'PROFILE_NOT_READY',
    `Profile "${p.name}" is ${p.state}; only a ready profile can be used.`,
    { profileId: p.id, state: p.state },
  );

/** Learning tissue profiles: the request (a profile row and its learn job) and the profile file. */
@Injectable()
export class ProfilesService {
  private readonly logger = new Logger('Profiles');

  constructor(
    private readonly em: EntityManager,
    private readonly captures: CapturesService,
    private readonly storage: StorageService,
    private readonly events: JobEventsPublisher,
    private readonly env: Env,
    @InjectQueue(QUEUES.learn) private readonly queue: LearnQueue,
  ) {}

  /**
   * Records a profile (queued) and its learn job, then queues the job. The capture must be
   * usable for learning (ready, not deleted, consent not expired) on the character it is
   * registered to. When the queue cannot be reached, both rows are removed again.
   */
  async create(principal: Principal, showId: string, body: CreateProfileDto): Promise<ProfileView> {
    const character = await this.em.findOne(
      Character,
      { id: body.characterId, show: showId },
      { populate: ['asset'] },
    );
    if (!character) throw characterNotFound(body.characterId);
    const capture = await this.captures.assertUsableForLearning(this.em, showId, body.captureId);
    if (capture.character.id !== character.id) {
      throw new DomainError(
        'invalid',
        'VALIDATION_FAILED',
        'Some fields of the request are not valid.',
        [
          {
            field: 'characterId',
            problems: [
              `the capture is registered to character ${capture.character.id}; learn it on that character`,
            ],
          },
        ],
      );
    }
    if (character.asset.state !== AssetState.Ready) throw characterNotReady(character);
    const profile = new TissueProfile(capture, character, body.name);
    const submittedBy = principal.kind === 'user' ? principal.user : null;
    const job = new LearnJob(profile, { ...(body.options ?? {}) }, submittedBy);
    this.em.persist([profile, job]);
    await this.em.flush();
    try {
      await this.queue.add('learn', { jobId: job.id, showId }, solveJobOptions(this.env, job.id));
    } catch (e) {
      this.logger.error(`could not queue learn job ${job.id}: ${(e as Error).message}`);
      this.em.remove([job, profile]);
      await this.em.flush();
      throw jobsUnavailable(e);
    }
    const view = learnJobView(job);
    await this.events.state(showId, {
      jobId: job.id,
      kind: 'learn',
      shotId: null,
      profileId: profile.id,
      state: job.state,
      errorCode: null,
      errorMessage: null,
    });
    return profileView(profile, view);
  }

  /** The learned profile file (the solver's profile format). */
  async file(showId: string, id: string): Promise<ProfileFile> {
    const profile = await this.em.findOne(TissueProfile, { id, show: showId });
    if (!profile) throw profileNotFound(id);
    const key = profile.files?.[0];
    if (profile.state !== ProfileState.Ready || !key) throw profileNotReady(profile);
    try {
      const stream = await this.storage.stream(key);
      return { stream, fileName: `${fileStem(profile.name)}.ovsp` };
    } catch (e) {
      if ((e as { name?: string }).name !== 'NoSuchKey') throw storageUnavailable(e);
      throw new DomainError(
        'not_found',
        'PROFILE_NOT_FOUND',
        `Profile ${id} has no file in the S3 store.`,
        {
          profileId: id,
        },
      );
    }
  }
}

/** A name safe in a Content-Disposition header and on any file system. */
export const fileStem = (name: string): string =>
  name.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'file';
