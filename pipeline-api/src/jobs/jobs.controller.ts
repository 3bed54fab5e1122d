import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiAcceptedResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/uuid-param';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { TokenScope } from '../tokens/token-scope';
import { JobsService } from './jobs.service';
import { RetargetSubmitService } from './retarget-submit.service';
import type { JobView } from './job-view';
import type { DriverMapView } from './driver-map';
import { ListJobsQuery } from './dto/list-jobs.query';
import { JointMapQuery, SubmitRetargetDto } from './dto/submit-retarget.dto';

/** Who submits retarget jobs (product.md: technical artists; animators submit re-solves). */
const SUBMITTERS = [Role.TechnicalArtist, Role.Animator];

/** Learn and retarget jobs: submit, follow, cancel. */
@ApiTags('jobs')
@Controller('shows/:showId')
export class JobsController {
  constructor(
    private readonly jobs: JobsService,
    private readonly submitter: RetargetSubmitService,
  ) {}

  /** The show's jobs, newest first (at most 100). */
  @Get('jobs')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: 'List learn and retarget jobs, newest first (at most 100)' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  async list(
    @Param('showId') showId: string,
    @Query() q: ListJobsQuery,
  ): Promise<{ items: JobView[] }> {
    return { items: await this.jobs.list(showId, q) };
  }

  /** One job: state, stage, percent, attempts, error. */
  @Get('jobs/:jobId')
  @Allow(...ANY_ROLE)
  @AllowToken()
  @ApiOperation({ summary: 'Get a learn or retarget job (poll it, or follow the event stream)' })
  @ApiErrors('SHOW_NOT_FOUND', 'JOB_NOT_FOUND')
  get(
    @Param('showId') showId: string,
    @Param('jobId', uuidParam('JOB_NOT_FOUND')) id: string,
  ): Promise<JobView> {
    return this.jobs.get(showId, id);
  }

  /** Cancels a queued or solving job. */
  @Post('jobs/:jobId/cancel')
  @HttpCode(200)
  @Allow(...ANY_ROLE)
  @ApiOperation({
    summary: 'Cancel a queued or solving job (admins, technical artists, or its submitter)',
  })
  @ApiErrors('SHOW_NOT_FOUND', 'JOB_NOT_FOUND', 'JOB_NOT_SUBMITTER', 'INVALID_STATE_CHANGE')
  cancel(
    @CurrentPrincipal() principal: Principal,
    @Param('showId') showId: string,
    @Param('jobId', uuidParam('JOB_NOT_FOUND')) id: string,
  ): Promise<JobView> {
    return this.jobs.cancel(principal, showId, id);
  }

  /** Solves the shot with a profile and controls: a retarget job, queued. */
  @Post('shots/:shotId/jobs')
  @HttpCode(202)
  @Allow(...SUBMITTERS)
  @AllowToken(TokenScope.JobsSubmit)
  @ApiOperation({ summary: 'Submit a retarget job for a shot (makes the next take)' })
  @ApiAcceptedResponse({ description: 'The job, queued.' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'SHOT_NOT_FOUND',
    'SHOT_NOT_READY',
    'CHARACTER_NOT_READY',
    'CLIP_NOT_READY',
    'PROFILE_NOT_FOUND',
    'PROFILE_NOT_READY',
    'TAKE_NOT_FOUND',
    'CLIP_TOO_SHORT',
    'UNMAPPED_DRIVERS',
    'JOBS_UNAVAILABLE',
  )
  submit(
    @CurrentPrincipal() principal: Principal,
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) shotId: string,
    @Body() body: SubmitRetargetDto,
  ): Promise<JobView> {
    return this.submitter.submit(principal, showId, shotId, body);
  }

  /** The automatic joint map of a profile's drivers onto the shot's character, for review. */
  @Get('shots/:shotId/joint-map')
  @Allow(...SUBMITTERS)
  @ApiOperation({
    summary: "Map a profile's driver joints onto the shot character's joints (before submitting)",
  })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'SHOT_NOT_FOUND',
    'SHOT_NOT_READY',
    'CHARACTER_NOT_READY',
    'PROFILE_NOT_FOUND',
    'PROFILE_NOT_READY',
  )
  jointMap(
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) shotId: string,
    @Query() q: JointMapQuery,
  ): Promise<DriverMapView> {
    return this.submitter.jointMap(showId, shotId, q.profileId);
  }
}
