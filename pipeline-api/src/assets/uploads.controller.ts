import { Body, Controller, Delete, HttpCode, Param, Post } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import type { UserPrincipal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { UploadsService, type PartUrl, type UploadView } from './uploads.service';
import type { AssetView } from './asset-view';
import { CreateUploadDto } from './dto/create-upload.dto';
import { CompleteUploadDto, PartUrlsDto } from './dto/upload-parts.dto';
import { uuidParam } from '../common/uuid-param';

/** Presigned multipart uploads of characters, captures and clips (technical artists). */
@ApiTags('library')
@Allow(Role.TechnicalArtist)
@Controller('shows/:showId/uploads')
export class UploadsController {
  constructor(private readonly uploads: UploadsService) {}

  /** Records the asset and returns presigned URLs for its parts. */
  @Post()
  @ApiOperation({
    summary: 'Start an upload (captures need the consent record)',
    description:
      'Body captures are personal data: follow local data-protection law, the performer’s ' +
      'agreement and the studio’s counsel. PUT each part to its URL, then complete.',
  })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'UPLOAD_FILE_TYPE',
    'UPLOAD_TOO_LARGE',
    'CONSENT_REQUIRED',
    'CONSENT_EXPIRED',
    'CHARACTER_NOT_FOUND',
    'CHARACTER_NOT_READY',
    'STORAGE_UNAVAILABLE',
  )
  create(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Body() body: CreateUploadDto,
  ): Promise<UploadView> {
    return this.uploads.create(actor, showId, body);
  }

  /** Fresh part URLs, e.g. to resume an interrupted upload. */
  @Post(':assetId/parts')
  @HttpCode(200)
  @ApiOperation({ summary: 'Presign some parts again (resume)' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'ASSET_NOT_FOUND',
    'UPLOAD_NOT_OPEN',
    'UPLOAD_PARTS_INVALID',
  )
  parts(
    @Param('showId') showId: string,
    @Param('assetId', uuidParam('ASSET_NOT_FOUND')) assetId: string,
    @Body() body: PartUrlsDto,
  ): Promise<{ parts: PartUrl[]; expiresAt: string }> {
    return this.uploads.partUrls(showId, assetId, body.partNumbers);
  }

  /** Joins the parts and queues the file's check. */
  @Post(':assetId/complete')
  @HttpCode(200)
  @ApiOperation({ summary: 'Complete an upload; the file is then checked in the background' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'ASSET_NOT_FOUND',
    'UPLOAD_NOT_OPEN',
    'UPLOAD_PARTS_INVALID',
    'UPLOAD_SIZE_MISMATCH',
    'STORAGE_UNAVAILABLE',
    'INGEST_UNAVAILABLE',
  )
  complete(
    @CurrentUser() actor: UserPrincipal,
    @Param('showId') showId: string,
    @Param('assetId', uuidParam('ASSET_NOT_FOUND')) assetId: string,
    @Body() body: CompleteUploadDto,
  ): Promise<AssetView> {
    return this.uploads.complete(actor, showId, assetId, body.parts);
  }

  /** Drops an upload that has not completed, with its parts and rows. */
  @Delete(':assetId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Abort an upload' })
  @ApiErrors('SHOW_NOT_FOUND', 'ASSET_NOT_FOUND', 'UPLOAD_NOT_OPEN', 'STORAGE_UNAVAILABLE')
  async abort(
    @Param('showId') showId: string,
    @Param('assetId', uuidParam('ASSET_NOT_FOUND')) assetId: string,
  ): Promise<void> {
    await this.uploads.abort(showId, assetId);
  }
}
