import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsBoolean,
  IsInt,
  IsNumber,
  IsObject,
  IsOptional,
  IsUUID,
  Max,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';

const FINITE = { allowNaN: false, allowInfinity: false };

/** The artist's controls; a missing field takes the solver's default. */
export class ControlsDto {
  @ApiPropertyOptional({ description: 'Scales all dynamic displacement.', example: 1 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(-10)
  @Max(10)
  gain?: number;

  @ApiPropertyOptional({
    description: 'Gain per region name of the shot character (missing regions: 1).',
    example: { belly: 1.4 },
    type: 'object',
    additionalProperties: { type: 'number' },
  })
  @IsOptional()
  @IsObject()
  regionGains?: Record<string, number>;

  @ApiPropertyOptional({ description: "Multiplies every mode's natural frequency.", example: 1 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0.05)
  @Max(20)
  stiffness?: number;

  @ApiPropertyOptional({ description: "Multiplies every mode's damping ratio.", example: 1 })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0.05)
  @Max(20)
  damping?: number;

  @ApiPropertyOptional({
    description: 'Seconds the first pose is held before the shot.',
    example: 1,
  })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(0)
  @Max(30)
  prerollSeconds?: number;

  @ApiPropertyOptional({ description: 'Scale frequencies with the character size.' })
  @IsOptional()
  @IsBoolean()
  physicalScaling?: boolean;

  @ApiPropertyOptional({
    description: 'Exponent of the length ratio for frequencies.',
    example: -0.5,
  })
  @IsOptional()
  @IsNumber(FINITE)
  @Min(-4)
  @Max(4)
  sizeExponent?: number;

  @ApiPropertyOptional({ type: [Number], description: 'Indices of profile modes to silence.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(64)
  @IsInt({ each: true })
  mutedModes?: number[];

  @ApiPropertyOptional({ type: [Number], description: 'Indices of profile modes to play alone.' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(64)
  @IsInt({ each: true })
  soloModes?: number[];

  @ApiPropertyOptional({
    description: 'Largest displacement of any vertex in metres (null: no clamp).',
    nullable: true,
    type: Number,
  })
  @IsOptional()
  @ValidateIf((_, v) => v !== null)
  @IsNumber(FINITE)
  @Min(0.0001)
  @Max(100)
  maxDisplacement?: number | null;
}

/** Body of `POST /api/shows/:showId/shots/:shotId/jobs`: solve the shot with a profile. */
export class SubmitRetargetDto {
  @ApiProperty({ description: 'A ready tissue profile of the show.' })
  @IsUUID()
  profileId: string;

  @ApiPropertyOptional({ type: ControlsDto })
  @IsOptional()
  @ValidateNested()
  @Type(() => ControlsDto)
  controls?: ControlsDto;

  @ApiPropertyOptional({
    description:
      'Profile joint → shot character joint, overriding name matching (see `GET …/shots/:shotId/joint-map`).',
    example: { LeftArm: 'upperarm_l' },
    type: 'object',
    additionalProperties: { type: 'string' },
  })
  @IsOptional()
  @IsObject()
  jointMap?: Record<string, string>;

  @ApiPropertyOptional({ description: 'The take whose tuned controls this re-solves (same shot).' })
  @IsOptional()
  @IsUUID()
  baseTakeId?: string;
}

/** Query of `GET /api/shows/:showId/shots/:shotId/joint-map`. */
export class JointMapQuery {
  @ApiProperty({ description: 'The profile whose driver joints to map.' })
  @IsUUID()
  profileId: string;
}
