import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  IsInt,
  IsNumber,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../../common/trim';

/** Learning settings a caller may change; the solver's defaults apply to the rest. */
export class LearnOptionsDto {
  @ApiPropertyOptional({
    description:
      'Low-pass cut-off (Hz) of the pose-driven fit. Solver default: off (the full band), which ' +
      'was the most accurate once tissue motion is projected out before the fit.',
    example: 3,
  })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.05)
  @Max(30)
  cutoffHz?: number;

  /** Accepted so that older clients are not refused; the solver no longer reads it. */
  @ApiPropertyOptional({
    description:
      'Ignored: the basis keeps every tissue direction found above the noise (capped by ' +
      'maxModes), not a share of variance. Still accepted from older clients.',
    deprecated: true,
  })
  @IsOptional()
  @IsNumber({ allowNaN: false, allowInfinity: false })
  @Min(0.5)
  @Max(1)
  varianceTarget?: number;

  @ApiPropertyOptional({
    description:
      'Cap on the basis size K: K is the number of tissue directions found, at most this ' +
      '(solver default 32).',
    example: 16,
  })
  @IsOptional()
  @IsInt()
  @Min(1)
  @Max(64)
  maxModes?: number;
}

/** Body of `POST /api/shows/:showId/profiles`: learn a profile from a capture. */
export class CreateProfileDto {
  @ApiProperty({ example: 'Coach drill, belly and arms' })
  @Trim()
  @IsString()
  @Length(1, 120)
  name: string;

  @ApiProperty({ description: 'A ready capture of the show whose consent has not expired.' })
  @IsUUID()
  captureId: string;

  @ApiProperty({ description: 'The character the capture is registered to.' })
  @IsUUID()
  characterId: string;

  @ApiPropertyOptional({ type: LearnOptionsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => LearnOptionsDto)
  options?: LearnOptionsDto;
}
