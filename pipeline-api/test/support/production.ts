// Library items, profiles, jobs and takes for shot and review tests. Library rows are made
// ready straight in the database (uploads have their own tests); takes go through
// TakesService.createFromJob, the method the retarget job uses.
import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/core';
import type { World } from './world';
import { Asset, AssetKind, AssetState } from '../../src/assets/entities/asset.entity';
import { Character } from '../../src/library/entities/character.entity';
import { Clip, ClipFormat } from '../../src/library/entities/clip.entity';
import { Capture } from '../../src/library/entities/capture.entity';
import { TissueProfile } from '../../src/library/entities/tissue-profile.entity';
import { Show } from '../../src/shows/entities/show.entity';
import { User } from '../../src/users/entities/user.entity';
import { Shot } from '../../src/shots/entities/shot.entity';
import { RetargetJob } from '../../src/jobs/entities/retarget-job.entity';
import { JobState } from '../../src/jobs/job-state';
import { TakesService } from '../../src/takes/takes.service';
import type { Take } from '../../src/takes/entities/take.entity';

function readyAsset(em: EntityManager, show: Show, kind: AssetKind, user: User): Asset {
  const asset = new Asset(
    show,
    kind,
    {
      size: 1,
      sha256: '0'.repeat(64),
      contentType: 'model/gltf-binary',
      originalName: `${kind}.glb`,
    },
    user,
  );
  asset.state = AssetState.Ready;
  em.persist(asset);
  return asset;
}

/** A ready character and a ready clip (`frames` at `fps`) in the show. */
export async function library(
  world: World,
  showId: string,
  user: User,
  clip = { frames: 240, fps: 24 },
) {
  const em = world.em();
  const show = await em.findOneOrFail(Show, showId);
  const owner = em.getReference(User, user.id);
  const character = new Character(
    readyAsset(em, show, AssetKind.Character, owner),
    `body_${randomUUID().slice(0, 4)}`,
  );
  character.version = 1;
  const c = new Clip(readyAsset(em, show, AssetKind.Clip, owner), 'walk', ClipFormat.Bvh);
  Object.assign(c, { frameCount: clip.frames, fps: clip.fps, joints: ['root'] });
  const capture = new Capture(
    readyAsset(em, show, AssetKind.Capture, owner),
    character,
    { performerCode: 'PRF-1', scope: 'tests', expiresOn: '2099-12-31' },
    owner,
  );
  const profile = new TissueProfile(capture, character, 'test profile');
  em.persist([character, c, capture, profile]);
  await em.flush();
  return { characterId: character.id, clipId: c.id, profileId: profile.id };
}

/**
 * A take of the shot from a job submitted by `by`, through TakesService.createFromJob. With
 * `solved: false` the job fails after its take was written (a take whose job did not solve).
 */
export async function takeFor(
  world: World,
  shotId: string,
  profileId: string,
  by: User,
  opts: { solved?: boolean } = {},
): Promise<Take> {
  const em = world.em();
  const shot = await em.findOneOrFail(Shot, shotId);
  const job = new RetargetJob(
    shot,
    em.getReference(TissueProfile, profileId),
    { gain: 1 },
    em.getReference(User, by.id),
  );
  em.persist(job);
  job.moveTo(JobState.Solving, { worker: 'test' });
  await em.flush();
  const take = await world.app.get(TakesService).createFromJob(em, job, {
    controls: { gain: 1 },
    metrics: { rms: 0.01 },
    files: [`takes/${job.id}.glb`],
  });
  job.moveTo(opts.solved === false ? JobState.Failed : JobState.Solved, {
    errorCode: 'TEST_FAILURE',
  });
  await em.flush();
  return take;
}
