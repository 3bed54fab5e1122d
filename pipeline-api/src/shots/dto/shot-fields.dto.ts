import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  IsArray,
  IsEnum,
  IsInt,
  IsISO8601,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  Min,
  ValidateIf,
} from 'class-validator';
import { Trim } from '../../common/trim';
import { RenderState } from '../render-state';

const CODE = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,39}$/;
const CODE_MESSAGE = 'must be 1 to 40 letters, digits, _ . or -, starting with a letter or digit';

/** Body of `POST /api/shows/:showId/shots`. */
export class CreateShotDto {
  @ApiProperty({ example: 'SQ010' })
  @Trim()
  @IsString()
  @Matches(CODE, { message: `sequence ${CODE_MESSAGE}` })
  sequence: string;

  @ApiProperty({ example: 'SQ010_0040', description: 'Unique in the show.' })
  @Trim()
  @IsString()
  @Matches(CODE, { message: `code ${CODE_MESSAGE}` })
  code: string;

  @ApiProperty({
    description:
      "First frame, any number (e.g. 1001). The first frame is the clip's first instant: frame f is at (f − frameStart) / fps seconds into the clip; the range must lie inside the clip.",
  })
  @IsInt()
  @Min(0)
  @Max(10_000_000)
  frameStart: number;

  @ApiProperty({ description: 'Last frame (inclusive).' })
  @IsInt()
  @Min(0)
  @Max(10_000_000)
  frameEnd: number;

  @ApiProperty({ example: 24 })
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(1)
  @Max(1000)
  fps: number;

  @ApiPropertyOptional({ description: 'Target character (a ready character of the show).' })
  @IsOptional()
  @IsUUID()
  characterId?: string;

  @ApiPropertyOptional({ description: 'Clip (a ready clip of the show).' })
  @IsOptional()
  @IsUUID()
  clipId?: string;

  @ApiPropertyOptional({ type: [String], description: 'Members of the show who hold the shot.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(50)
  @IsUUID('all', { each: true })
  assigneeIds?: string[];

  @ApiPropertyOptional({ example: '2027-03-31' })
  @IsOptional()
  @IsISO8601({ strict: true })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'dueDate must be a date YYYY-MM-DD' })
  dueDate?: string;
}

/** Body of `PATCH …/shots/:shotId`: any field; `null` clears character, clip or due date. */
export class UpdateShotDto {
  @ApiPropertyOptional()
  @IsOptional()
  @Trim()
  @IsString()
  @Matches(CODE, { message: `sequence ${CODE_MESSAGE}` })
  sequence?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Trim()
  @IsString()
  @Matches(CODE, { message: `code ${CODE_MESSAGE}` })
  code?: string;

  @ApiPropertyOptional({
    description:
      'Changing the range, fps or clip checks the range against the clip again; other edits do not.',
  })
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(10_000_000)
  frameStart?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsInt()
  @Min(0)
  @Max(10_000_000)
  frameEnd?: number;

  @ApiPropertyOptional()
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(1)
  @Max(1000)
  fps?: number;

  @ApiPropertyOptional({ nullable: true })
  @ValidateIf((_, v) => v !== undefined && v !== null)
  @IsUUID()
  characterId?: string | null;

  @ApiPropertyOptional({ nullable: true })
  @ValidateIf((_, v) => v !== undefined && v !== null)
  @IsUUID()
  clipId?: string | null;

  @ApiPropertyOptional({ type: [String] })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(50)
  @IsUUID('all', { each: true })
  assigneeIds?: string[];

  @ApiPropertyOptional({ nullable: true })
  @ValidateIf((_, v) => v !== undefined && v !== null)
  @IsISO8601({ strict: true })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'dueDate must be a date YYYY-MM-DD' })
  dueDate?: string | null;
}

/** Body of `PUT …/shots/:shotId/render-state`. */
export class RenderStateDto {
  @ApiProperty({ enum: RenderState })
  @IsEnum(RenderState)
  state: RenderState;
}
