import { Controller, Get, Param, Query } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Allow, ANY_ROLE } from '../common/decorators/access.decorators';
import { ApiErrors } from '../common/decorators/api-errors.decorator';
import { uuidParam } from '../common/uuid-param';
import { LibraryService, type FileLink } from './library.service';
import type { CharacterView, ClipView, ProfileView } from './library-views';
import { LibraryListQuery } from './dto/library.dto';

/** Characters, clips and profiles: every member of the show reads them. */
@ApiTags('library')
@Allow(...ANY_ROLE)
@Controller('shows/:showId')
export class LibraryController {
  constructor(private readonly library: LibraryService) {}

  /** The show's characters. */
  @Get('characters')
  @ApiOperation({ summary: 'List characters' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  characters(
    @Param('showId') showId: string,
    @Query() q: LibraryListQuery,
  ): Promise<CharacterView[]> {
    return this.library.characters(showId, q.includeRejected);
  }

  /** One character with its metadata. */
  @Get('characters/:characterId')
  @ApiOperation({ summary: 'Get a character' })
  @ApiErrors('SHOW_NOT_FOUND', 'CHARACTER_NOT_FOUND')
  character(
    @Param('showId') showId: string,
    @Param('characterId', uuidParam('CHARACTER_NOT_FOUND')) id: string,
  ): Promise<CharacterView> {
    return this.library.character(showId, id);
  }

  /** A presigned download URL for the character's file. */
  @Get('characters/:characterId/file')
  @ApiOperation({ summary: "Download link for a character's file" })
  @ApiErrors('SHOW_NOT_FOUND', 'CHARACTER_NOT_FOUND', 'ASSET_NOT_READY')
  characterFile(
    @Param('showId') showId: string,
    @Param('characterId', uuidParam('CHARACTER_NOT_FOUND')) id: string,
  ): Promise<FileLink> {
    return this.library.characterFile(showId, id);
  }

  /** The show's clips. */
  @Get('clips')
  @ApiOperation({ summary: 'List clips' })
  @ApiErrors('VALIDATION_FAILED', 'SHOW_NOT_FOUND')
  clips(@Param('showId') showId: string, @Query() q: LibraryListQuery): Promise<ClipView[]> {
    return this.library.clips(showId, q.includeRejected);
  }

  /** One clip with its metadata. */
  @Get('clips/:clipId')
  @ApiOperation({ summary: 'Get a clip' })
  @ApiErrors('SHOW_NOT_FOUND', 'CLIP_NOT_FOUND')
  clip(
    @Param('showId') showId: string,
    @Param('clipId', uuidParam('CLIP_NOT_FOUND')) id: string,
  ): Promise<ClipView> {
    return this.library.clip(showId, id);
  }

  /** A presigned download URL for the clip's file. */
  @Get('clips/:clipId/file')
  @ApiOperation({ summary: "Download link for a clip's file" })
  @ApiErrors('SHOW_NOT_FOUND', 'CLIP_NOT_FOUND', 'ASSET_NOT_READY')
  clipFile(
    @Param('showId') showId: string,
    @Param('clipId', uuidParam('CLIP_NOT_FOUND')) id: string,
  ): Promise<FileLink> {
    return this.library.clipFile(showId, id);
  }

  /** The show's tissue profiles. */
  @Get('profiles')
  @ApiOperation({ summary: 'List tissue profiles' })
  @ApiErrors('SHOW_NOT_FOUND')
  profiles(@Param('showId') showId: string): Promise<ProfileView[]> {
    return this.library.profiles(showId);
  }

  /** One profile: modes and fit report. */
  @Get('profiles/:profileId')
  @ApiOperation({ summary: 'Get a tissue profile' })
  @ApiErrors('SHOW_NOT_FOUND', 'PROFILE_NOT_FOUND')
  profile(
    @Param('showId') showId: string,
    @Param('profileId', uuidParam('PROFILE_NOT_FOUND')) id: string,
  ): Promise<ProfileView> {
    return this.library.profile(showId, id);
  }
}
