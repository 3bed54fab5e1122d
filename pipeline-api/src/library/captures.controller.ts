import { Body, Controller, Delete, Get, Param, Query } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/uuid-param';
import type { UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { CapturesService } from './captures.service';
import type { FileLink } from './library.service';
import type { CaptureView } from './library-views';
import { CAPTURE_ROLES } from './capture-roles';
import { CaptureListQuery, DeleteCaptureDto } from './dto/library.dto';

/** Captures and their consent records: biometric data, for the roles in CAPTURE_ROLES only. */
@ApiTags('library')
@Controller('shows/:showId/captures')
export class CapturesController {
  constructor(private readonly captures: CapturesService) {}

  /** The show's captures with consent records. */
  @Get()
  @Allow(...CAPTURE_ROLES)
  @ApiOperation({ summary: 'List captures with their consent records' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  list(@Param('showId') showId: string, @Query() q: CaptureListQuery): Promise<CaptureView[]> {
    return this.captures.list(showId, q.includeDeleted);
  }

  /** One capture with its consent record (and its deletion record, once deleted). */
  @Get(':captureId')
  @Allow(...CAPTURE_ROLES)
  @ApiOperation({ summary: 'Get a capture' })
  @ApiErrors('SHOW_NOT_FOUND', 'CAPTURE_NOT_FOUND')
  get(
    @Param('showId') showId: string,
    @Param('captureId', uuidParam('CAPTURE_NOT_FOUND')) id: string,
  ): Promise<CaptureView> {
    return this.captures.get(showId, id);
  }

  /** A presigned download URL for the capture's file. */
  @Get(':captureId/file')
  @Allow(...CAPTURE_ROLES)
  @ApiOperation({ summary: "Download link for a capture's file" })
  @ApiErrors('SHOW_NOT_FOUND', 'CAPTURE_NOT_FOUND', 'CAPTURE_DELETED', 'ASSET_NOT_READY')
  file(
    @Param('showId') showId: string,
    @Param('captureId', uuidParam('CAPTURE_NOT_FOUND')) id: string,
  ): Promise<FileLink> {
    return this.captures.file(showId, id);
  }

  /** Deletes the capture's files, keeps the record with the reason, marks its profiles. */
  @Delete(':captureId')
  @Allow(Role.TechnicalArtist)
  @ApiOperation({ summary: 'Delete a capture (removes its files; audited)' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'CAPTURE_NOT_FOUND',
    'CAPTURE_DELETED',
    'STORAGE_UNAVAILABLE',
  )
  remove(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('captureId', uuidParam('CAPTURE_NOT_FOUND')) id: string,
    @Body() body: DeleteCaptureDto,
  ): Promise<CaptureView> {
    return this.captures.delete(actor, showId, id, body.reason);
  }
}
