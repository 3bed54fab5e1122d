import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import {
  IsEnum,
  IsInt,
  IsISO8601,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Matches,
  Min,
  ValidateNested,
} from 'class-validator';
import { Trim } from '../../common/trim';
import { AssetKind } from '../entities/asset.entity';

/** The performer's consent record; every field is required for a capture (checked by the service). */
export class ConsentDto {
  @ApiPropertyOptional({
    example: 'PRF-0042',
    description:
      "The studio's reference code for the performer: 2–40 letters, digits, . _ -; never a name.",
  })
  @IsOptional()
  @Trim()
  @IsString()
  @Matches(/^[A-Za-z0-9][A-Za-z0-9._-]{1,39}$/, {
    message: 'performerCode must be 2 to 40 letters, digits, . _ or -, without spaces',
  })
  performerCode?: string;

  @ApiPropertyOptional({ example: 'Tissue-profile learning for this show only' })
  @IsOptional()
  @Trim()
  @IsString()
  @Length(1, 500)
  scope?: string;

  @ApiPropertyOptional({ example: '2027-12-31', description: 'Last day the consent holds.' })
  @IsOptional()
  @IsISO8601({ strict: true })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'expiresOn must be a date YYYY-MM-DD' })
  expiresOn?: string;
}

/** Body of `POST /api/shows/:showId/uploads`: what is about to be uploaded. */
export class CreateUploadDto {
  @ApiProperty({ enum: AssetKind })
  @IsEnum(AssetKind)
  kind: AssetKind;

  @ApiProperty({ example: 'body_v3.glb' })
  @Trim()
  @IsString()
  @Length(1, 255)
  fileName: string;

  @ApiProperty({ description: 'Size in bytes.' })
  @IsInt()
  @Min(1)
  size: number;

  @ApiProperty({ description: 'SHA-256 of the file, hex; verified after the upload.' })
  @Matches(/^[0-9a-fA-F]{64}$/, { message: 'sha256 must be 64 hexadecimal digits' })
  sha256: string;

  @ApiPropertyOptional({ example: 'model/gltf-binary' })
  @IsOptional()
  @IsString()
  @Length(1, 100)
  contentType?: string;

  @ApiPropertyOptional({ description: 'Name of the character or clip (default: the file name).' })
  @IsOptional()
  @Trim()
  @IsString()
  @Length(1, 120)
  name?: string;

  @ApiPropertyOptional({ description: 'Captures: the character the capture is registered to.' })
  @IsOptional()
  @IsUUID()
  characterId?: string;

  @ApiPropertyOptional({
    type: ConsentDto,
    description: 'Captures: the consent record (required).',
  })
  @IsOptional()
  @ValidateNested()
  @Type(() => ConsentDto)
  consent?: ConsentDto;
}
