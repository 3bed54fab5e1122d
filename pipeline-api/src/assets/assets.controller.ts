import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { uuidParam } from '../common/uuid-param';
import { CAPTURE_ROLES } from '../library/capture-roles';
import { AssetsService } from './assets.service';
import type { AssetView } from './asset-view';
import { ListAssetsQuery } from './dto/list-assets.query';

/**
 * Uploads with their check state and validation report. Captures are among them (their original
 * file names may name a person), so only the roles that may see captures read this list.
 */
@ApiTags('library')
@Allow(...CAPTURE_ROLES)
@Controller('shows/:showId/assets')
export class AssetsController {
  constructor(private readonly assets: AssetsService) {}

  /** The show's uploads, newest first. */
  @Get()
  @ApiOperation({ summary: 'List uploads with their state and validation report' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  list(@Param('showId') showId: string, @Query() query: ListAssetsQuery): Promise<AssetView[]> {
    return this.assets.list(showId, query);
  }

  /** One upload: state, progress and validation report. */
  @Get(':assetId')
  @ApiOperation({ summary: 'Get an upload with its validation report' })
  @ApiErrors('SHOW_NOT_FOUND', 'ASSET_NOT_FOUND')
  get(
    @Param('showId') showId: string,
    @Param('assetId', uuidParam('ASSET_NOT_FOUND')) assetId: string,
  ): Promise<AssetView> {
    return this.assets.get(showId, assetId);
  }
}
