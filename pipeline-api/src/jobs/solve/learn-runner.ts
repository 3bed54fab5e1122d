import { Injectable, Logger } from '@nestjs/common';
import { MikroORM } from '@mikro-orm/core';
import type { Job } from 'bullmq';
import { StorageService } from '../../storage/storage.service';
import { JobEventsPublisher } from '../../events/job-events-publisher';
import { AssetState } from '../../assets/entities/asset.entity';
import { CapturesService } from '../../library/captures.service';
import { characterNotReady } from '../../library/library-errors';
import { LearnJob } from '../entities/learn-job.entity';
import { LEARN_JOBS } from '../job-kinds';
import type { SolveJobData, SolveOutcome } from '../solve-queue';
import type { JobAttempt } from './job-attempt';
import { runJobAttempt } from './run-attempt';
import { runInThread } from './run-in-thread';
import { recordLearned } from './solve-messages';
import { readObject, writeObject } from './object-store';

/**
 * Learns a tissue profile in the worker: checks the capture may still be learned from (consent,
 * deletion), downloads character and capture, learns in a solver thread, stores the profile file
 * under the job's key, then fills the profile row and marks the job solved in one transaction.
 */
@Injectable()
export class LearnRunner {
  private readonly logger = new Logger('Learn');

  constructor(
    private readonly orm: MikroORM,
    private readonly storage: StorageService,
    private readonly events: JobEventsPublisher,
    private readonly captures: CapturesService,
  ) {}

  /** Runs one attempt of a learn job. */
  run(
    job: Job<SolveJobData, SolveOutcome>,
    token: string | undefined,
    released: AbortSignal,
  ): Promise<SolveOutcome> {
    const { orm, storage, events, logger } = this;
    return runJobAttempt(
      { orm, storage, events, logger },
      LEARN_JOBS,
      'profile.ovsp',
      { job, token, released },
      (attempt, key) => this.learn(attempt, key),
    );
  }

  private async learn(attempt: JobAttempt<LearnJob>, key: string): Promise<void> {
    const em = this.orm.em.fork();
    const row = await em.findOneOrFail(LearnJob, attempt.jobId, {
      populate: ['profile.character.asset'],
    });
    const { profile } = row;
    const capture = await this.captures.assertUsableForLearning(
      em,
      attempt.showId,
      profile.capture.id,
    );
    const character = profile.character;
    if (character.asset.state !== AssetState.Ready) throw characterNotReady(character);
    await attempt.progress('download', 1);
    const [characterBytes, captureBytes] = await Promise.all([
      readObject(this.storage, character.asset.s3Key),
      readObject(this.storage, capture.asset.s3Key),
    ]);
    await attempt.progress('download', 5);
    const reply = await runInThread(
      {
        kind: 'learn',
        name: profile.name,
        character: characterBytes,
        capture: captureBytes,
        settings: row.settings,
      },
      (stage, fraction) => attempt.progress(stage, 5 + 85 * fraction),
      attempt.released,
    );
    await attempt.progress('upload', 92);
    await writeObject(this.storage, key, reply.profile, 'application/octet-stream');
    await attempt.finish(async (_tx, job) => recordLearned(job.profile, reply, key));
  }
}
