import { Injectable, Logger } from '@nestjs/common';
import { MikroORM } from '@mikro-orm/core';
import type { Job } from 'bullmq';
import { DomainError } from '../../common/errors/domain-error';
import { StorageService } from '../../storage/storage.service';
import { JobEventsPublisher } from '../../events/job-events-publisher';
import { AssetState } from '../../assets/entities/asset.entity';
import { ClipFormat } from '../../library/entities/clip.entity';
import { ProfileState } from '../../library/entities/tissue-profile.entity';
import { TakesService } from '../../takes/takes.service';
import type { Take } from '../../takes/entities/take.entity';
import { shotClipFrames } from '../../shots/shot-frames';
import { RetargetJob } from '../entities/retarget-job.entity';
import { RETARGET_JOBS } from '../job-kinds';
import type { SolveJobData, SolveOutcome } from '../solve-queue';
import type { JobAttempt } from './job-attempt';
import { runJobAttempt } from './run-attempt';
import { runInThread } from './run-in-thread';
import { readObject, writeObject } from './object-store';

/**
 * Retargets a shot in the worker: downloads profile, character and clip, solves in a solver
 * thread, writes the take file under the job's key (every attempt writes the same key), then
 * records the take and marks the job solved in one transaction — the unique take-per-job
 * constraint makes that exactly one take however often the job runs. Then "take ready" goes out.
 */
@Injectable()
export class RetargetRunner {
  private readonly logger = new Logger('Retarget');

  constructor(
    private readonly orm: MikroORM,
    private readonly storage: StorageService,
    private readonly events: JobEventsPublisher,
    private readonly takes: TakesService,
  ) {}

  /** Runs one attempt of a retarget job. */
  run(
    job: Job<SolveJobData, SolveOutcome>,
    token: string | undefined,
    released: AbortSignal,
  ): Promise<SolveOutcome> {
    const { orm, storage, events, logger } = this;
    return runJobAttempt(
      { orm, storage, events, logger },
      RETARGET_JOBS,
      'take.glb',
      { job, token, released },
      (attempt, key) => this.retarget(attempt, key),
    );
  }

  private async retarget(attempt: JobAttempt<RetargetJob>, key: string): Promise<void> {
    const em = this.orm.em.fork();
    const row = await em.findOneOrFail(RetargetJob, attempt.jobId, {
      populate: ['shot.character.asset', 'shot.clip.asset', 'profile'],
    });
    const { shot, profile } = row;
    const character = shot.character;
    const clip = shot.clip;
    if (!character || !clip) {
      throw new DomainError(
        'conflict',
        'SHOT_NOT_READY',
        `Shot ${shot.code} has no character or no clip.`,
        {
          shotId: shot.id,
        },
      );
    }
    for (const asset of [character.asset, clip.asset]) {
      if (asset.state !== AssetState.Ready) {
        throw new DomainError(
          'conflict',
          'ASSET_NOT_READY',
          'A file of the shot has not passed its check.',
          {
            assetId: asset.id,
          },
        );
      }
    }
    const profileKey = profile.files?.[0];
    if (profile.state !== ProfileState.Ready || !profileKey) {
      throw new DomainError(
        'conflict',
        'PROFILE_NOT_READY',
        `Profile "${profile.name}" is ${profile.state}.`,
        {
          profileId: profile.id,
        },
      );
    }
    await attempt.progress('download', 1);
    const [profileBytes, characterBytes, clipBytes] = await Promise.all([
      readObject(this.storage, profileKey),
      readObject(this.storage, character.asset.s3Key),
      readObject(this.storage, clip.asset.s3Key),
    ]);
    await attempt.progress('download', 5);
    const reply = await runInThread(
      {
        kind: 'retarget',
        profile: profileBytes,
        character: characterBytes,
        clip: clipBytes,
        clipKind: clip.format === ClipFormat.Bvh ? 'bvh' : 'gltf',
        controls: row.controls,
        jointMap: row.jointMap ?? null,
        frames: shotClipFrames(shot),
        fps: shot.fps,
      },
      (stage, fraction) => attempt.progress(stage, 5 + 80 * fraction),
      attempt.released,
    );
    await attempt.progress('upload', 92);
    await writeObject(this.storage, key, reply.take, 'model/gltf-binary');
    const take: Take = await attempt.finish((tx, job) =>
      this.takes.createFromJob(tx, job, {
        controls: job.controls,
        metrics: reply.metrics,
        files: [key],
      }),
    );
    await this.events.takeReady(attempt.showId, {
      takeId: take.id,
      shotId: shot.id,
      jobId: attempt.jobId,
      version: take.version,
    });
    // The take is recorded: a mail that cannot be queued is logged, not a reason to re-solve.
    await this.takes
      .notifyTakeReady(take, this.orm.em.fork())
      .catch((e: Error) => this.logger.error(`take ${take.id} ready, not e-mailed: ${e.message}`));
  }
}
