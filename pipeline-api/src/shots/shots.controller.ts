import { Body, Controller, Get, Param, Patch, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal, CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/uuid-param';
import type { Principal, UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { TokenScope } from '../tokens/token-scope';
import { ShotsService, type ShotPage } from './shots.service';
import { TrackingService, type ShotSummary, type WeekThroughput } from './tracking.service';
import type { ShotView } from './shot-view';
import { CreateShotDto, RenderStateDto, UpdateShotDto } from './dto/shot-fields.dto';
import { ListShotsQuery, ShotFilterQuery, ThroughputQuery } from './dto/list-shots.query';

/** Shots of a show, and the tracking views over them. */
@ApiTags('shots')
@Controller('shows/:showId/shots')
export class ShotsController {
  constructor(
    private readonly shots: ShotsService,
    private readonly tracking: TrackingService,
  ) {}

  /** Filtered, sorted, paged shot list. */
  @Get()
  @Allow(...ANY_ROLE)
  @AllowToken()
  @ApiOperation({ summary: 'List shots (filter, search, sort, paging)' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  list(@Param('showId') showId: string, @Query() q: ListShotsQuery): Promise<ShotPage> {
    return this.shots.list(showId, q);
  }

  /** The same rows as the list with the same filters and sort, all pages, as CSV. */
  @Get('export')
  @Allow(...ANY_ROLE)
  // Only the file itself is CSV; refusals are JSON like everywhere else.
  @ApiOkResponse({
    description: 'The shot table as CSV.',
    content: { 'text/csv': { schema: { type: 'string' } } },
  })
  @ApiOperation({ summary: 'Export the shot table as CSV (streamed)' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  async export(
    @Param('showId') showId: string,
    @Query() q: ShotFilterQuery,
    @Res() res: Response,
  ): Promise<void> {
    res.status(200);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', 'attachment; filename="shots.csv"');
    try {
      await this.tracking.exportCsv(showId, q, res);
      res.end();
    } catch (e) {
      // Headers are gone already: cut the download short so the file is visibly incomplete.
      res.destroy(e as Error);
    }
  }

  /** Counts by state and the late shots. */
  @Get('summary')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: 'Shot counts by state, and late shots' })
  @ApiErrors('SHOW_NOT_FOUND')
  summary(@Param('showId') showId: string): Promise<ShotSummary> {
    return this.tracking.summary(showId);
  }

  /** Takes approved per ISO week. */
  @Get('throughput')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: 'Takes approved per ISO week' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  throughput(
    @Param('showId') showId: string,
    @Query() q: ThroughputQuery,
  ): Promise<WeekThroughput[]> {
    return this.tracking.throughput(showId, q.weeks ?? 12);
  }

  /** Creates a shot. */
  @Post()
  @Allow(Role.TechnicalArtist)
  @ApiOperation({ summary: 'Create a shot' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'SHOT_CODE_TAKEN',
    'SHOT_FRAME_RANGE_INVALID',
    'SHOT_ASSIGNEE_INVALID',
    'CHARACTER_NOT_FOUND',
    'CHARACTER_NOT_READY',
    'CLIP_NOT_FOUND',
    'CLIP_NOT_READY',
  )
  create(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Body() body: CreateShotDto,
  ): Promise<ShotView> {
    return this.shots.create(actor, showId, body);
  }

  /** One shot. */
  @Get(':shotId')
  @Allow(...ANY_ROLE)
  @AllowToken()
  @ApiOperation({ summary: 'Get a shot' })
  @ApiErrors('SHOW_NOT_FOUND', 'SHOT_NOT_FOUND')
  get(
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) id: string,
  ): Promise<ShotView> {
    return this.shots.get(showId, id);
  }

  /** Edits a shot (producers: due date and assignees only). */
  @Patch(':shotId')
  @Allow(Role.TechnicalArtist, Role.Producer)
  @ApiOperation({ summary: 'Edit a shot' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'SHOT_NOT_FOUND',
    'SHOT_FIELDS_NOT_ALLOWED',
    'SHOT_CODE_TAKEN',
    'SHOT_FRAME_RANGE_INVALID',
    'SHOT_ASSIGNEE_INVALID',
    'CHARACTER_NOT_FOUND',
    'CHARACTER_NOT_READY',
    'CLIP_NOT_FOUND',
    'CLIP_NOT_READY',
  )
  update(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) id: string,
    @Body() body: UpdateShotDto,
  ): Promise<ShotView> {
    return this.shots.update(actor, showId, id, body);
  }

  /** Render state, reported by the render farm (token) or set by hand (producer). */
  @Put(':shotId/render-state')
  @Allow(Role.Producer)
  @AllowToken(TokenScope.RenderWrite)
  @ApiOperation({ summary: 'Set the render state' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'SHOT_NOT_FOUND',
    'RENDER_STATE_INVALID_TRANSITION',
  )
  renderState(
    @CurrentPrincipal() actor: Principal,
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) id: string,
    @Body() body: RenderStateDto,
  ): Promise<ShotView> {
    return this.shots.setRenderState(actor, showId, id, body.state);
  }
}
