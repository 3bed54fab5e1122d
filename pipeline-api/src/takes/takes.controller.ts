import { Controller, Get, Param, StreamableFile } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { uuidParam } from '../common/uuid-param';
import { TokenScope } from '../tokens/token-scope';
import { TakesService } from './takes.service';
import type { TakeView } from './take-view';

/** Takes: every member reads them, and pipeline tokens with `takes:read`. */
@ApiTags('takes')
@Allow(...ANY_ROLE)
@AllowToken(TokenScope.TakesRead)
@Controller('shows/:showId')
export class TakesController {
  constructor(private readonly takes: TakesService) {}

  /** The takes of a shot, newest first. */
  @Get('shots/:shotId/takes')
  @ApiOperation({ summary: "List a shot's takes" })
  @ApiErrors('SHOW_NOT_FOUND', 'SHOT_NOT_FOUND')
  list(
    @Param('showId') showId: string,
    @Param('shotId', uuidParam('SHOT_NOT_FOUND')) shotId: string,
  ): Promise<TakeView[]> {
    return this.takes.list(showId, shotId);
  }

  /** One take: controls, metrics, files, review state. */
  @Get('takes/:takeId')
  @ApiOperation({ summary: 'Get a take' })
  @ApiErrors('SHOW_NOT_FOUND', 'TAKE_NOT_FOUND')
  get(
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) id: string,
  ): Promise<TakeView> {
    return this.takes.get(showId, id);
  }

  /** The take as a standard glTF binary file, for the player, lighting and rendering. */
  @Get('takes/:takeId/file')
  @ApiOperation({ summary: "Download a take's .glb file" })
  @ApiOkResponse({
    description: 'The take (glTF binary).',
    content: { 'model/gltf-binary': { schema: { type: 'string', format: 'binary' } } },
  })
  @ApiErrors('SHOW_NOT_FOUND', 'TAKE_NOT_FOUND', 'STORAGE_UNAVAILABLE')
  async file(
    @Param('showId') showId: string,
    @Param('takeId', uuidParam('TAKE_NOT_FOUND')) id: string,
  ): Promise<StreamableFile> {
    const { stream, fileName } = await this.takes.file(showId, id);
    return new StreamableFile(stream, {
      type: 'model/gltf-binary',
      disposition: `attachment; filename="${fileName}"`,
    });
  }
}
