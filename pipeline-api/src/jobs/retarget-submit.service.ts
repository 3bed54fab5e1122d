import { Injectable, Logger } from '@nestjs/common';
import { InjectQueue } from '@nestjs/bullmq';
import { EntityManager } from '@mikro-orm/mariadb';
import { isSolverInputError, resolveControls, type Controls } from '@overshoot/solver';
import { DomainError } from '../common/errors/domain-error';
import { Env } from '../config/env.validation';
import type { Principal } from '../auth/principal';
import { JobEventsPublisher } from '../events/job-events-publisher';
import { QUEUES } from '../queues/queue-names';
import { AssetState } from '../assets/entities/asset.entity';
import { Shot } from '../shots/entities/shot.entity';
import { shotNotFound } from '../shots/shots.service';
import { Take } from '../takes/entities/take.entity';
import { takeNotFound } from '../takes/takes.service';
import { Character } from '../library/entities/character.entity';
import { ProfileState, TissueProfile } from '../library/entities/tissue-profile.entity';
import { characterNotReady, clipNotReady, profileNotFound } from '../library/library-errors';
import { profileNotReady } from '../library/profiles.service';
import { RetargetJob } from './entities/retarget-job.entity';
import { retargetJobView, type JobView } from './job-view';
import { jobsUnavailable } from './job-errors';
import { badJointMapEntries, mapProfileDrivers, type DriverMapView } from './driver-map';
import { solveJobOptions, type RetargetQueue } from './solve-queue';
import type { SubmitRetargetDto } from './dto/submit-retarget.dto';

/** A field problem, as VALIDATION_FAILED lists them. */
type FieldProblem = { field: string; problems: string[] };

const invalid = (rows: FieldProblem[]) =>
  new DomainError(
    'invalid',
    'VALIDATION_FAILED',
    'Some fields of the request are not valid.',
    rows,
  );

/**
 * Retarget submission: every check that needs no solve happens here, so a job that is queued has
 * what it needs (shot character and clip ready, profile ready, controls valid, the pre-roll fits
 * the shot, essential drivers mapped); then the row is recorded and queued.
 */
@Injectable()
export class RetargetSubmitService {
  private readonly logger = new Logger('RetargetSubmit');

  constructor(
    private readonly em: EntityManager,
    private readonly events: JobEventsPublisher,
    private readonly env: Env,
    @InjectQueue(QUEUES.retarget) private readonly queue: RetargetQueue,
  ) {}

  /** The automatic map of the profile's driver joints onto the shot character's joints. */
  async jointMap(showId: string, shotId: string, profileId: string): Promise<DriverMapView> {
    const shot = await this.findShot(showId, shotId);
    const character = readyCharacter(shot);
    const profile = await this.readyProfile(showId, profileId);
    const { mapped, unmapped, essentialUnmapped } = mapProfileDrivers(
      profile,
      character.joints ?? [],
    );
    return { mapped, unmapped, essentialUnmapped };
  }

