import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/uuid-param';
import type { UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { NotesService } from './notes.service';
import { DecisionsService } from './decisions.service';
import type { DecisionView, NoteView } from './review-views';
import { CreateNoteDto, DecisionDto, UpdateNoteDto } from './dto/review.dto';

/** Review: notes pinned to frames, and supervisors' decisions. */
@ApiTags('review')
@Controller('shows/:showId')
export class ReviewsController {
  constructor(
    private readonly notes: NotesService,
    private readonly decisions: DecisionsService,
  ) {}

  /** The take's notes. */
  @Get('takes/:takeId/notes')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: "List a take's notes" })
  @ApiErrors('SHOW_NOT_FOUND', 'TAKE_NOT_FOUND')
  list(
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) takeId: string,
  ): Promise<NoteView[]> {
    return this.notes.list(showId, takeId);
  }

  /** Pins a note (text and optional drawn mark) to a frame. */
  @Post('takes/:takeId/notes')
  @Allow(Role.Animator, Role.Supervisor)
  @ApiOperation({ summary: 'Write a note on a frame' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'TAKE_NOT_FOUND',
    'NOTE_FRAME_OUT_OF_RANGE',
    'NOTE_MARK_INVALID',
  )
  create(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) takeId: string,
    @Body() body: CreateNoteDto,
  ): Promise<NoteView> {
    return this.notes.create(actor, showId, takeId, body);
  }

  /** Edits a note (its author only). */
  @Patch('notes/:noteId')
  @Allow(Role.Animator, Role.Supervisor)
  @ApiOperation({ summary: 'Edit a note (author only)' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'NOTE_NOT_FOUND',
    'NOTE_NOT_AUTHOR',
    'NOTE_FRAME_OUT_OF_RANGE',
    'NOTE_MARK_INVALID',
  )
  update(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('noteId', uuidParam('NOTE_NOT_FOUND')) noteId: string,
    @Body() body: UpdateNoteDto,
  ): Promise<NoteView> {
    return this.notes.update(actor, showId, noteId, body);
  }

  /** Marks a note resolved. */
  @Post('notes/:noteId/resolve')
  @HttpCode(200)
  @Allow(Role.Supervisor)
  @ApiOperation({ summary: 'Resolve a note' })
  @ApiErrors('SHOW_NOT_FOUND', 'NOTE_NOT_FOUND')
  resolve(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('noteId', uuidParam('NOTE_NOT_FOUND')) noteId: string,
  ): Promise<NoteView> {
    return this.notes.setResolved(actor, showId, noteId, true);
  }

  /** Opens a resolved note again. */
  @Post('notes/:noteId/reopen')
  @HttpCode(200)
  @Allow(Role.Supervisor)
  @ApiOperation({ summary: 'Reopen a note' })
  @ApiErrors('SHOW_NOT_FOUND', 'NOTE_NOT_FOUND')
  reopen(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('noteId', uuidParam('NOTE_NOT_FOUND')) noteId: string,
  ): Promise<NoteView> {
    return this.notes.setResolved(actor, showId, noteId, false);
  }

  /** The take's decisions. */
  @Get('takes/:takeId/decisions')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: "List a take's review decisions" })
  @ApiErrors('SHOW_NOT_FOUND', 'TAKE_NOT_FOUND')
  listDecisions(
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) takeId: string,
  ): Promise<DecisionView[]> {
    return this.decisions.list(showId, takeId);
  }

  /** Approves a take or requests changes; the people concerned are e-mailed. */
  @Post('takes/:takeId/decisions')
  @Allow(Role.Supervisor)
  @ApiOperation({ summary: 'Approve a take or request changes' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'TAKE_NOT_FOUND',
    'TAKE_NOT_SOLVED',
    'TAKE_ALREADY_DECIDED',
    'MAIL_UNAVAILABLE',
  )
  decide(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) takeId: string,
    @Body() body: DecisionDto,
  ): Promise<DecisionView> {
    return this.decisions.decide(actor, showId, takeId, body.decision, body.comment);
  }
}
