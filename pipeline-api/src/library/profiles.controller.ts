import { Body, Controller, Get, HttpCode, Param, Post, StreamableFile } from '@nestjs/common';
import { ApiAcceptedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, AllowToken, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { CurrentPrincipal } from '../common/decorators/current-user.decorator';
import { uuidParam } from '../common/uuid-param';
import type { Principal } from '../auth/principal';
import { Role } from '../users/entities/role';
import { TokenScope } from '../tokens/token-scope';
import { ProfilesService } from './profiles.service';
import type { ProfileView } from './library-views';
import { CreateProfileDto } from './dto/create-profile.dto';

/** Learning tissue profiles (technical artists, pipeline tokens with `jobs:submit`), and their files. */
@ApiTags('library')
@Controller('shows/:showId/profiles')
export class ProfilesController {
  constructor(private readonly profiles: ProfilesService) {}

  /** Starts learning a profile from a capture: the profile and its learn job, both queued. */
  @Post()
  @HttpCode(202)
  @Allow(Role.TechnicalArtist)
  @AllowToken(TokenScope.JobsSubmit)
  @ApiOperation({
    summary: 'Learn a tissue profile from a capture (queued; follow `job` or the event stream)',
  })
  @ApiAcceptedResponse({ description: 'The profile (state queued) with its learn job.' })
  @ApiErrors(
    'VALIDATION_FAILED',
    'SHOW_NOT_FOUND',
    'CHARACTER_NOT_FOUND',
    'CAPTURE_NOT_FOUND',
    'CONSENT_EXPIRED',
    'CAPTURE_DELETED',
    'ASSET_NOT_READY',
    'CHARACTER_NOT_READY',
    'JOBS_UNAVAILABLE',
  )
  create(
    @CurrentPrincipal() principal: Principal,
    @Param('showId') showId: string,
    @Body() body: CreateProfileDto,
  ): Promise<ProfileView> {
    return this.profiles.create(principal, showId, body);
  }

  /** The learned profile file, for pipeline scripts and the command-line solver. */
  @Get(':profileId/file')
  @Allow(...ANY_ROLE)
  @ApiOperation({ summary: "Download a ready profile's file (the solver's profile format)" })
  @ApiOkResponse({
    description: 'The profile file.',
    content: { 'application/octet-stream': { schema: { type: 'string', format: 'binary' } } },
  })
  @ApiErrors('SHOW_NOT_FOUND', 'PROFILE_NOT_FOUND', 'PROFILE_NOT_READY', 'STORAGE_UNAVAILABLE')
  async file(
    @Param('showId') showId: string,
    @Param('profileId', uuidParam('PROFILE_NOT_FOUND')) id: string,
  ): Promise<StreamableFile> {
    const { stream, fileName } = await this.profiles.file(showId, id);
    return new StreamableFile(stream, {
      type: 'application/octet-stream',
      disposition: `attachment; filename="${fileName}"`,
    });
  }
}