  /** Checks, records and queues a retarget job of the shot. */
  async submit(
    principal: Principal,
    showId: string,
    shotId: string,
    body: SubmitRetargetDto,
  ): Promise<JobView> {
    const shot = await this.findShot(showId, shotId);
    const character = readyCharacter(shot);
    if (!shot.clip) throw shotNotReady(shot);
    if (shot.clip.asset.state !== AssetState.Ready) throw clipNotReady(shot.clip);
    const profile = await this.readyProfile(showId, body.profileId);
    const baseTake = body.baseTakeId
      ? await this.em.findOne(Take, { id: body.baseTakeId, show: showId, shot })
      : null;
    if (body.baseTakeId && !baseTake) throw takeNotFound(body.baseTakeId);
    const controls = checkControls(body.controls ?? {}, profile, character);
    const seconds = (shot.frameEnd - shot.frameStart) / shot.fps;
    if (seconds < controls.prerollSeconds) {
      throw new DomainError(
        'invalid',
        'CLIP_TOO_SHORT',
        `The shot lasts ${seconds.toFixed(3)} s, less than the ${controls.prerollSeconds} s pre-roll: lengthen the frame range or lower controls.prerollSeconds.`,
        { shotSeconds: seconds, prerollSeconds: controls.prerollSeconds },
      );
    }
    const jointMap = body.jointMap ?? null;
    const targets = character.joints ?? [];
    const bad = jointMap ? badJointMapEntries(jointMap, profile.sourceJoints ?? [], targets) : [];
    if (bad.length > 0) throw invalid(bad);
    const { essential } = mapProfileDrivers(profile, targets, jointMap);
    if (essential.length > 0) {
      const names = essential.map((d) => `"${d.joint}" (${Math.round(100 * d.energyShare)} %)`);
      throw new DomainError(
        'invalid',
        'UNMAPPED_DRIVERS',
        `No joint of character ${character.name} matches driver ${names.join(', ')} of the profile: map them in jointMap.`,
        { drivers: essential, characterJoints: targets },
      );
    }
    const previous = shot.solveState;
    const submittedBy = principal.kind === 'user' ? principal.user : null;
    const job = new RetargetJob(shot, profile, { ...controls }, submittedBy);
    job.jointMap = jointMap;
    job.baseTake = baseTake;
    this.em.persist(job);
    await this.em.flush();
    try {
      await this.queue.add(
        'retarget',
        { jobId: job.id, showId },
        solveJobOptions(this.env, job.id),
      );
    } catch (e) {
      this.logger.error(`could not queue retarget job ${job.id}: ${(e as Error).message}`);
      this.em.remove(job);
      shot.solveState = previous;
      await this.em.flush();
      throw jobsUnavailable(e);
    }
    await this.events.state(showId, {
      jobId: job.id,
      kind: 'retarget',
      shotId: shot.id,
      profileId: profile.id,
      state: job.state,
      errorCode: null,
      errorMessage: null,
    });
    return retargetJobView(job, null);
  }

  private async findShot(showId: string, id: string): Promise<Shot> {
    const shot = await this.em.findOne(
      Shot,
      { id, show: showId },
      { populate: ['character.asset', 'clip.asset'] },
    );
    if (!shot) throw shotNotFound(id);
    return shot;
  }

  private async readyProfile(showId: string, id: string): Promise<TissueProfile> {
    const profile = await this.em.findOne(TissueProfile, { id, show: showId });
    if (!profile) throw profileNotFound(id);
    if (profile.state !== ProfileState.Ready) throw profileNotReady(profile);
    return profile;
  }
}

const shotNotReady = (shot: Shot) =>
  new DomainError(
    'conflict',
    'SHOT_NOT_READY',
    `Shot ${shot.code} needs a target character and a clip before it can be solved.`,
    { shotId: shot.id, characterId: shot.character?.id ?? null, clipId: shot.clip?.id ?? null },
  );

/** The shot's character, which must be set and ready. */
function readyCharacter(shot: Shot): Character {
  const c = shot.character;
  if (!c) throw shotNotReady(shot);
  if (c.asset.state !== AssetState.Ready) throw characterNotReady(c);
  return c;
}

/** Controls with the solver's defaults filled in, checked the way the solve checks them. */
function checkControls(
  given: Partial<Controls>,
  profile: TissueProfile,
  character: Character,
): Controls {
  const regions = character.regions ?? [];
  const unknown = Object.keys(given.regionGains ?? {}).filter((r) => !regions.includes(r));
  if (unknown.length > 0) {
    throw invalid([
      {
        field: 'controls.regionGains',
        problems: [
          `character ${character.name} has no region ${unknown.map((r) => `"${r}"`).join(', ')} (it has ${regions.join(', ')})`,
        ],
      },
    ]);
  }
  try {
    return resolveControls(given, profile.modes?.length ?? 0);
  } catch (e) {
    if (!isSolverInputError(e)) throw e;
    throw invalid([{ field: `controls.${e.where.item ?? ''}`, problems: [e.message] }]);
  }
}
